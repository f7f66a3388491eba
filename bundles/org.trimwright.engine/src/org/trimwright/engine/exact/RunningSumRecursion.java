package org.trimwright.engine.exact;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.trimwright.engine.stats.Normal;

/**
 * The running-sum recursion behind the exact monotonicity and DNL figures.
 * <p>
 * Write binary element k as W_k = 2^k + e_k and the deviation of the running sum as D_k = e_0 + ... + e_k. The
 * step at which bit t switches on and bits 0..t-1 switch off is W_t - (W_0 + ... + W_(t-1)) = 1 + e_t - D_(t-1).
 * A step is accepted when its deviation e_t - D_(t-1) lies in the band (alpha, beta): (-1, +inf) for "no negative
 * step", (-x, x) for "|DNL| &lt; x" with the nominal LSB. The density g_t of D_t restricted to "steps 0..t
 * accepted" obeys
 * <pre>
 *   g_t(d) = integral g_(t-1)(a) phi_t(d - a) 1[alpha &lt; d - 2a &lt; beta] da
 * </pre>
 * (phi_t the N(0, sigma_t^2) density), and the probability that step t is the first rejected one is
 * F_t = integral g_(t-1)(a) P(e_t - a outside (alpha, beta)) da. A unary element U_j = 2^B + u_j is stepped against
 * the full binary sum: U_j - S_B = 1 + u_j - D_(B-1); the u_j are independent given D_(B-1), so the accepted
 * probability of the unary boundaries is the product of P(u_j - d in (alpha, beta)) integrated against g_(B-1).
 * <p>
 * Numerics: every g_t is held as a piecewise Chebyshev interpolant on [-L tau_t, L tau_t] intersected with its
 * exact support (tau_t^2 = sigma_0^2 + ... + sigma_t^2, L = {@value #TRUNCATION}), with panel breaks at the points
 * where the band edges make g_t non-smooth; integrals use Gauss-Legendre rules on sub-intervals no wider than 2
 * sigma of the narrowest Gaussian factor. See docs/exact-methods.md for the error bound.
 */
final class RunningSumRecursion {

    /** Truncation of every density and kernel, in standard deviations. */
    static final double TRUNCATION = 8.5;
    private static final int MAX_PANELS = 600;
    private static final int MAX_BREAKPOINTS = 256;

    /** Discretisation settings: Chebyshev points per panel and Gauss-Legendre nodes per sub-interval. */
    record Settings(int panelPoints, int quadraturePoints, double pieceWidth) {
    }

    static final Settings FINE = new Settings(16, 12, 2.0);
    static final Settings COARSE = new Settings(12, 9, 2.0);

    /**
     * Result of one evaluation.
     *
     * @param pass            probability that every step is accepted
     * @param fail            probability that some step is rejected, summed from the first-rejection masses
     * @param truncationBound rigorous bound on the mass dropped by truncating densities and kernels
     */
    record Outcome(double pass, double fail, double truncationBound) {
    }

    private final double[] sigmas;
    private final Map<Double, Integer> unaryGroups;
    private final double alpha;
    private final double beta;
    private final boolean restrictFirst;
    private final Settings settings;
    private final GaussLegendre rule;

    /**
     * @param elements      element sigmas; all must be &gt; 0 (callers handle zero sigmas)
     * @param alpha         lower band edge of a step deviation (may be -infinity)
     * @param beta          upper band edge (may be +infinity)
     * @param restrictFirst whether step 0 (W_0 alone switching on) is tested against the band too
     */
    RunningSumRecursion(ElementSigmas elements, double alpha, double beta, boolean restrictFirst, Settings settings) {
        this.sigmas = elements.binary();
        this.unaryGroups = new TreeMap<>();
        for (double s : elements.unary()) {
            unaryGroups.merge(s, 1, Integer::sum);
        }
        this.alpha = alpha;
        this.beta = beta;
        this.restrictFirst = restrictFirst;
        this.settings = settings;
        this.rule = new GaussLegendre(settings.quadraturePoints());
    }

