package org.trimwright.ui.internal.editor;

import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.swt.graphics.Image;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.ui.internal.Icons;

/** Tree of a spec: the chip, its blocks, their registers and the registers' fields. Input: the ChipSpec. */
final class SpecTreeProvider {

    private SpecTreeProvider() {
    }

    /** The viewer's input: a holder of the chip (the input must not be an element of the tree itself). */
    record Root(ChipSpec spec) {
    }

    /** Content: the chip, then blocks, registers, fields. */
    static final class Content implements ITreeContentProvider {
        @Override
        public Object[] getElements(Object input) {
            return input instanceof Root r && r.spec() != null ? new Object[] {r.spec()} : new Object[0];
        }

        @Override
        public Object[] getChildren(Object parent) {
            if (parent instanceof ChipSpec c) {
                return c.getBlocks().toArray();
            }
            if (parent instanceof Block b) {
                return b.getRegisters().toArray();
            }
            if (parent instanceof Register r) {
                return r.getFields().toArray();
            }
            return new Object[0];
        }

        @Override
        public Object getParent(Object element) {
            return element instanceof org.eclipse.emf.ecore.EObject e ? e.eContainer() : null;
        }

        @Override
        public boolean hasChildren(Object element) {
            return getChildren(element).length > 0;
        }
    }

    /** Labels: names with address, bit range and coding in trade notation. */
    static final class Labels extends LabelProvider {
        @Override
        public String getText(Object o) {
            if (o instanceof ChipSpec c) {
                return nz(c.getName()) + (c.getRevision() == null ? "" : "  rev " + c.getRevision());
            }
            if (o instanceof Block b) {
                return nz(b.getName()) + String.format("  @0x%02X", b.getBaseAddress());
            }
            if (o instanceof Register r) {
                return nz(r.getName()) + String.format("  +0x%X  [%d bits]", r.getAddressOffset(), r.getWidth());
            }
            if (o instanceof Field f) {
                return nz(f.getName()) + "  " + bitRange(f)
                        + (f.getCoding() == null ? "" : "  " + f.getCoding().getScheme().getLiteral());
            }
            return String.valueOf(o);
        }

        @Override
        public Image getImage(Object o) {
            if (o instanceof ChipSpec) {
                return Icons.get("spec");
            }
            if (o instanceof Block) {
                return Icons.get("block");
            }
            if (o instanceof Register) {
                return Icons.get("register");
            }
            return o instanceof Field ? Icons.get("field") : null;
        }
    }

    /** [msb:lsb] or [bit]. */
    static String bitRange(Field f) {
        int lsb = f.getBitOffset();
        int msb = lsb + f.getWidth() - 1;
        return msb == lsb ? "[" + lsb + "]" : "[" + msb + ":" + lsb + "]";
    }

    private static String nz(String s) {
        return s == null || s.isEmpty() ? "(unnamed)" : s;
    }
}
