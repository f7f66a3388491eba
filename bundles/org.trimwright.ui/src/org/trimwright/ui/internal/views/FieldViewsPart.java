package org.trimwright.ui.internal.views;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.trimwright.model.Field;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.doc.Selection;
import org.trimwright.ui.internal.prefs.UiPreferences;

import jakarta.annotation.PostConstruct;
import jakarta.inject.Inject;

/** The e4 part around {@link FieldViewsView}: follows the spec editors' selection and the preferences. */
public class FieldViewsPart {

    private FieldViewsView view;

    @PostConstruct
    void create(Composite parent, MApplication app) {
        parent.setLayout(new FillLayout());
        view = new FieldViewsView(parent);
        UiPreferences p = UiPreferences.load();
        view.setSettings(p.settings(), p.inlDefinition());
        if (app.getContext().get(Topics.LAST_SELECTION) instanceof Selection s) {
            selection(s);
        }
    }

    public FieldViewsView view() {
        return view;
    }

    @Inject
    @Optional
    void selection(@UIEventTopic(Topics.SELECTION) Selection s) {
        if (view != null && s.element() instanceof Field f) {
            view.show(s.document(), f);
        }
    }

    @Inject
    @Optional
    void activeDocument(@UIEventTopic(Topics.ACTIVE_DOCUMENT) Selection s) {
        if (view == null) {
            return;
        }
        if (s.document() == null) {
            view.show(null, null);
        } else if (s.element() instanceof Field f) {
            view.show(s.document(), f);
        }
    }

    @Inject
    @Optional
    void preferences(@UIEventTopic(Topics.PREFERENCES_CHANGED) UiPreferences p) {
        if (view != null) {
            view.setSettings(p.settings(), p.inlDefinition());
        }
    }

    @Inject
    @Optional
    void analyse(@UIEventTopic(Topics.ANALYSE) Object any) {
        if (view != null) {
            view.rerun();
        }
    }

    @Focus
    void focus() {
        view.tabs().setFocus();
    }
}
