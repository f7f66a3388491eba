package org.trimwright.ui.internal.views;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.doc.Selection;

import jakarta.annotation.PostConstruct;
import jakarta.inject.Inject;

/** The e4 part around {@link ProblemsView}; double-click reveals the element in its spec editor. */
public class ProblemsPart {

    @Inject
    private IEventBroker broker;
    private ProblemsView view;

    @PostConstruct
    void create(Composite parent, MApplication app) {
        parent.setLayout(new FillLayout());
        view = new ProblemsView(parent, row -> {
            EObject target = row.element();
            while (target != null && !(target instanceof org.trimwright.model.Field)
                    && !(target instanceof org.trimwright.model.Register)
                    && !(target instanceof org.trimwright.model.Block)) {
                target = target.eContainer();
            }
            if (target != null) {
                broker.send(Topics.REVEAL, new Selection(view.document(), target));
            }
        });
        view.setSettings(org.trimwright.ui.internal.prefs.UiPreferences.load().settings());
        if (app.getContext().get(Topics.LAST_SELECTION) instanceof Selection s) {
            view.show(s.document());
        }
    }

    @Inject
    @Optional
    void activeDocument(@UIEventTopic(Topics.ACTIVE_DOCUMENT) Selection s) {
        if (view != null && s.document() != view.document()) {
            view.show(s.document());
        }
    }

    @Inject
    @Optional
    void preferences(@UIEventTopic(Topics.PREFERENCES_CHANGED) org.trimwright.ui.internal.prefs.UiPreferences p) {
        if (view != null) {
            view.setSettings(p.settings());
        }
    }

    @Focus
    void focus() {
        view.table().setFocus();
    }
}
