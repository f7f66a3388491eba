package org.trimwright.engine.exact;

/**
 * Endpoint INL yield of unary and segmented arrays from the Brownian-bridge limit.
 * <p>
 * For a unary array of N independent elements with sigma s (units), the endpoint INL at code k is, to first order
 * in s, u_0 + ... + u_(k-1) - (k / N)(u_0 + ... + u_(N-1)): a Gaussian random-walk bridge. As N grows,
 * max_k |INL_k| / (s sqrt N) tends in law to sup |B(t)| of a Brownian bridge, whose distribution is Kolmogorov's
 * K(z) = 1 - 2 sum_(k&gt;=1) (-1)^(k-1) exp(-2 k^2 z^2) (A. N. Kolmogorov, "Sulla determinazione empirica di una
 * legge di distribuzione", Giorn. Ist. Ital. Attuari 4 (1933) 83-91). The bridge description of unary INL is that of
 * M. Heydenreich, R. van der Hofstad and G. Radulov, arXiv math/0606584.
 * <p>
 * Finite-size correction: the maximum of a discrete Gaussian walk falls short of the continuous one; D. Siegmund's
 * corrected diffusion approximation ("Corrected diffusion approximations in certain random walk problems", Adv.
 * Appl. Prob. 11 (1979) 701-719) moves the boundary out by rho s with rho = -zeta(1/2) / sqrt(2 pi) = 0.5826 for
 * Gaussian steps. Here it is applied to both boundaries of the two-sided bridge: yield = K((a + rho s) / (s sqrt N)).
 * This is an approximation; its agreement with Monte Carlo is checked in the tests.
 * <p>
 * Segmented arrays: the codes at the unary segment boundaries, closed by the full binary part at full scale, form a
 * bridge of N + 1 steps of sigma about s_U (the binary part's sum has sigma close to a unary element's); the
 * maximum over all codes can only be larger, so this estimate lies above the true yield.
 */
public final class KolmogorovInl {

    /** -zeta(1/2) / sqrt(2 pi), value from memory (zeta(1/2) = -1.4603545088...). */
    static final double SIEGMUND_RHO = 1.4603545088095868 / Math.sqrt(2.0 * Math.PI);

    private KolmogorovInl() {
    }

    /** Kolmogorov's distribution function K(z) = P(sup |B(t)| &lt;= z) of the Brownian bridge. */
    public static double kolmogorovCdf(double z) {
        if (!(z > 0.0)) {
            return 0.0;
        }
        if (z < 1.0) {
            // theta-function form: K(z) = sqrt(2 pi) / z * sum exp(-(2k-1)^2 pi^2 / (8 z^2))
            double sum = 0.0;
            for (int k = 1; k < 100; k++) {
                double term = Math.exp(-(2.0 * k - 1) * (2.0 * k - 1) * Math.PI * Math.PI / (8.0 * z * z));
                sum += term;
                if (term < 1e-18 * sum) {
                    break;
                }
            }
            return Math.sqrt(2.0 * Math.PI) / z * sum;
        }
        return 1.0 - kolmogorovTail(z);
    }

    /** 1 - K(z) = 2 sum (-1)^(k-1) exp(-2 k^2 z^2), accurate in the tail. */
    public static double kolmogorovTail(double z) {
        if (z < 1.0) {
            return 1.0 - kolmogorovCdf(z);
        }
        double sum = 0.0;
        for (int k = 1; k < 100; k++) {
            double term = Math.exp(-2.0 * k * k * z * z);
            sum += (k % 2 == 1 ? term : -term);
            if (term < 1e-18 * Math.abs(sum)) {
                break;
            }
        }
        return 2.0 * sum;
    }

    /** Endpoint INL yield estimate of a unary array of {@code elements} elements of sigma {@code sigma} units. */
    public static InlYieldEstimate unary(int elements, double sigma, double limitLsb) {
        return bridge(elements, sigma, limitLsb, "unary array of " + elements + " elements");
    }

    /** Endpoint INL yield estimate of the field described by {@code sigmas} (unary or segmented). */
    public static InlYieldEstimate forArray(ElementSigmas sigmas, double limitLsb) {
        int n = sigmas.unaryCount();
        if (n == 0) {
            throw new IllegalArgumentException("the bridge estimate needs unary elements");
        }
        double variance = 0.0;
        for (double s : sigmas.unary()) {
            variance += s * s;
        }
        double unitVariance = variance / n;
        if (sigmas.binaryCount() == 0) {
            return bridge(n, Math.sqrt(unitVariance), limitLsb, "unary array of " + n + " elements");
        }
        double binaryVariance = 0.0;
        for (double s : sigmas.binary()) {
            binaryVariance += s * s;
        }
        double stepSigma = Math.sqrt((variance + binaryVariance) / (n + 1));
        return bridge(n + 1, stepSigma, limitLsb, "segment boundaries of a segmented array (" + n
                + " unary elements and the binary part as a last step); an upper estimate of the yield");
    }

    private static InlYieldEstimate bridge(int steps, double sigma, double limitLsb, String what) {
        if (!(limitLsb > 0.0)) {
            throw new IllegalArgumentException("INL limit must be positive, got " + limitLsb);
        }
        if (steps < 1 || sigma < 0.0) {
            throw new IllegalArgumentException("need at least one element and sigma >= 0");
        }
        if (sigma == 0.0) {
            return new InlYieldEstimate(limitLsb, 1.0, 1.0, "exact: no mismatch, INL is 0", "endpoint");
        }
        double scale = sigma * Math.sqrt(steps);
        double plain = kolmogorovCdf(limitLsb / scale);
        double corrected = kolmogorovCdf((limitLsb + SIEGMUND_RHO * sigma) / scale);
        return new InlYieldEstimate(limitLsb, corrected, plain, "Brownian-bridge (Kolmogorov) limit for the " + what
                + ", with Siegmund's corrected-diffusion boundary shift 0.5826 sigma; an approximation",
                "endpoint");
    }
}
