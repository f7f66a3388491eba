package org.trimwright.ui.internal.doc;

import java.util.Objects;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.RemoveCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.TrimwrightFactory;
import org.trimwright.model.TrimwrightPackage;

/** The edits the workbench makes, each one EMF.Edit command on the document's stack. */
public final class SpecEdits {

    private static final TrimwrightPackage P = TrimwrightPackage.eINSTANCE;
    private static final TrimwrightFactory F = TrimwrightFactory.eINSTANCE;

    private SpecEdits() {
    }

    /**
     * Sets an attribute or containment; {@code null} on an unsettable feature unsets it.
     *
     * @return false when the value is already there or the command cannot run
     */
    public static boolean set(SpecDocument doc, EObject owner, EStructuralFeature feature, Object value) {
        boolean unset = value == null && feature.isUnsettable();
        if (!unset && owner.eIsSet(feature) && Objects.equals(owner.eGet(feature), value)) {
            return false;
        }
        if (unset && !owner.eIsSet(feature)) {
            return false;
        }
        Command c = SetCommand.create(doc.domain(), owner, feature, unset ? SetCommand.UNSET_VALUE : value);
        return doc.execute(c);
    }

    /** Adds a new block named BLOCKn with one register and returns it. */
    public static Block addBlock(SpecDocument doc, ChipSpec spec) {
        Block b = F.createBlock();
        b.setName(uniqueName("BLOCK", spec.getBlocks().stream().map(Block::getName).toList()));
        long base = spec.getBlocks().stream().mapToLong(Block::getBaseAddress).max().orElse(-16) + 16;
        b.setBaseAddress(base);
        doc.execute(AddCommand.create(doc.domain(), spec, P.getChipSpec_Blocks(), b));
        return b;
    }

    /** Adds an 8-bit register to a block and returns it. */
    public static Register addRegister(SpecDocument doc, Block block) {
        Register r = F.createRegister();
        r.setName(uniqueName(block.getName() + "_REG", block.getRegisters().stream().map(Register::getName).toList()));
        r.setWidth(8);
        r.setAddressOffset(block.getRegisters().stream().mapToLong(Register::getAddressOffset).max().orElse(-1) + 1);
        doc.execute(AddCommand.create(doc.domain(), block, P.getBlock_Registers(), r));
        return r;
    }

    /** Adds a 1-bit field in the lowest free bit of the register (bit 0 when none is free) and returns it. */
    public static Field addField(SpecDocument doc, Register register) {
        boolean[] used = new boolean[Math.max(1, register.getWidth())];
        for (Field f : register.getFields()) {
            for (int i = f.getBitOffset(); i < f.getBitOffset() + f.getWidth() && i < used.length; i++) {
                if (i >= 0) {
                    used[i] = true;
                }
            }
        }
        int free = 0;
        while (free < used.length && used[free]) {
            free++;
        }
        Field f = F.createField();
        f.setName(uniqueName("FIELD", register.getFields().stream().map(Field::getName).toList()));
        f.setBitOffset(free < used.length ? free : 0);
        f.setWidth(1);
        doc.execute(AddCommand.create(doc.domain(), register, P.getRegister_Fields(), f));
        return f;
    }

    /** Removes a block, register or field. */
    public static boolean remove(SpecDocument doc, EObject element) {
        return doc.execute(RemoveCommand.create(doc.domain(), element));
    }

    /** Creates the missing part (target, coding, element model or limits) of a field. */
    public static boolean createPart(SpecDocument doc, Field field, EStructuralFeature part) {
        EObject value = F.create(((org.eclipse.emf.ecore.EReference) part).getEReferenceType());
        return set(doc, field, part, value);
    }

    static String uniqueName(String stem, java.util.List<String> taken) {
        for (int i = 0;; i++) {
            String n = stem + i;
            if (!taken.contains(n)) {
                return n;
            }
        }
    }
}
