package org.trimwright.cli;

import java.io.PrintStream;
import java.util.List;
import java.util.Set;

import org.trimwright.analysis.FieldInputs;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.units.SiValue;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.spec.SpecLoadException;

/** Prints the register map as a readable table. */
final class SummaryCommand implements Command {

    @Override
    public String summary() {
        return "print the register map as a table (bundled demo when no FILE)";
    }

    @Override
    public String usage() {
        return "trimwright summary [FILE]\n\nPrints blocks, registers and fields: bits, access, role, coding and the"
                + " analog target\n(value at code zero-step, step, and the range over all codes).";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) {
        Args a = Args.parse(args, Set.of(), Set.of());
        if (a.positional().size() > 1) {
            throw new UsageException("expected at most one FILE, got " + a.positional());
        }
        SpecSource src;
        try {
            src = SpecSource.load(a.positional().isEmpty() ? null : a.positional().get(0));
        } catch (SpecLoadException e) {
            err.println("trimwright summary: " + e.getMessage());
            return Main.UNREADABLE;
        }
        print(src.spec(), out);
        return 0;
    }

    static void print(ChipSpec spec, PrintStream out) {
        out.println(spec.getName() + " rev " + nz(spec.getRevision()) + " - " + nz(spec.getDescription()));
        String fmt = "  %-14s %-7s %-12s %-11s %-26s %s%n";
        for (Block b : spec.getBlocks()) {
            out.println();
            out.printf("%s @ 0x%04X  %s%n", b.getName(), b.getBaseAddress(), nz(b.getDescription()));
            for (Register r : b.getRegisters()) {
                out.printf(" %s @ +0x%02X  %d-bit, reset 0x%X%n", r.getName(), r.getAddressOffset(), r.getWidth(),
                        r.getResetValue());
                out.printf(fmt, "field", "bits", "access", "role", "coding", "target");
                for (Field f : r.getFields()) {
                    out.printf(fmt, f.getName(), bits(f), f.getAccess().getLiteral(), f.getRole().getLiteral(),
                            coding(f), target(f));
                }
            }
        }
    }

    private static String bits(Field f) {
        int hi = f.getBitOffset() + f.getWidth() - 1;
        return f.getWidth() == 1 ? "[" + hi + "]" : "[" + hi + ":" + f.getBitOffset() + "]";
    }

    private static String coding(Field f) {
        if (f.getCoding() == null) {
            return "-";
        }
        try {
            FieldCoding c = FieldInputs.of(f).coding();
            StringBuilder sb = new StringBuilder(c.scheme().key());
            if (c.unaryBits() > 0) {
                sb.append(' ').append(c.unaryBits()).append("u+").append(c.binaryBits()).append('b');
            }
            if (c.zeroState()) {
                sb.append(" zero-state");
            }
            if (c.activeLow()) {
                sb.append(" act-low");
            }
            return sb.toString();
        } catch (IllegalArgumentException e) {
            return "invalid: " + e.getMessage();
        }
    }

    private static String target(Field f) {
        if (f.getTarget() == null) {
            return "-";
        }
        try {
            FieldInputs in = FieldInputs.of(f);
            FieldCoding c = in.coding();
            int lo = Integer.MAX_VALUE;
            int hi = Integer.MIN_VALUE;
            for (int code = 0; code < c.codeCount(); code++) {
                int s = c.signedFormat().signedValue(code, c.bits());
                lo = Math.min(lo, s);
                hi = Math.max(hi, s);
            }
            String fmt = c.signedFormat().key();
            return SiValue.format(in.atZero(), in.unit()) + " + s*" + SiValue.format(in.step(), in.unit())
                    + ", s " + lo + ".." + hi + " (" + fmt + "): "
                    + SiValue.format(in.atZero() + lo * in.step(), in.unit()) + " .. "
                    + SiValue.format(in.atZero() + hi * in.step(), in.unit());
        } catch (IllegalArgumentException e) {
            return "invalid: " + e.getMessage();
        }
    }

    private static String nz(String s) {
        return s == null ? "" : s;
    }
}
