package org.trimwright.ui.internal.doc;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.provider.ComposedAdapterFactory;
import org.eclipse.emf.edit.provider.ReflectiveItemProviderAdapterFactory;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.spec.SpecFiles;
import org.trimwright.model.spec.SpecLoadException;

/**
 * One open spec file: its model, an EMF.Edit editing domain whose command stack records every edit (undo, redo,
 * dirty state), and the file it is saved to. Listeners hear of every command-stack change and of reloads.
 * Lives on the UI thread; background work reads copies, never this model.
 */
public final class SpecDocument {

    /** What happened to the document. */
    public enum Change {
        /** A command was executed, undone or redone. */
        EDITED,
        /** The model was replaced (revert). */
        RELOADED,
        /** The document was saved (dirty state and maybe file changed). */
        SAVED
    }

    /** Hears document changes. */
    @FunctionalInterface
    public interface Listener {
        void changed(SpecDocument document, Change change);
    }

    private final AdapterFactoryEditingDomain domain;
    private final BasicCommandStack stack = new BasicCommandStack();
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private Path file;
    private ChipSpec spec;

    private SpecDocument(Path file) {
        this.file = file;
        ComposedAdapterFactory factory = new ComposedAdapterFactory();
        factory.addAdapterFactory(new ReflectiveItemProviderAdapterFactory());
        ResourceSet rs = SpecFiles.newResourceSet();
        domain = new AdapterFactoryEditingDomain(factory, stack, rs);
        stack.addCommandStackListener(e -> fire(Change.EDITED));
    }

    /** Opens a spec file. */
    public static SpecDocument open(Path file) throws SpecLoadException {
        SpecDocument d = new SpecDocument(file);
        d.spec = SpecFiles.load(file, d.domain.getResourceSet());
        return d;
    }

    public ChipSpec spec() {
        return spec;
    }

    public Path file() {
        return file;
    }

    public AdapterFactoryEditingDomain domain() {
        return domain;
    }

    public BasicCommandStack commandStack() {
        return stack;
    }

    /** True when edits were made since the last save or load. */
    public boolean isDirty() {
        return stack.isSaveNeeded();
    }

    /**
     * Runs a command on the stack.
     *
     * @return false when the command cannot execute (nothing changes)
     */
    public boolean execute(Command command) {
        if (command == null || !command.canExecute()) {
            return false;
        }
        stack.execute(command);
        return true;
    }

    public boolean canUndo() {
        return stack.canUndo();
    }

    public boolean canRedo() {
        return stack.canRedo();
    }

    public void undo() {
        stack.undo();
    }

    public void redo() {
        stack.redo();
    }

    /** Saves atomically to the document's file. */
    public void save() throws IOException {
        SpecFiles.save(spec, file);
        stack.saveIsDone();
        fire(Change.SAVED);
    }

    /** Saves atomically to {@code target}; the document then belongs to that file. */
    public void saveAs(Path target) throws IOException {
        SpecFiles.save(spec, target);
        file = target;
        Resource r = spec.eResource();
        if (r != null) {
            r.setURI(org.eclipse.emf.common.util.URI.createFileURI(target.toAbsolutePath().toString()));
        }
        stack.saveIsDone();
        fire(Change.SAVED);
    }

    /** Throws away unsaved edits and the undo history and reads the file again. */
    public void revert() throws SpecLoadException {
        ResourceSet rs = domain.getResourceSet();
        ChipSpec fresh = SpecFiles.load(file, SpecFiles.newResourceSet());
        Resource old = spec.eResource();
        stack.flush();
        if (old != null) {
            old.unload();
            rs.getResources().remove(old);
        }
        rs.getResources().add(fresh.eResource());
        spec = fresh;
        fire(Change.RELOADED);
    }

    /** The element at BLOCK, BLOCK/REGISTER or BLOCK/REGISTER/FIELD (or the chip's name), or null. */
    public org.eclipse.emf.ecore.EObject find(String path) {
        if (path == null || path.isEmpty()) {
            return null;
        }
        String[] p = path.split("/");
        if (p.length == 1 && p[0].equals(spec.getName())) {
            return spec;
        }
        for (org.trimwright.model.Block b : spec.getBlocks()) {
            if (!p[0].equals(b.getName())) {
                continue;
            }
            if (p.length == 1) {
                return b;
            }
            for (org.trimwright.model.Register r : b.getRegisters()) {
                if (!p[1].equals(r.getName())) {
                    continue;
                }
                if (p.length == 2) {
                    return r;
                }
                for (org.trimwright.model.Field f : r.getFields()) {
                    if (p[2].equals(f.getName())) {
                        return f;
                    }
                }
            }
        }
        return null;
    }

    public void addListener(Listener l) {
        listeners.add(l);
    }

    public void removeListener(Listener l) {
        listeners.remove(l);
    }

    private void fire(Change c) {
        for (Listener l : listeners) {
            l.changed(this, c);
        }
    }
}
