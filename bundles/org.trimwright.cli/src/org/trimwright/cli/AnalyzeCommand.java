package org.trimwright.cli;

import java.io.PrintStream;
import java.util.List;
import java.util.Set;

import org.trimwright.analysis.FieldInputs;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.design.CodingAnalysis;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.logic.GateLibrary;
import org.trimwright.engine.units.SiValue;
import org.trimwright.model.Field;
import org.trimwright.model.spec.ElementPaths;
import org.trimwright.model.spec.SpecLoadException;

/** Analyses one field, from a spec file or given inline. */
final class AnalyzeCommand implements Command {

    static final Set<String> VALUE_OPTIONS = Set.of("bits", "coding", "unary-bits", "signed", "at-zero", "step",
            "gates");
    static final Set<String> FLAGS = Set.of("json", "zero-state", "active-low", "verilog");

    @Override
    public String summary() {
        return "analyse one field: step table, decoder cost, glitches, Verilog";
    }

    @Override
    public String usage() {
        return "trimwright analyze (FILE BLOCK/REGISTER/FIELD | --bits N --coding SCHEME --at-zero VALUE --step VALUE)"
                + " [options]\n\n"
                + "  --bits N                 field width, 1..16\n"
                + "  --coding SCHEME          binary | thermometer | one-hot | one-cold | gray | segmented\n"
                + "  --unary-bits M           unary MSBs of a segmented field (1..N)\n"
                + "  --signed FORMAT          offset-binary | twos-complement | sign-magnitude (default unsigned)\n"
                + "  --zero-state             select decoders: code 0 drives nothing\n"
                + "  --active-low             switch controls are inverted (PMOS-side switches)\n"
                + "  --at-zero VALUE          value at signed step 0, with SI unit (e.g. 1.2V, 0A)\n"
                + "  --step VALUE             value of one step (LSB), with SI unit (e.g. 4mV, 1.5uA)\n"
                + "  --gates 2|3              largest gate fan-in of the decoder library (default 2)\n"
                + "  --json                   one JSON object (schema: docs/analyze-json.md)\n"
                + "  --verilog                text report: also print the decoder module and testbench";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) {
        Args a = Args.parse(args, VALUE_OPTIONS, FLAGS);
        Request req;
        if (!a.positional().isEmpty()) {
            if (a.positional().size() != 2) {
                throw new UsageException("expected FILE and BLOCK/REGISTER/FIELD, got " + a.positional());
            }
            for (String inline : List.of("bits", "coding", "unary-bits", "signed", "at-zero", "step")) {
                if (a.has(inline)) {
                    throw new UsageException("--" + inline + " describes an inline field; it cannot be combined"
                            + " with a spec file");
                }
            }
            try {
                req = fromFile(a.positional().get(0), a.positional().get(1));
            } catch (SpecLoadException e) {
                err.println("trimwright analyze: " + e.getMessage());
                return Main.UNREADABLE;
            }
        } else {
            req = inline(a);
        }
        GateLibrary lib = a.integer("gates", 2, 3, 2) == 3 ? GateLibrary.THREE_INPUT : GateLibrary.TWO_INPUT;
        CodingReport report;
        try {
            report = CodingAnalysis.analyze(req.name(), req.inputs().coding(), req.inputs().atZero(),
                    req.inputs().step(), req.inputs().unit(), lib);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        if (a.flag("json")) {
            out.println(AnalyzeJson.write(req.inputs(), report));
        } else {
            AnalyzeText.print(req.inputs(), report, a.flag("verilog"), out);
        }
        return 0;
    }

    record Request(String name, FieldInputs inputs) {
    }

    private static Request fromFile(String file, String path) throws SpecLoadException {
        SpecSource src = SpecSource.load(file);
        Field f = ElementPaths.findField(src.spec(), path);
        if (f == null) {
            throw new UsageException(file + ": no field '" + path + "' (expected BLOCK/REGISTER/FIELD)");
        }
        try {
            return new Request(f.getName(), FieldInputs.of(f));
        } catch (IllegalArgumentException e) {
            throw new UsageException(file + ": " + e.getMessage());
        }
    }

    private static Request inline(Args a) {
        int bits = a.integer("bits", 1, FieldCoding.MAX_BITS, -1);
        if (bits < 0) {
            throw new UsageException("option --bits is required (or give FILE BLOCK/REGISTER/FIELD)");
        }
        CodingScheme scheme;
        SignedFormat format;
        SiValue atZero;
        SiValue step;
        try {
            scheme = CodingScheme.fromKey(a.required("coding"));
            format = a.has("signed") ? SignedFormat.fromKey(a.value("signed")) : SignedFormat.UNSIGNED;
            atZero = SiValue.parse(a.required("at-zero"));
            step = SiValue.parse(a.required("step"));
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        if (scheme == CodingScheme.SEGMENTED && !a.has("unary-bits")) {
            throw new UsageException("--coding segmented needs --unary-bits M (1.." + bits + ")");
        }
        if (scheme != CodingScheme.SEGMENTED && a.has("unary-bits")) {
            throw new UsageException("--unary-bits applies to --coding segmented only");
        }
        int unary = a.integer("unary-bits", 1, bits, 0);
        if (step.unit() != atZero.unit() && !(atZero.value() == 0 && atZero.unit().symbol().isEmpty())) {
            throw new UsageException("--at-zero " + a.value("at-zero") + " and --step " + a.value("step")
                    + " have different units");
        }
        FieldCoding coding;
        try {
            coding = new FieldCoding(bits, scheme, unary, format, a.flag("zero-state"), a.flag("active-low"));
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        String name = "field_" + bits + "b_" + scheme.key().replace('-', '_');
        return new Request(name, new FieldInputs("(inline)", coding, atZero.value(), step.value(), step.unit()));
    }
}