    Outcome run() {
        if (sigmas.length == 0) {
            double logPass = unaryLogPass(0.0);
            return new Outcome(Math.exp(logPass), -Math.expm1(logPass), 0.0);
        }
        double tailMass = 2.0 * Normal.upperTail(TRUNCATION);
        double truncation = 0.0;
        double fail = 0.0;
        double s0 = sigmas[0];
        double lo = -TRUNCATION * s0;
        double hi = TRUNCATION * s0;
        truncation += tailMass;
        List<Double> breakpoints = new ArrayList<>();
        if (restrictFirst) {
            fail += outsideBand(0.0, s0);
            if (Double.isFinite(alpha) && alpha > lo) {
                lo = alpha;
                breakpoints.add(alpha);
            }
            if (Double.isFinite(beta) && beta < hi) {
                hi = beta;
                breakpoints.add(beta);
            }
        }
        if (!(hi > lo)) {
            return new Outcome(0.0, fail, truncation);
        }
        ChebyshevPanels g = ChebyshevPanels.interpolate(panelBreaks(lo, hi, s0, List.of()),
                settings.panelPoints(), d -> Normal.density(d / s0) / s0);
        double tau = s0;
        for (int t = 1; t < sigmas.length; t++) {
            double sigma = sigmas[t];
            fail += firstRejection(g, sigma);
            tau = Math.hypot(tau, sigma);
            double newLo = Math.max(Math.max(-TRUNCATION * tau, g.lower() - TRUNCATION * sigma),
                    2.0 * g.lower() + alpha);
            double newHi = Math.min(Math.min(TRUNCATION * tau, g.upper() + TRUNCATION * sigma),
                    2.0 * g.upper() + beta);
            truncation += 2.0 * tailMass;
            breakpoints = propagate(breakpoints, newLo, newHi);
            if (!(newHi > newLo)) {
                return new Outcome(0.0, fail, truncation);
            }
            ChebyshevPanels previous = g;
            g = ChebyshevPanels.interpolate(panelBreaks(newLo, newHi, Math.min(tau, sigma), breakpoints),
                    settings.panelPoints(), d -> convolveInBand(previous, sigma, d));
        }
        double[] passFail = unaryStage(g);
        return new Outcome(passFail[0], fail + passFail[1], truncation);
    }

    /** P(e outside (alpha, beta) + d) for e ~ N(0, sigma^2): the rejection probability of a step given d. */
    private double outsideBand(double d, double sigma) {
        double below = Double.isFinite(alpha) ? Normal.cdf((d + alpha) / sigma) : 0.0;
        double above = Double.isFinite(beta) ? Normal.upperTail((d + beta) / sigma) : 0.0;
        return below + above;
    }

    private List<Double> propagate(List<Double> previous, double lo, double hi) {
        List<Double> next = new ArrayList<>();
        for (double b : previous) {
            for (double edge : new double[] {alpha, beta}) {
                double p = 2.0 * b + edge;
                if (Double.isFinite(p) && p > lo && p < hi && next.size() < MAX_BREAKPOINTS) {
                    next.add(p);
                }
            }
        }
        return next;
    }

    /** Uniform panels of width at most 1.5 * scale over [lo, hi], with the given breakpoints inserted. */
    private double[] panelBreaks(double lo, double hi, double scale, List<Double> breakpoints) {
        int count = (int) Math.min(MAX_PANELS, Math.ceil((hi - lo) / (1.5 * scale)));
        count = Math.max(count, 1);
        double width = (hi - lo) / count;
        TreeMap<Double, Boolean> all = new TreeMap<>();
        for (int i = 0; i <= count; i++) {
            all.put(i == count ? hi : lo + i * width, Boolean.FALSE);
        }
        for (double b : breakpoints) {
            if (b > lo && b < hi) {
                // a forced break replaces uniform breaks that lie too close to it
                all.subMap(b - 0.2 * width, true, b + 0.2 * width, true).entrySet()
                        .removeIf(e -> !e.getValue() && e.getKey() != lo && e.getKey() != hi);
                all.put(b, Boolean.TRUE);
            }
        }
        double[] breaks = new double[all.size()];
        int i = 0;
        for (double b : all.keySet()) {
            breaks[i++] = b;
        }
        return breaks;
    }

