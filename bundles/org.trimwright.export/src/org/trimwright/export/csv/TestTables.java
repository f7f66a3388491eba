package org.trimwright.export.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.List;
import java.util.Locale;

import org.trimwright.engine.coding.StepRow;
import org.trimwright.engine.coding.StepTable;
import org.trimwright.export.ExportedField;
import org.trimwright.export.text.CsvCells;
import org.trimwright.model.AnalogTarget;

/**
 * The test table of one field for production trim programs (RFC 4180 CSV, one header row, one row per code).
 * Columns: {@link #HEADER}. User text is neutralised against spreadsheet formulas by {@link CsvCells}.
 */
public final class TestTables {

    /** The header row. */
    public static final List<String> HEADER = List.of("field", "address", "code", "register_value", "register_bits",
            "signed_step", "expected_value", "unit", "within_safe_limits");

    private TestTables() {
    }

    /** Writes the table of an analysed field. */
    public static void write(ExportedField f, Writer out) throws IOException {
        out.write(String.join(",", HEADER));
        out.write("\r\n");
        StepTable st = f.report().coding().stepTable();
        String unit = f.report().inputs().unit().symbol();
        String path = CsvCells.text(f.path());
        String address = String.format(Locale.ROOT, "0x%08X", f.address());
        AnalogTarget t = f.field().getTarget();
        for (StepRow row : st.rows()) {
            out.write(path);
            out.write(',');
            out.write(address);
            out.write(',');
            out.write(CsvCells.number((long) row.code()));
            out.write(',');
            out.write("0x");
            out.write(Long.toHexString(f.registerValue(row.code())).toUpperCase(Locale.ROOT));
            out.write(',');
            out.write(row.registerBits());
            out.write(',');
            out.write(CsvCells.number((long) row.signedSteps()));
            out.write(',');
            out.write(CsvCells.number(row.value()));
            out.write(',');
            out.write(CsvCells.text(unit));
            out.write(',');
            out.write(safe(t, row.value()));
            out.write("\r\n");
        }
    }

    private static String safe(AnalogTarget t, double v) {
        if (t == null || (!t.isSetSafeMin() && !t.isSetSafeMax())) {
            return "no_limits";
        }
        boolean ok = (!t.isSetSafeMin() || v >= t.getSafeMin()) && (!t.isSetSafeMax() || v <= t.getSafeMax());
        return ok ? "yes" : "no";
    }
}
