package org.trimwright.analysis;

import java.util.List;
import java.util.Optional;
import java.util.function.IntToDoubleFunction;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.design.CodingAnalysis;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.exact.ElementSigmas;
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.exact.ExactYields;
import org.trimwright.engine.logic.DecoderCost;
import org.trimwright.engine.logic.DecoderSynthesis;
import org.trimwright.engine.logic.GateLibrary;
import org.trimwright.engine.memo.BoundedMemo;
import org.trimwright.engine.memo.MemoisedExactYields;
import org.trimwright.engine.mismatch.ElementModel;
import org.trimwright.engine.mismatch.Limits;
import org.trimwright.engine.mismatch.MismatchAnalysis;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvisor;
import org.trimwright.engine.mismatch.sizing.SizingRequest;
import org.trimwright.engine.mismatch.sizing.SizingResult;
import org.trimwright.engine.mismatch.sizing.TrimSizing;
import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Field;

/** Computes the {@link FieldReport} of a model field (or of inline inputs) with the engine. */
public final class FieldAnalyzer {

    /** Monte Carlo trials kept whole for the transfer-curve envelope of charts. */
    public static final int ENVELOPE_TRIALS = 200;
    /**
     * Monte Carlo trials per split of the segmentation advice (n + 1 splits are sampled, so fewer than the field's
     * own run; the advice's union bounds and DNL sigmas are exact regardless).
     */
    public static final long ADVICE_TRIALS = 20_000;

    /** The decoder cost of every segmentation split depends on the coding and the gate library only. */
    private record SplitKey(FieldCoding coding, GateLibrary lib) {
    }

    private static final BoundedMemo<SplitKey, List<DecoderCost>> SPLIT_COSTS = new BoundedMemo<>(1024);

    /**
     * Everything the Monte Carlo statistics and the segmentation advice of a field depend on (the trials are seeded
     * by the settings, so equal keys give equal results; the field's name, step and unit do not enter them).
     */
    private record StatisticsKey(FieldCoding coding, GateLibrary lib, ElementModel model, Limits limits,
            MonteCarloOptions options) {
    }

    /**
     * Widest field whose Monte Carlo report is memoised: a report holds about ten per-level arrays, so 256 reports of
     * at most 2^10 levels stay within about 20 MB.
     */
    static final int SHARED_BITS = 10;

    /** Monte Carlo reports (before advice and sizing) of distinct statistics keys; bounded. */
    private static final BoundedMemo<StatisticsKey, MismatchReport> MONTE_CARLO = new BoundedMemo<>(256);
    /** Segmentation advice of distinct statistics keys; bounded. */
    private static final BoundedMemo<StatisticsKey, SegmentationAdvice> ADVICE = new BoundedMemo<>(256);

    private FieldAnalyzer() {
    }

    /** Analyses a model field; throws {@link FieldMappingException} when the field cannot be mapped. */
    public static FieldReport analyze(Field field, AnalysisSettings settings) {
        FieldInputs in = FieldInputs.of(field);
        MismatchInputs mm = MismatchInputs.of(field);
        return analyze(field.getName(), in, mm, sizing(field), settings);
    }

    /**
     * A cheaper report of a model field for screening a whole spec: the coding figures, the Monte Carlo statistics
     * and the trim sizing, but no segmentation advice (its Monte Carlo runs every split) and no exact rare-event
     * figures ({@code exactMonotonic} and {@code exactDnl} empty). The union bound in the mismatch report is an upper
     * bound of the exact P(non-monotonic), so a field it clears needs no more; for the others ask
     * {@link #analyze(Field, AnalysisSettings)}.
     */
    public static FieldReport analyzeQuick(Field field, AnalysisSettings settings) {
        FieldInputs in = FieldInputs.of(field);
        MismatchInputs mm = MismatchInputs.of(field);
        CodingReport coding = codingOf(field.getName(), in, settings);
        if (mm == null) {
            return new FieldReport(in, settings, coding, Optional.empty(), Optional.empty(), Optional.empty());
        }
        MonteCarloOptions options = options(settings);
        MismatchReport report = statistics(in.coding(), mm, options, settings.gateLibrary());
        SizingRequest sizing = sizing(field);
        SizingResult sized = sizing == null ? null : TrimSizing.size(sizing.withField(report));
        return new FieldReport(in, settings, coding, Optional.of(report.with(null, sized)), Optional.empty(),
                Optional.empty());
    }

