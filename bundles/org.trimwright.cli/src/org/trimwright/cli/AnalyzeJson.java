package org.trimwright.cli;

import java.util.Map;

import org.trimwright.analysis.FieldInputs;
import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.StepRow;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.glitch.GlitchAdvice;
import org.trimwright.engine.glitch.GlitchStep;
import org.trimwright.engine.json.JsonWriter;
import org.trimwright.engine.logic.DecoderCost;
import org.trimwright.engine.logic.GateType;

/** The JSON of {@code analyze --json}; keys are a contract documented in docs/analyze-json.md. */
final class AnalyzeJson {

    private AnalyzeJson() {
    }

    /** Above this many output bits in the whole step table (codes x outputs), {@code outputs} strings are omitted. */
    static final long OUTPUT_BITS_LIMIT = 1L << 22;
    /** Above this many gates the gate-level Verilog is omitted ({@code verilogGates}: null). */
    static final int GATE_VERILOG_LIMIT = 20_000;

    static String write(FieldReport report) {
        FieldInputs in = report.inputs();
        CodingReport r = report.coding();
        JsonWriter w = new JsonWriter().beginObject();
        field(w, in, r);
        w.key("settings").beginObject().field("trials", report.settings().trials())
                .field("seed", report.settings().seed()).field("maxFanIn", report.settings().maxFanIn()).endObject();
        codes(w, r);
        w.key("cost");
        cost(w, r.cost());
        w.key("costPerSplit").beginArray();
        for (DecoderCost c : r.splitCosts()) {
            cost(w, c);
        }
        w.endArray();
        glitch(w, r);
        w.field("verilog", r.verilog());
        w.field("verilogGates", r.netlist().gates().size() <= GATE_VERILOG_LIMIT ? r.gateVerilog() : null);
        MismatchJson.write(w, report);
        return w.endObject().toJson();
    }

    private static void field(JsonWriter w, FieldInputs in, CodingReport r) {
        FieldCoding c = in.coding();
        w.key("field").beginObject()
                .field("path", in.path())
                .field("name", r.name())
                .field("bits", c.bits())
                .field("coding", c.scheme().key())
                .field("unaryBits", c.unaryBits())
                .field("signed", c.signedFormat().key())
                .field("zeroState", c.zeroState())
                .field("activeLow", c.activeLow())
                .field("unit", in.unit().symbol())
                .field("atZero", in.atZero())
                .field("step", in.step())
                .key("outputNames").beginArray();
        for (String n : r.stepTable().map().layout().names()) {
            w.value(n);
        }
        w.endArray().endObject();
    }

    private static void codes(JsonWriter w, CodingReport r) {
        int k = r.stepTable().map().layout().size();
        boolean withOutputs = (long) k * r.stepTable().size() <= OUTPUT_BITS_LIMIT;
        w.key("codes").beginArray();
        for (StepRow row : r.stepTable().rows()) {
            w.beginObject()
                    .field("code", row.code())
                    .field("registerBits", row.registerBits())
                    .field("signedSteps", row.signedSteps())
                    .field("level", row.level())
                    .field("value", row.value())
                    .field("outputs", withOutputs ? row.outputBits(k) : null)
                    .field("unitsInUse", row.unitsInUse())
                    .field("tap", row.tap())
                    .key("closedSwitches");
            if (withOutputs) {
                w.beginArray();
                for (String s : row.closedSwitches()) {
                    w.value(s);
                }
                w.endArray();
            } else {
                w.nullValue();
            }
            w.endObject();
        }
        w.endArray();
    }

    static void cost(JsonWriter w, DecoderCost c) {
        w.beginObject()
                .field("switches", c.switches())
                .field("unitElements", c.unitElements())
                .field("decoderOutputs", c.decoderOutputs())
                .key("gates").beginObject();
        for (Map.Entry<GateType, Integer> e : c.gates().entrySet()) {
            w.field(e.getKey().name(), e.getValue());
        }
        w.endObject()
                .field("transistors", c.transistors())
                .field("nand2Equivalent", c.nand2Equivalent())
                .field("method", c.method())
                .endObject();
    }

    private static void glitch(JsonWriter w, CodingReport r) {
        GlitchStep worst = r.glitch().worst();
        w.key("glitch").beginObject()
                .field("worstExcursionLsb", r.glitch().worstExcursionLsb())
                .field("worstExcursion", worst.excursionUnit())
                .key("worstTransition").beginArray().value(worst.fromCode()).value(worst.toCode()).endArray()
                .field("glitchingSteps", r.glitch().glitchingSteps())
                .field("definition", "adjacent steps in value order; intermediate register codes are from XOR S for"
                        + " every subset S of the toggling bits (any input skew); excursion = distance outside the"
                        + " two end values")
                .key("steps").beginArray();
        for (GlitchStep s : r.glitch().steps()) {
            w.beginObject().field("from", s.fromCode()).field("to", s.toCode())
                    .field("toggledBits", s.toggleCount()).field("worstCode", s.worstCode())
                    .field("excursionLsb", s.excursionLsb()).endObject();
        }
        w.endArray().key("advice").beginArray();
        for (GlitchAdvice a : r.glitch().advice()) {
            w.beginObject().field("remedy", a.remedy()).field("text", a.text()).field("flops", a.flops())
                    .field("xorGates", a.xorGates()).field("nand2Equivalent", a.nand2Equivalent()).endObject();
        }
        w.endArray().endObject();
    }
}
