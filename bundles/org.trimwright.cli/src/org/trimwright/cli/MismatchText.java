package org.trimwright.cli;

import java.io.PrintStream;

import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.sequence.SequenceRow;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SegmentationRow;
import org.trimwright.engine.mismatch.sizing.SizingResult;
import org.trimwright.engine.units.SiValue;

/** The statistics part of the text report; every figure says whether it is exact, bounded or sampled. */
final class MismatchText {

    private MismatchText() {
    }

    static void print(FieldReport report, PrintStream out) {
        if (report.mismatch().isEmpty()) {
            out.println();
            out.println("Mismatch statistics: off (no unit element; inline: give --unit-sigma PERCENT)");
            return;
        }
        MismatchReport m = report.mismatch().get();
        out.println();
        out.printf("Mismatch (unit sigma %.4g %%, switch share %.4g %%, %d trials, seed %d, %d threads, %.2f s)%n",
                100 * m.model().unitSigma(), 100 * m.model().switchSigma(), m.run().trials(), m.run().seed(),
                m.run().threads(), m.run().seconds());
        monotonic(report, m, out);
        MismatchReport.DnlSummary d = m.dnl();
        out.printf("  DNL (nominal LSB): worst sigma %.4g LSB at %s [exact]%n", d.sigmaWorst(), d.worstTransition());
        out.printf("    P(max|DNL| < %.3g LSB) = %.6g [sampled, 95%% CI %.6g..%.6g]%n", d.limit(), d.yield(),
                d.yieldCi95()[0], d.yieldCi95()[1]);
        if (report.exactDnl().isPresent()) {
            ExactDnlYield e = report.exactDnl().get();
            out.printf("    P(max|DNL| < %.3g LSB) = %.10g +- %.2g [exact: %s]%n", e.limitLsb(), e.yield(),
                    e.numericalError(), e.method());
        }
        out.println("  INL: definition      worst sigma  mean max|INL|  P(<0.5 LSB)  P(<limit) [sampled]");
        for (MismatchReport.InlFigures f : new MismatchReport.InlFigures[] {m.inl().endpoint(), m.inl().bestFit(),
            m.inl().absolute()}) {
            out.printf("       %-15s %11.4g %14.4g %12.6g %10.6g%n", f.definition(), f.sigmaWorst(),
                    f.meanMaxAbs(), f.yieldHalfLsb(), f.yield());
        }
        segmentation(m.segmentation(), out);
        if (m.gradients() != null && !m.gradients().rows().isEmpty()) {
            out.printf("  Unary switching sequences under gradient (linear %.3g, quadratic %.3g%s): endpoint INL%n",
                    m.gradients().gradientLinear(), m.gradients().gradientQuadratic(),
                    m.gradients().reference() ? ", reference gradient" : "");
            for (SequenceRow r : m.gradients().rows()) {
                out.printf("    %-14s %10.4g LSB  (x%.3g better than sequential)%n", r.sequence(), r.endpoint(),
                        r.improvement());
            }
        }
        sizing(m.sizing(), out);
    }

    private static void monotonic(FieldReport report, MismatchReport m, PrintStream out) {
        MismatchReport.Monotonicity mo = m.monotonic();
        if (mo.guaranteed()) {
            out.println("  Monotonic: guaranteed by construction (" + mo.method() + ")");
            return;
        }
        MismatchReport.MonteCarloEstimate mc = mo.monteCarlo();
        out.printf("  P(non-monotonic): union bound %.4g [bounded]; largest single step %.4g [exact]%n",
                mo.unionBound(), mo.largestSingle());
        out.printf("    Monte Carlo %.4g (%d of %d), 95%% %s CI %.4g..%.4g [sampled]%n", mc.estimate(), mc.count(),
                mc.trials(), mc.interval(), mc.ci95Low(), mc.ci95High());
        if (report.exactMonotonic().isPresent()) {
            ExactMonotonicity e = report.exactMonotonic().get();
            out.printf("    exact %.10g +- %.2g [exact: %s]%n", e.probabilityNonMonotonic(), e.numericalError(),
                    e.method());
        }
    }

    private static void segmentation(SegmentationAdvice a, PrintStream out) {
        if (a == null) {
            return;
        }
        out.println("  Segmentation advice (" + a.method() + ")");
        out.println("     M  unary  switches  decoder NAND2eq  sigma DNL  P(non-mono) bound  DNL yield  pass  meets");
        for (SegmentationRow r : a.rows()) {
            out.printf("    %2d %6d %9d %16.1f %10.4g %18.4g %10.4g %5.3f  %s%n", r.unaryBits(), r.unaryElements(),
                    r.switches(), r.decoderNand2Eq(), r.sigmaDnlWorst(),
                    r.monotonicGuaranteed() ? 0.0 : r.pNonMonotonicBound(), r.dnlYield(), r.passYield(),
                    r.meetsLimits() ? (r.unaryBits() == a.cheapestMeeting() ? "yes (cheapest)" : "yes") : "no");
        }
    }

    private static void sizing(SizingResult s, PrintStream out) {
        if (s == null) {
            return;
        }
        org.trimwright.engine.units.SiUnit unit;
        try {
            unit = org.trimwright.engine.units.SiUnit.fromSymbol(s.unit());
        } catch (IllegalArgumentException e) {
            unit = org.trimwright.engine.units.SiUnit.NONE;
        }
        out.printf("  Trim sizing: range %s needs %d bits (step <= %s); with %d bits: step %s, residual worst %s,"
                + " rms %s -> %s%n", SiValue.format(s.range(), unit), s.bitsNeeded(), SiValue.format(s.maxStep(), unit),
                s.bits(), SiValue.format(s.step(), unit), SiValue.format(s.residualWorst(), unit),
                SiValue.format(s.residualRms(), unit), s.meetsAccuracy() ? "meets the accuracy" : "MISSES the accuracy");
        out.printf("    production search: %s, %d measurements (%s)%n", s.search(), s.measurements(), s.note());
    }
}
