package org.trimwright.ui.internal.editor;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.ui.internal.doc.SpecDocument;
import org.trimwright.ui.internal.doc.SpecEdits;

/**
 * The spec editor's widgets, independent of the workbench: master tree of blocks, registers and fields on the left,
 * the selected element's form (with the register bit map) on the right. Listeners hear the selected element.
 */
public final class SpecEditorView {

    private final SashForm sash;
    private final TreeViewer tree;
    private final DetailForm form;
    private final List<Consumer<EObject>> selectionListeners = new CopyOnWriteArrayList<>();
    private final SpecDocument.Listener docListener = (d, c) -> modelChanged(c);
    private SpecDocument document;
    private EObject selected;

    public SpecEditorView(Composite parent, SpecDocument document) {
        this.document = document;
        sash = new SashForm(parent, SWT.HORIZONTAL);
        tree = new TreeViewer(sash, SWT.BORDER | SWT.SINGLE | SWT.H_SCROLL | SWT.V_SCROLL);
        tree.setContentProvider(new SpecTreeProvider.Content());
        tree.setLabelProvider(new SpecTreeProvider.Labels());
        tree.setUseHashlookup(true);
        ScrolledComposite sc = new ScrolledComposite(sash, SWT.V_SCROLL | SWT.H_SCROLL);
        sc.setExpandHorizontal(true);
        sc.setExpandVertical(true);
        form = new DetailForm(sc, this::select);
        sc.setContent(form.control());
        sc.addListener(SWT.Resize, e -> {
            int w = Math.max(sc.getClientArea().width, 360);
            sc.setMinSize(w, form.control().computeSize(w, SWT.DEFAULT).y);
        });
        sash.setWeights(34, 66);
        tree.addSelectionChangedListener(e -> {
            Object first = ((IStructuredSelection) e.getSelection()).getFirstElement();
            selected = first instanceof EObject eo ? eo : null;
            form.show(this.document, selected);
            selectionListeners.forEach(l -> l.accept(selected));
        });
        tree.setInput(new SpecTreeProvider.Root(document.spec()));
        tree.expandToLevel(3);
        contextMenu();
        document.addListener(docListener);
        sash.addListener(SWT.Dispose, e -> this.document.removeListener(docListener));
    }

    public Control control() {
        return sash;
    }

    public TreeViewer tree() {
        return tree;
    }

    public DetailForm form() {
        return form;
    }

    public SpecDocument document() {
        return document;
    }

    public EObject selection() {
        return selected;
    }

    public void addSelectionListener(Consumer<EObject> l) {
        selectionListeners.add(l);
    }

    /** Selects and reveals an element of this document's spec. */
    public void select(EObject element) {
        if (element == null) {
            return;
        }
        tree.setSelection(new StructuredSelection(element), true);
    }

    public void setFocus() {
        tree.getControl().setFocus();
    }

    private void modelChanged(SpecDocument.Change change) {
        if (sash.isDisposed()) {
            return;
        }
        if (change == SpecDocument.Change.RELOADED) {
            String path = selected == null ? null : org.trimwright.model.spec.ElementPaths.of(selected);
            tree.setInput(new SpecTreeProvider.Root(document.spec()));
            tree.expandToLevel(3);
            EObject again = path == null ? null : document.find(path);
            if (again != null) {
                select(again);
            } else {
                form.show(document, null);
                selected = null;
                selectionListeners.forEach(l -> l.accept(null));
            }
            return;
        }
        tree.refresh(true);
        if (selected != null && selected.eResource() == null) {
            tree.setSelection(StructuredSelection.EMPTY);
        }
        form.refresh();
        if (selected != null) {
            selectionListeners.forEach(l -> l.accept(selected));
        }
    }

    private void contextMenu() {
        MenuManager mm = new MenuManager();
        mm.setRemoveAllWhenShown(true);
        mm.addMenuListener(m -> {
            EObject s = selected;
            if (s instanceof ChipSpec c) {
                m.add(action("Add block", () -> select(SpecEdits.addBlock(document, c))));
            }
            if (s instanceof Block b) {
                m.add(action("Add register", () -> select(SpecEdits.addRegister(document, b))));
            }
            if (s instanceof Register r) {
                m.add(action("Add field", () -> select(SpecEdits.addField(document, r))));
            }
            if (s instanceof Block || s instanceof Register || s instanceof Field) {
                m.add(action("Delete", () -> {
                    String what = s.eClass().getName().toLowerCase() + " "
                            + org.trimwright.model.spec.ElementPaths.of(s);
                    if (MessageDialog.openConfirm(sash.getShell(), "Delete", "Delete " + what
                            + "? (Edit > Undo brings it back.)")) {
                        SpecEdits.remove(document, s);
                    }
                }));
            }
        });
        tree.getControl().setMenu(mm.createContextMenu(tree.getControl()));
    }

    private static Action action(String text, Runnable r) {
        return new Action(text) {
            @Override
            public void run() {
                r.run();
            }
        };
    }
}
