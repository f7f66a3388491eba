package org.trimwright.ui.internal.editor;

import java.io.IOException;
import java.nio.file.Path;
import java.nio.file.Paths;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.Persist;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MWindow;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.workbench.UIEvents;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.modeling.ISaveHandler;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.trimwright.model.Field;
import org.trimwright.model.spec.SpecLoadException;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.doc.Selection;
import org.trimwright.ui.internal.doc.SpecDocument;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

/** The e4 part around {@link SpecEditorView}: file from the part's persisted state, dirty flag, save, events. */
public class SpecEditorPart {

    @Inject
    private MPart part;
    @Inject
    private MApplication application;
    @Inject
    private IEventBroker broker;
    @Inject
    private EPartService partService;

    private SpecDocument document;
    private SpecEditorView view;

    @PostConstruct
    void create(Composite parent, MWindow window) {
        parent.setLayout(new FillLayout());
        Path file = Paths.get(part.getPersistedState().get(Topics.FILE_KEY));
        try {
            document = SpecDocument.open(file);
        } catch (SpecLoadException e) {
            Label l = new Label(parent, SWT.WRAP);
            l.setText("Cannot open " + file + ":\n" + e.getMessage());
            return;
        }
        part.setLabel(file.getFileName().toString());
        part.setTooltip(file.toString());
        view = new SpecEditorView(parent, document);
        view.addSelectionListener(e -> {
            Selection sel = new Selection(document, e);
            application.getContext().set(Topics.LAST_SELECTION, sel);
            broker.post(Topics.SELECTION, sel);
        });
        document.addListener((d, c) -> {
            part.setDirty(d.isDirty());
            part.setLabel(d.file().getFileName().toString());
            part.setTooltip(d.file().toString());
            broker.post(UIEvents.REQUEST_ENABLEMENT_UPDATE_TOPIC, UIEvents.ALL_ELEMENT_ID);
        });
        window.getContext().set(ISaveHandler.class, new SavePrompt(parent.getShell()));
        Field first = firstAnalysedField(document.spec());
        if (first != null) {
            view.select(first);
        }
    }

    /** The first field with a unit element (what the field views can show in full), else the first field. */
    static Field firstAnalysedField(org.trimwright.model.ChipSpec spec) {
        Field any = null;
        for (org.trimwright.model.Block b : spec.getBlocks()) {
            for (org.trimwright.model.Register r : b.getRegisters()) {
                for (Field f : r.getFields()) {
                    if (f.getElement() != null) {
                        return f;
                    }
                    any = any == null ? f : any;
                }
            }
        }
        return any;
    }

    /** The open document (null when the file could not be read). */
    public SpecDocument document() {
        return document;
    }

    /** Records the document's (new) file in the part, after Save As. */
    public void rememberFile() {
        if (document != null) {
            part.getPersistedState().put(Topics.FILE_KEY, document.file().toAbsolutePath().normalize().toString());
        }
    }

    public SpecEditorView view() {
        return view;
    }

    @Focus
    void focus() {
        application.getContext().set(Topics.ACTIVE_EDITOR, this);
        if (view != null) {
            view.setFocus();
            broker.post(Topics.ACTIVE_DOCUMENT, new Selection(document, view.selection()));
        }
    }

    @Persist
    void save() throws IOException {
        if (document != null) {
            document.save();
        }
    }

    @Inject
    @Optional
    void reveal(@UIEventTopic(Topics.REVEAL) Selection s) {
        if (view != null && s.document() == document && s.element() != null) {
            partService.activate(part);
            view.select(s.element());
        }
    }

    @PreDestroy
    void dispose() {
        if (application.getContext().get(Topics.ACTIVE_EDITOR) == this) {
            application.getContext().remove(Topics.ACTIVE_EDITOR);
        }
        if (document != null) {
            broker.post(Topics.ACTIVE_DOCUMENT, new Selection(null, null));
        }
    }

    /** Asks before a dirty spec editor closes: save, discard or keep it open. */
    private static final class SavePrompt implements ISaveHandler {
        private final org.eclipse.swt.widgets.Shell shell;

        SavePrompt(org.eclipse.swt.widgets.Shell shell) {
            this.shell = shell;
        }

        @Override
        public boolean save(MPart dirtyPart, boolean confirm) {
            Save s = confirm ? promptToSave(dirtyPart) : Save.YES;
            if (s == Save.CANCEL) {
                return false;
            }
            if (s == Save.YES && dirtyPart.getObject() instanceof SpecEditorPart ed) {
                try {
                    ed.save();
                } catch (IOException e) {
                    MessageDialog.openError(shell, "Save", "Cannot save: " + e.getMessage());
                    return false;
                }
            }
            return true;
        }

        @Override
        public boolean saveParts(java.util.Collection<MPart> dirtyParts, boolean confirm) {
            for (MPart p : dirtyParts) {
                if (!save(p, confirm)) {
                    return false;
                }
            }
            return true;
        }

        @Override
        public Save promptToSave(MPart dirtyPart) {
            MessageDialog d = new MessageDialog(shell, "Unsaved changes", null,
                    dirtyPart.getLabel() + " has unsaved changes. Save them?", MessageDialog.QUESTION,
                    new String[] {"Save", "Discard", "Cancel"}, 0);
            int r = d.open();
            return r == 0 ? Save.YES : r == 1 ? Save.NO : Save.CANCEL;
        }

        @Override
        public Save[] promptToSave(java.util.Collection<MPart> dirtyParts) {
            Save[] out = new Save[dirtyParts.size()];
            int i = 0;
            for (MPart p : dirtyParts) {
                out[i++] = promptToSave(p);
            }
            return out;
        }
    }
}