    /**
     * Analyses inline inputs.
     *
     * @param mm     mismatch inputs, or null for coding figures only
     * @param sizing trim sizing question without the field's DNL figures (they are filled in), or null
     */
    public static FieldReport analyze(String name, FieldInputs in, MismatchInputs mm, SizingRequest sizing,
            AnalysisSettings settings) {
        CodingReport coding = codingOf(name, in, settings);
        if (mm == null) {
            return new FieldReport(in, settings, coding, Optional.empty(), Optional.empty(), Optional.empty());
        }
        FieldCoding c = in.coding();
        MonteCarloOptions options = options(settings);
        StatisticsKey key = new StatisticsKey(c, settings.gateLibrary(), mm.model(), mm.limits(), options);
        MismatchReport report = statistics(c, mm, options, settings.gateLibrary());
        SegmentationAdvice advice = ADVICE.get(key, k -> SegmentationAdvisor.advise(c.bits(), c.signedFormat(),
                mm.model(), mm.limits(), options.withTrials(Math.min(settings.trials(), ADVICE_TRIALS)),
                splitCost(coding, c, settings.gateLibrary()), SegmentationAdvisor.DEFAULT_SWITCH_NAND2_EQ));
        SizingResult sized = sizing == null ? null : TrimSizing.size(sizing.withField(report));
        report = report.with(advice, sized);
        Optional<ExactMonotonicity> exact = Optional.empty();
        Optional<ExactDnlYield> exactDnl = Optional.empty();
        if (ExactYields.supports(c.scheme()) && exactApplies(mm)) {
            FieldCoding array = arrayCoding(c);
            ElementSigmas sigmas = ElementSigmas.forField(array, mm.model().unitSigma(), mm.model().switchSigma());
            ExactMonotonicity m = MemoisedExactYields.monotonicity(sigmas);
            ExactDnlYield d = MemoisedExactYields.dnlYieldNominal(sigmas, mm.limits().maxDnlLsb());
            if (array != c) {
                String note = "; sign-magnitude: the " + array.bits() + "-bit magnitude array, mirrored by an ideal"
                        + " polarity switch (both zeros are one level), has the field's steps";
                m = new ExactMonotonicity(m.probabilityNonMonotonic(), m.numericalError(), m.method() + note);
                d = new ExactDnlYield(d.limitLsb(), d.yield(), d.numericalError(), d.method() + note, d.definition());
            }
            exact = Optional.of(m);
            exactDnl = Optional.of(d);
        }
        return new FieldReport(in, settings, coding, Optional.of(report), exact, exactDnl);
    }

    private static CodingReport codingOf(String name, FieldInputs in, AnalysisSettings settings) {
        return CodingAnalysis.analyzeShared(name, in.coding(), in.atZero(), in.step(), in.unit(),
                settings.gateLibrary());
    }

    private static MonteCarloOptions options(AnalysisSettings settings) {
        return new MonteCarloOptions(settings.trials(), settings.seed(), settings.threads(),
                (int) Math.min(ENVELOPE_TRIALS, settings.trials()));
    }

    /**
     * The field's Monte Carlo report before advice and sizing, shared (for fields of at most {@link #SHARED_BITS}
     * bits) between the quick and the full report and between fields with equal inputs.
     */
    private static MismatchReport statistics(FieldCoding c, MismatchInputs mm, MonteCarloOptions options,
            GateLibrary lib) {
        if (c.bits() > SHARED_BITS) {
            return MismatchAnalysis.run(c, mm.model(), mm.limits(), options);
        }
        StatisticsKey key = new StatisticsKey(c, lib, mm.model(), mm.limits(), options);
        return MONTE_CARLO.get(key, k -> MismatchAnalysis.run(c, mm.model(), mm.limits(), options));
    }

    /** The exact methods take independent Gaussian elements without gradients. */
    static boolean exactApplies(MismatchInputs mm) {
        return mm.model().gradient().linear() == 0 && mm.model().gradient().quadratic() == 0;
    }

    /**
     * The element array whose steps are the field's steps: the field itself, or for sign-magnitude the (n-1)-bit
     * magnitude array that an ideal polarity switch mirrors (the same model the Monte Carlo uses).
     */
    static FieldCoding arrayCoding(FieldCoding c) {
        if (c.signedFormat() != SignedFormat.SIGN_MAGNITUDE) {
            return c;
        }
        int bits = c.bits() - 1;
        int unary = c.scheme() == CodingScheme.SEGMENTED ? Math.min(c.unaryBits(), bits) : 0;
        return new FieldCoding(bits, c.scheme(), unary, SignedFormat.UNSIGNED, false, c.activeLow());
    }

    private static IntToDoubleFunction splitCost(CodingReport coding, FieldCoding c, GateLibrary lib) {
        List<DecoderCost> splits = coding.splitCosts().isEmpty()
                ? SPLIT_COSTS.get(new SplitKey(c, lib), k -> DecoderSynthesis.costPerSplit(k.coding(), k.lib()))
                : coding.splitCosts();
        return m -> splits.get(m).nand2Equivalent();
    }

    /** The trim sizing question of a field, or null when its target states no spread and accuracy. */
    public static SizingRequest sizing(Field field) {
        AnalogTarget t = field.getTarget();
        if (t == null || !t.isSetSpreadMin() || !t.isSetSpreadMax() || !t.isSetAccuracy()) {
            return null;
        }
        return new SizingRequest(t.getSpreadMin(), t.getSpreadMax(), t.getAccuracy(), t.getUnit(), 0, 0, false, 1,
                field.getWidth());
    }
}