    /** g_t(d): integral of g_(t-1)(a) phi(d - a) over alpha &lt; d - 2a &lt; beta. */
    private double convolveInBand(ChebyshevPanels previous, double sigma, double d) {
        double u = Math.max(previous.lower(), d - TRUNCATION * sigma);
        double v = Math.min(previous.upper(), d + TRUNCATION * sigma);
        if (Double.isFinite(beta)) {
            u = Math.max(u, 0.5 * (d - beta));
        }
        if (Double.isFinite(alpha)) {
            v = Math.min(v, 0.5 * (d - alpha));
        }
        if (!(v > u)) {
            return 0.0;
        }
        double inverse = 1.0 / sigma;
        double sum = 0.0;
        double maxPiece = settings.pieceWidth() * sigma;
        for (int i = 0; i < previous.panelCount(); i++) {
            double a = Math.max(u, previous.panelLower(i));
            double b = Math.min(v, previous.panelUpper(i));
            if (!(b > a)) {
                continue;
            }
            int pieces = (int) Math.ceil((b - a) / maxPiece);
            double step = (b - a) / pieces;
            for (int k = 0; k < pieces; k++) {
                double pa = a + k * step;
                double pb = k == pieces - 1 ? b : pa + step;
                for (int q = 0; q < rule.size(); q++) {
                    double x = rule.node(q, pa, pb);
                    double z = (d - x) * inverse;
                    sum += rule.weight(q, pa, pb) * previous.valueInPanel(i, x) * Math.exp(-0.5 * z * z);
                }
            }
        }
        return sum * inverse * 0.3989422804014327;
    }

    /** F_t = integral g(a) P(step t rejected | D = a) da. */
    private double firstRejection(ChebyshevPanels g, double sigma) {
        double sum = 0.0;
        double maxPiece = settings.pieceWidth() * sigma;
        for (int i = 0; i < g.panelCount(); i++) {
            double a = g.panelLower(i);
            double b = g.panelUpper(i);
            int pieces = (int) Math.ceil((b - a) / maxPiece);
            double step = (b - a) / pieces;
            for (int k = 0; k < pieces; k++) {
                double pa = a + k * step;
                double pb = k == pieces - 1 ? b : pa + step;
                for (int q = 0; q < rule.size(); q++) {
                    double x = rule.node(q, pa, pb);
                    sum += rule.weight(q, pa, pb) * g.valueInPanel(i, x) * outsideBand(x, sigma);
                }
            }
        }
        return sum;
    }

    /** log of the probability that every unary boundary step is accepted, given D_(B-1) = d. */
    private double unaryLogPass(double d) {
        double log = 0.0;
        for (Map.Entry<Double, Integer> group : unaryGroups.entrySet()) {
            double sigma = group.getKey();
            double reject = sigma == 0.0 ? (d + alpha < 0.0 && d + beta > 0.0 ? 0.0 : 1.0) : outsideBand(d, sigma);
            if (reject >= 1.0) {
                return Double.NEGATIVE_INFINITY;
            }
            log += group.getValue() * Math.log1p(-reject);
        }
        return log;
    }

    /** {pass, fail} of the final stage: integral of g(d) times P(all unary accepted | d) and its complement. */
    private double[] unaryStage(ChebyshevPanels g) {
        double width = Double.POSITIVE_INFINITY;
        for (Map.Entry<Double, Integer> group : unaryGroups.entrySet()) {
            double sharpness = 1.0 + Math.sqrt(2.0 * Math.log(group.getValue() + 1.0));
            width = Math.min(width, group.getKey() / sharpness);
        }
        double pass = 0.0;
        double fail = 0.0;
        for (int i = 0; i < g.panelCount(); i++) {
            double a = g.panelLower(i);
            double b = g.panelUpper(i);
            int pieces = Double.isFinite(width) && width > 0 ? (int) Math.ceil((b - a) / (settings.pieceWidth()
                    * width)) : 1;
            pieces = Math.min(Math.max(pieces, 1), 10_000);
            double step = (b - a) / pieces;
            for (int k = 0; k < pieces; k++) {
                double pa = a + k * step;
                double pb = k == pieces - 1 ? b : pa + step;
                for (int q = 0; q < rule.size(); q++) {
                    double x = rule.node(q, pa, pb);
                    double mass = rule.weight(q, pa, pb) * g.valueInPanel(i, x);
                    double logPass = unaryGroups.isEmpty() ? 0.0 : unaryLogPass(x);
                    pass += mass * Math.exp(logPass);
                    fail += mass * -Math.expm1(logPass);
                }
            }
        }
        return new double[] {pass, fail};
    }
}
