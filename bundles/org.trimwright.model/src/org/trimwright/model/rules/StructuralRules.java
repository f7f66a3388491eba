package org.trimwright.model.rules;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EObject;
import org.trimwright.model.Access;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.FieldRole;
import org.trimwright.model.Register;
import org.trimwright.model.spec.ElementPaths;

/**
 * Structural rules of a register map, called by the generated validator. Each rule adds one diagnostic per
 * finding whose message starts with the element's path and whose data holds the element first.
 */
public final class StructuralRules {

    /** Diagnostic source of every structural finding. */
    public static final String SOURCE = "org.trimwright.model";

    public static final int WIDTH = 1;
    public static final int OVERLAP = 2;
    public static final int DUPLICATE_NAME = 3;
    public static final int DUPLICATE_ADDRESS = 4;
    public static final int OUTSIDE_REGISTER = 5;
    public static final int RESET_RANGE = 6;
    public static final int TRIM_NOT_WRITABLE = 7;

    private StructuralRules() {
    }

    public static boolean validWidth(Register r, DiagnosticChain d) {
        int w = r.getWidth();
        if (w == 8 || w == 16 || w == 32) {
            return true;
        }
        return report(d, Diagnostic.ERROR, WIDTH, r, "register width " + w + " bits is not one of 8, 16, 32");
    }

    public static boolean noOverlappingFields(Register r, DiagnosticChain d) {
        boolean ok = true;
        List<Field> fields = r.getFields();
        for (int i = 0; i < fields.size(); i++) {
            for (int j = i + 1; j < fields.size(); j++) {
                Field a = fields.get(i);
                Field b = fields.get(j);
                int lo = Math.max(a.getBitOffset(), b.getBitOffset());
                int hi = Math.min(a.getBitOffset() + a.getWidth(), b.getBitOffset() + b.getWidth()) - 1;
                if (lo <= hi) {
                    ok = report(d, Diagnostic.ERROR, OVERLAP, b, "bits " + bits(lo, hi) + " overlap field '"
                            + a.getName() + "' (" + bits(a) + ") in register " + r.getName());
                }
            }
        }
        return ok;
    }

    public static boolean uniqueFieldNames(Register r, DiagnosticChain d) {
        return unique(r.getFields(), Field::getName, d, "field name");
    }

    public static boolean uniqueRegisterNames(Block b, DiagnosticChain d) {
        return unique(b.getRegisters(), Register::getName, d, "register name");
    }

    public static boolean uniqueRegisterAddresses(Block b, DiagnosticChain d) {
        Map<Long, Register> seen = new HashMap<>();
        boolean ok = true;
        for (Register r : b.getRegisters()) {
            Register first = seen.putIfAbsent(r.getAddressOffset(), r);
            if (first != null) {
                ok = report(d, Diagnostic.ERROR, DUPLICATE_ADDRESS, r, "address offset 0x"
                        + Long.toHexString(r.getAddressOffset()) + " is also used by register " + first.getName());
            }
        }
        return ok;
    }

    public static boolean uniqueBlockNames(ChipSpec c, DiagnosticChain d) {
        return unique(c.getBlocks(), Block::getName, d, "block name");
    }

    public static boolean bitsInsideRegister(Field f, DiagnosticChain d) {
        if (!(f.eContainer() instanceof Register r)) {
            return true;
        }
        if (f.getWidth() < 1 || f.getBitOffset() < 0) {
            return report(d, Diagnostic.ERROR, OUTSIDE_REGISTER, f, "width " + f.getWidth() + " and bit offset "
                    + f.getBitOffset() + " do not describe any bits");
        }
        if (f.getBitOffset() + f.getWidth() > r.getWidth()) {
            return report(d, Diagnostic.ERROR, OUTSIDE_REGISTER, f, "bits " + bits(f) + " lie outside the "
                    + r.getWidth() + "-bit register " + r.getName());
        }
        return true;
    }

    public static boolean resetCodeInRange(Field f, DiagnosticChain d) {
        if (f.getWidth() < 1 || f.getWidth() > 62) {
            return true;
        }
        long max = (1L << f.getWidth()) - 1;
        if (f.getResetCode() < 0 || f.getResetCode() > max) {
            return report(d, Diagnostic.ERROR, RESET_RANGE, f, "reset code " + f.getResetCode()
                    + " does not fit " + f.getWidth() + " bits (0.." + max + ")");
        }
        return true;
    }

    public static boolean trimIsWritable(Field f, DiagnosticChain d) {
        if (f.getRole() == FieldRole.TRIM && (f.getAccess() == Access.READ_ONLY
                || f.getAccess() == Access.WRITE1_TO_CLEAR)) {
            return report(d, Diagnostic.ERROR, TRIM_NOT_WRITABLE, f, "a trim field must be writable, but its access is "
                    + f.getAccess().getLiteral());
        }
        return true;
    }

    private static <T extends EObject> boolean unique(List<T> items, Function<T, String> name, DiagnosticChain d,
            String what) {
        Map<String, T> seen = new HashMap<>();
        boolean ok = true;
        for (T item : items) {
            String n = name.apply(item);
            if (n == null || n.isBlank()) {
                ok = report(d, Diagnostic.ERROR, DUPLICATE_NAME, item, what + " is empty");
                continue;
            }
            if (seen.putIfAbsent(n, item) != null) {
                ok = report(d, Diagnostic.ERROR, DUPLICATE_NAME, item, what + " '" + n + "' is used twice");
            }
        }
        return ok;
    }

    private static String bits(Field f) {
        return bits(f.getBitOffset(), f.getBitOffset() + f.getWidth() - 1);
    }

    private static String bits(int lo, int hi) {
        return lo == hi ? "[" + lo + "]" : "[" + hi + ":" + lo + "]";
    }

    private static boolean report(DiagnosticChain d, int severity, int code, EObject element, String message) {
        if (d != null) {
            d.add(new BasicDiagnostic(severity, SOURCE, code, ElementPaths.of(element) + ": " + message,
                    new Object[] {element}));
        }
        return false;
    }
}
