package org.trimwright.cli;

import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.json.JsonWriter;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.Transition;
import org.trimwright.engine.mismatch.sequence.GradientStudy;
import org.trimwright.engine.mismatch.sequence.SequenceRow;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SegmentationRow;
import org.trimwright.engine.mismatch.sizing.SizingResult;

/** The mismatch keys of {@code analyze --json} (docs/analyze-json.md): monotonic, dnl, inl, segmentation, ... */
final class MismatchJson {

    private MismatchJson() {
    }

    static void write(JsonWriter w, FieldReport report) {
        if (report.mismatch().isEmpty()) {
            return;
        }
        MismatchReport m = report.mismatch().get();
        w.key("element").beginObject().field("unitSigma", m.model().unitSigma())
                .field("switchSigma", m.model().switchSigma())
                .field("gradientLinear", m.model().gradient().linear())
                .field("gradientQuadratic", m.model().gradient().quadratic())
                .field("sequence", m.model().sequence().key()).endObject();
        w.key("limits").beginObject().field("maxDnlLsb", m.limits().maxDnlLsb())
                .field("maxInlLsb", m.limits().maxInlLsb()).field("inlDefinition", m.limits().inlDefinition().key())
                .field("targetYield", m.limits().targetYield())
                .field("maxNonMonotonic", m.limits().maxNonMonotonic()).endObject();
        monotonic(w, m, report);
        dnl(w, m, report);
        inl(w, m);
        transitions(w, m);
        segmentation(w, m.segmentation());
        gradients(w, m.gradients());
        sizing(w, m.sizing());
        w.key("run").beginObject().field("trials", m.run().trials()).field("seed", m.run().seed())
                .field("threads", m.run().threads()).field("seconds", m.run().seconds())
                .field("trialsPerSecond", m.run().trialsPerSecond()).field("method", m.run().method()).endObject();
    }

    private static void monotonic(JsonWriter w, MismatchReport m, FieldReport report) {
        MismatchReport.Monotonicity mo = m.monotonic();
        MismatchReport.MonteCarloEstimate mc = mo.monteCarlo();
        w.key("monotonic").beginObject()
                .field("guaranteed", mo.guaranteed())
                .field("method", mo.method())
                .field("unionBound", mo.unionBound())
                .field("largestSingle", mo.largestSingle())
                .key("monteCarlo").beginObject()
                .field("estimate", mc.estimate()).field("ci95Low", mc.ci95Low()).field("ci95High", mc.ci95High())
                .field("trials", mc.trials()).field("count", mc.count()).field("interval", mc.interval())
                .endObject();
        w.key("exact");
        if (report.exactMonotonic().isPresent()) {
            ExactMonotonicity e = report.exactMonotonic().get();
            w.beginObject().field("probabilityNonMonotonic", e.probabilityNonMonotonic())
                    .field("numericalError", e.numericalError()).field("method", e.method()).endObject();
        } else {
            w.nullValue();
        }
        w.endObject();
    }

    private static void dnl(JsonWriter w, MismatchReport m, FieldReport report) {
        MismatchReport.DnlSummary d = m.dnl();
        double[] ci = d.yieldCi95();
        w.key("dnl").beginObject()
                .field("definition", d.definition())
                .field("sigmaWorst", d.sigmaWorst())
                .field("worstTransition", d.worstTransition())
                .field("limit", d.limit())
                .field("yield", d.yield())
                .key("yieldCi95").beginArray().value(ci[0]).value(ci[1]).endArray()
                .field("meanMaxAbs", d.meanMaxAbs())
                .field("meanMaxAbsEndpointLsb", d.meanMaxAbsEndpointLsb())
                .field("quantileAtTargetYield", d.quantileAtTargetYield());
        w.key("exactYield");
        if (report.exactDnl().isPresent()) {
            ExactDnlYield e = report.exactDnl().get();
            w.beginObject().field("limitLsb", e.limitLsb()).field("yield", e.yield())
                    .field("numericalError", e.numericalError()).field("method", e.method())
                    .field("definition", e.definition()).endObject();
        } else {
            w.nullValue();
        }
        w.endObject();
    }

