package org.trimwright.ui.internal.views;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.action.Separator;
import org.eclipse.jface.dialogs.InputDialog;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.jface.window.Window;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.trimwright.ui.internal.Icons;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.editor.Editors;
import org.trimwright.ui.internal.handlers.NewSpecWizard;
import org.trimwright.ui.internal.workspace.Workspace;

import jakarta.annotation.PostConstruct;
import jakarta.inject.Inject;

/**
 * The workspace navigator: projects (top folders of the workspace), their folders and spec files. Double-click
 * opens a spec; the context menu creates (new-spec wizard, new project), renames and deletes (after confirmation).
 * Open files are neither renamed nor deleted: close their editor first.
 */
public class NavigatorPart {

    @Inject
    private Workspace workspace;
    @Inject
    private MApplication app;
    @Inject
    private EModelService models;
    @Inject
    private EPartService parts;
    @Inject
    private IEventBroker broker;

    private TreeViewer viewer;

    @PostConstruct
    void create(Composite parent) {
        parent.setLayout(new FillLayout());
        viewer = new TreeViewer(parent, SWT.SINGLE | SWT.H_SCROLL | SWT.V_SCROLL);
        viewer.setContentProvider(new Content());
        viewer.setLabelProvider(new LabelProvider() {
            @Override
            public String getText(Object e) {
                return ((Path) e).getFileName().toString();
            }

            @Override
            public Image getImage(Object e) {
                Path p = (Path) e;
                return Icons.get(Files.isDirectory(p) ? "project" : "spec");
            }
        });
        viewer.setInput(workspace.root());
        viewer.expandToLevel(2);
        viewer.addDoubleClickListener(e -> {
            Path p = selected();
            if (p != null && Workspace.isSpec(p)) {
                Editors.open(p, app, models, parts);
            } else if (p != null) {
                viewer.setExpandedState(p, !viewer.getExpandedState(p));
            }
        });
        menu();
    }

    private Path selected() {
        Object o = ((IStructuredSelection) viewer.getSelection()).getFirstElement();
        return o instanceof Path p ? p : null;
    }

    private void menu() {
        MenuManager mm = new MenuManager();
        mm.setRemoveAllWhenShown(true);
        mm.addMenuListener(m -> {
            Path p = selected();
            if (p != null && Workspace.isSpec(p)) {
                m.add(action("Open", () -> Editors.open(p, app, models, parts)));
            }
            m.add(action("New Spec...", () -> NewSpecWizard.open(viewer.getControl().getShell(), workspace,
                    p == null ? null : Files.isDirectory(p) ? p : p.getParent(), app, models, parts, broker)));
            m.add(action("New Project...", this::newProject));
            if (p != null) {
                m.add(new Separator());
                m.add(action("Rename...", () -> rename(p)));
                m.add(action("Delete", () -> delete(p)));
            }
            m.add(new Separator());
            m.add(action("Refresh", this::refresh));
        });
        viewer.getControl().setMenu(mm.createContextMenu(viewer.getControl()));
    }

    private void newProject() {
        InputDialog d = new InputDialog(viewer.getControl().getShell(), "New Project", "Project name:", "",
                Workspace::checkName);
        if (d.open() != Window.OK) {
            return;
        }
        try {
            Files.createDirectories(workspace.root().resolve(d.getValue().strip()));
        } catch (IOException e) {
            MessageDialog.openError(viewer.getControl().getShell(), "New Project", e.getMessage());
        }
        refresh();
    }

    private boolean isOpen(Path p) {
        if (Editors.find(p, app, models) != null) {
            return true;
        }
        if (Files.isDirectory(p)) {
            try (Stream<Path> s = Files.walk(p)) {
                return s.anyMatch(f -> Editors.find(f, app, models) != null);
            } catch (IOException e) {
                return false;
            }
        }
        return false;
    }

    private void rename(Path p) {
        if (isOpen(p)) {
            MessageDialog.openInformation(viewer.getControl().getShell(), "Rename",
                    p.getFileName() + " is open in an editor: close it first.");
            return;
        }
        InputDialog d = new InputDialog(viewer.getControl().getShell(), "Rename", "New name:",
                p.getFileName().toString(), v -> {
                    String bad = Workspace.checkName(v);
                    if (bad == null && Files.exists(p.resolveSibling(v.strip()))) {
                        return "A file or folder with that name exists.";
                    }
                    return bad;
                });
        if (d.open() != Window.OK) {
            return;
        }
        String name = d.getValue().strip();
        if (Workspace.isSpec(p)) {
            name = Workspace.specFileName(name);
        }
        try {
            Files.move(p, p.resolveSibling(name));
        } catch (IOException e) {
            MessageDialog.openError(viewer.getControl().getShell(), "Rename", "Cannot rename: " + e.getMessage());
        }
        refresh();
    }

    private void delete(Path p) {
        if (isOpen(p)) {
            MessageDialog.openInformation(viewer.getControl().getShell(), "Delete",
                    p.getFileName() + " is open in an editor: close it first.");
            return;
        }
        String what = Files.isDirectory(p) ? "the folder " + p.getFileName() + " and everything in it"
                : p.getFileName().toString();
        if (!MessageDialog.openConfirm(viewer.getControl().getShell(), "Delete",
                "Delete " + what + " from disk? This cannot be undone.")) {
            return;
        }
        try (Stream<Path> s = Files.walk(p)) {
            s.sorted(Comparator.reverseOrder()).forEach(f -> {
                try {
                    Files.delete(f);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (IOException | UncheckedIOException e) {
            MessageDialog.openError(viewer.getControl().getShell(), "Delete", "Cannot delete: " + e.getMessage());
        }
        refresh();
    }

    private void refresh() {
        if (viewer != null && !viewer.getControl().isDisposed()) {
            Object[] expanded = viewer.getExpandedElements();
            viewer.refresh();
            viewer.setExpandedElements(expanded);
        }
    }

    @Inject
    @Optional
    void workspaceChanged(@UIEventTopic(Topics.WORKSPACE_CHANGED) Object any) {
        refresh();
    }

    @Focus
    void focus() {
        viewer.getControl().setFocus();
    }

    private static Action action(String text, Runnable r) {
        return new Action(text) {
            @Override
            public void run() {
                r.run();
            }
        };
    }

    /** Folders and spec files under a path. */
    private static final class Content implements ITreeContentProvider {
        @Override
        public Object[] getElements(Object input) {
            return getChildren(input);
        }

        @Override
        public Object[] getChildren(Object parent) {
            try {
                return Workspace.children((Path) parent).toArray();
            } catch (IOException e) {
                return new Object[0];
            }
        }

        @Override
        public Object getParent(Object element) {
            return ((Path) element).getParent();
        }

        @Override
        public boolean hasChildren(Object element) {
            return Files.isDirectory((Path) element) && getChildren(element).length > 0;
        }
    }
}
