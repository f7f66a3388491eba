package org.trimwright.model.spec;

import org.eclipse.emf.ecore.EObject;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;

/** The path of a model element as designers write it: BLOCK/REGISTER/FIELD. */
public final class ElementPaths {

    private ElementPaths() {
    }

    /** BLOCK, BLOCK/REGISTER or BLOCK/REGISTER/FIELD; for parts of a field, the field's path. */
    public static String of(EObject element) {
        EObject e = element;
        while (e != null && !(e instanceof Field) && !(e instanceof Register) && !(e instanceof Block)
                && !(e instanceof ChipSpec)) {
            e = e.eContainer();
        }
        if (e instanceof Field f) {
            return of(f.eContainer()) + "/" + name(f.getName());
        }
        if (e instanceof Register r) {
            return of(r.eContainer()) + "/" + name(r.getName());
        }
        if (e instanceof Block b) {
            return name(b.getName());
        }
        if (e instanceof ChipSpec c) {
            return name(c.getName());
        }
        return "?";
    }

    private static String name(String n) {
        return n == null || n.isEmpty() ? "(unnamed)" : n;
    }

    /** Finds a field by BLOCK/REGISTER/FIELD, or null. */
    public static Field findField(ChipSpec spec, String path) {
        String[] parts = path.split("/");
        if (parts.length != 3) {
            return null;
        }
        for (Block b : spec.getBlocks()) {
            if (!parts[0].equals(b.getName())) {
                continue;
            }
            for (Register r : b.getRegisters()) {
                if (!parts[1].equals(r.getName())) {
                    continue;
                }
                for (Field f : r.getFields()) {
                    if (parts[2].equals(f.getName())) {
                        return f;
                    }
                }
            }
        }
        return null;
    }
}