    private static void inl(JsonWriter w, MismatchReport m) {
        w.key("inl").beginObject();
        inlFigures(w, "endpoint", m.inl().endpoint());
        inlFigures(w, "bestFit", m.inl().bestFit());
        inlFigures(w, "absolute", m.inl().absolute());
        w.endObject();
    }

    private static void inlFigures(JsonWriter w, String key, MismatchReport.InlFigures f) {
        w.key(key).beginObject().field("definition", f.definition()).field("sigmaWorst", f.sigmaWorst())
                .field("worstLevel", f.worstLevel()).field("meanMaxAbs", f.meanMaxAbs())
                .field("yieldHalfLsb", f.yieldHalfLsb()).field("limit", f.limit()).field("yield", f.yield())
                .field("quantileAtTargetYield", f.quantileAtTargetYield()).endObject();
    }

    private static void transitions(JsonWriter w, MismatchReport m) {
        w.key("transitions").beginArray();
        for (Transition t : m.transitions()) {
            w.beginObject().field("kind", t.kind()).field("label", t.label()).field("fromLevel", t.fromLevel())
                    .field("occurrences", t.occurrences()).field("mean", t.mean()).field("sigma", t.sigma())
                    .field("pNegative", t.pNegative()).endObject();
        }
        w.endArray();
    }

    private static void segmentation(JsonWriter w, SegmentationAdvice a) {
        w.key("segmentation");
        if (a == null) {
            w.nullValue();
            return;
        }
        w.beginObject().field("cheapestMeeting", a.cheapestMeeting()).field("method", a.method()).key("rows")
                .beginArray();
        for (SegmentationRow r : a.rows()) {
            w.beginObject().field("unaryBits", r.unaryBits()).field("binaryBits", r.binaryBits())
                    .field("unaryElements", r.unaryElements()).field("switches", r.switches())
                    .field("decoderNand2Eq", r.decoderNand2Eq()).field("cost", r.cost())
                    .field("sigmaDnlWorst", r.sigmaDnlWorst()).field("monotonicGuaranteed", r.monotonicGuaranteed())
                    .field("pNonMonotonicBound", r.pNonMonotonicBound()).field("pNonMonotonicMc", r.pNonMonotonicMc())
                    .field("dnlYield", r.dnlYield()).field("inlYieldEndpoint", r.inlYieldEndpoint())
                    .field("inlYieldBestFit", r.inlYieldBestFit()).field("inlYieldAbsolute", r.inlYieldAbsolute())
                    .field("passYield", r.passYield()).field("meetsLimits", r.meetsLimits()).endObject();
        }
        w.endArray().endObject();
    }

    private static void gradients(JsonWriter w, GradientStudy g) {
        w.key("gradients");
        if (g == null) {
            w.nullValue();
            return;
        }
        w.beginObject().field("linear", g.gradientLinear()).field("quadratic", g.gradientQuadratic())
                .field("reference", g.reference()).field("best", g.best()).key("sequences").beginArray();
        for (SequenceRow r : g.rows()) {
            w.beginObject().field("sequence", r.sequence()).field("endpoint", r.endpoint())
                    .field("bestFit", r.bestFit()).field("absolute", r.absolute())
                    .field("linearEndpoint", r.linearEndpoint()).field("quadraticEndpoint", r.quadraticEndpoint())
                    .field("improvement", r.improvement()).endObject();
        }
        w.endArray().endObject();
    }

    private static void sizing(JsonWriter w, SizingResult s) {
        w.key("sizing");
        if (s == null) {
            w.nullValue();
            return;
        }
        w.beginObject().field("unit", s.unit()).field("range", s.range()).field("maxStep", s.maxStep())
                .field("bitsNeeded", s.bitsNeeded()).field("bits", s.bits()).field("step", s.step())
                .field("residualWorst", s.residualWorst()).field("residualRms", s.residualRms())
                .field("meetsAccuracy", s.meetsAccuracy()).field("search", s.search())
                .field("measurements", s.measurements()).field("linearMeasurements", s.linearMeasurements())
                .field("binarySearchRisk", s.binarySearchRisk()).field("note", s.note()).endObject();
    }
}
