package org.trimwright.engine.stats;

/**
 * The standard normal distribution N(0, 1): density phi, distribution function Phi, upper tail Q = 1 - Phi and
 * the quantile Phi^-1.
 * <p>
 * Methods (all written here, no library):
 * <ul>
 * <li>erfc by W. J. Cody's rational Chebyshev approximations ("Rational Chebyshev approximations for the error
 * function", Math. Comp. 23 (1969) 631-637; coefficients as in his SPECFUN routine CALERF, 1985) in the three
 * intervals |y| &lt;= 0.46875, &lt;= 4 and &gt; 4, with the exp(-y^2) factor split as in CALERF so that the
 * relative error stays near machine precision far into the tail.</li>
 * <li>The argument x / sqrt(2) is formed with its rounding error carried (fused multiply-add) and corrected to
 * first order, so that {@link #upperTail(double)} keeps full relative precision down to about 1e-300.</li>
 * <li>The quantile by M. J. Wichura, Algorithm AS 241 "The percentage points of the normal distribution",
 * Applied Statistics 37(3) (1988) 477-484, routine PPND16 (about 16 significant digits).</li>
 * </ul>
 */
public final class Normal {

    private static final double SQRT2 = 1.4142135623730951;
    private static final double INV_SQRT2 = 0.7071067811865476;
    private static final double INV_SQRT_2PI = 0.3989422804014327;
    private static final double INV_SQRT_PI = 0.5641895835477563;

    // Cody (1969), erf for |y| <= 0.46875
    private static final double[] A = {3.16112374387056560e00, 1.13864154151050156e02, 3.77485237685302021e02,
        3.20937758913846947e03, 1.85777706184603153e-1};
    private static final double[] B = {2.36012909523441209e01, 2.44024637934444173e02, 1.28261652607737228e03,
        2.84423683343917062e03};
    // Cody (1969), erfc for 0.46875 < |y| <= 4
    private static final double[] C = {5.64188496988670089e-1, 8.88314979438837594e00, 6.61191906371416295e01,
        2.98635138197400131e02, 8.81952221241769090e02, 1.71204761263407058e03, 2.05107837782607147e03,
        1.23033935479799725e03, 2.15311535474403846e-8};
    private static final double[] D = {1.57449261107098347e01, 1.17693950891312499e02, 5.37181101862009858e02,
        1.62138957456669019e03, 3.29079923573345963e03, 4.36261909014324716e03, 3.43936767414372164e03,
        1.23033935480374942e03};
    // Cody (1969), erfc for |y| > 4
    private static final double[] P = {3.05326634961232344e-1, 3.60344899949804439e-1, 1.25781726111229246e-1,
        1.60837851487422766e-2, 6.58749161529837803e-4, 1.63153871373020978e-2};
    private static final double[] Q = {2.56852019228982242e00, 1.87295284992346047e00, 5.27905102951428412e-1,
        6.05183413124413191e-2, 2.33520497626869185e-3};
    /** erfc(y) underflows to 0 beyond this argument. */
    private static final double ERFC_BIG = 26.543;

    // Wichura (1988) AS 241 PPND16
    private static final double[] PA = {3.3871328727963666080e0, 1.3314166789178437745e2, 1.9715909503065514427e3,
        1.3731693765509461125e4, 4.5921953931549871457e4, 6.7265770927008700853e4, 3.3430575583588128105e4,
        2.5090809287301226727e3};
    private static final double[] PB = {1.0, 4.2313330701600911252e1, 6.8718700749205790830e2,
        5.3941960214247511077e3, 2.1213794301586595867e4, 3.9307895800092710610e4, 2.8729085735721942674e4,
        5.2264952788528545610e3};
    private static final double[] PC = {1.42343711074968357734e0, 4.63033784615654529590e0,
        5.76949722146069140550e0, 3.64784832476320460504e0, 1.27045825245236838258e0, 2.41780725177450611770e-1,
        2.27238449892691845833e-2, 7.74545014278341407640e-4};
    private static final double[] PD = {1.0, 2.05319162663775882187e0, 1.67638483018380384940e0,
        6.89767334985100004550e-1, 1.48103976427480074590e-1, 1.51986665636164571966e-2,
        5.47593808499534494600e-4, 1.05075007164441684324e-9};
    private static final double[] PE = {6.65790464350110377720e0, 5.46378491116411436990e0,
        1.78482653991729133580e0, 2.96560571828504891230e-1, 2.65321895265761230930e-2,
        1.24266094738807843860e-3, 2.71155556874348757815e-5, 2.01033439929228813265e-7};
    private static final double[] PF = {1.0, 5.99832206555887937690e-1, 1.36929880922735805310e-1,
        1.48753612908506148525e-2, 7.86869131145613259100e-4, 1.84631831751005468180e-5,
        1.42151175831644588870e-7, 2.04426310338993978564e-15};

    private Normal() {
    }

    /** The density phi(x) = exp(-x^2/2) / sqrt(2 pi), with x^2 formed exactly (fused multiply-add). */
    public static double density(double x) {
        double x2 = x * x;
        double x2err = Math.fma(x, x, -x2);
        return INV_SQRT_2PI * Math.exp(-0.5 * x2) * Math.exp(-0.5 * x2err);
    }

    /** Phi(x) = P(Z &lt;= x), full relative precision in the lower tail. */
    public static double cdf(double x) {
        return upperTail(-x);
    }

    /** Q(x) = 1 - Phi(x) = P(Z &gt; x), full relative precision in the upper tail (down to about 1e-300). */
    public static double upperTail(double x) {
        if (Double.isNaN(x)) {
            return Double.NaN;
        }
        double y = x * INV_SQRT2;
        // rounding error of y as an error in x: x' = y * sqrt(2) is the argument actually used
        double dx = Math.fma(y, SQRT2, -x);
        double q = 0.5 * erfc(y);
        // Q(x) = Q(x') + phi * (x' - x) to first order
        if (Math.abs(x) < 1.0) {
            return q;
        }
        return q + density(x) * dx;
    }

    /** Two-sided tail P(|Z| &gt; x) = 2 Q(|x|). */
    public static double twoSidedTail(double x) {
        return 2.0 * upperTail(Math.abs(x));
    }

    /** P(a &lt; Z &lt;= b), computed from the tail on the side that keeps precision. */
    public static double intervalProbability(double a, double b) {
        if (!(b > a)) {
            return 0.0;
        }
        if (a >= 0) {
            return upperTail(a) - upperTail(b);
        }
        if (b <= 0) {
            return upperTail(-b) - upperTail(-a);
        }
        return 1.0 - upperTail(-a) - upperTail(b);
    }

    /**
     * The complementary error function erfc(y) = 2/sqrt(pi) int_y^inf exp(-t^2) dt by Cody's three-interval
     * rational approximation.
     */
    public static double erfc(double y) {
        double ay = Math.abs(y);
        double result;
        if (ay <= 0.46875) {
            double ysq = ay * ay;
            double num = A[4] * ysq;
            double den = ysq;
            for (int i = 0; i < 3; i++) {
                num = (num + A[i]) * ysq;
                den = (den + B[i]) * ysq;
            }
            return 1.0 - y * (num + A[3]) / (den + B[3]);
        } else if (ay <= 4.0) {
            double num = C[8] * ay;
            double den = ay;
            for (int i = 0; i < 7; i++) {
                num = (num + C[i]) * ay;
                den = (den + D[i]) * ay;
            }
            result = (num + C[7]) / (den + D[7]);
            result *= expMinusSquare(ay);
        } else if (ay >= ERFC_BIG) {
            result = 0.0;
        } else {
            double ysq = 1.0 / (ay * ay);
            double num = P[5] * ysq;
            double den = ysq;
            for (int i = 0; i < 4; i++) {
                num = (num + P[i]) * ysq;
                den = (den + Q[i]) * ysq;
            }
            result = ysq * (num + P[4]) / (den + Q[4]);
            result = (INV_SQRT_PI - result) / ay;
            result *= expMinusSquare(ay);
        }
        return y < 0 ? 2.0 - result : result;
    }

    /** exp(-y^2) with y split into a 1/16 multiple and a remainder, as in Cody's CALERF. */
    private static double expMinusSquare(double y) {
        double ysq = Math.floor(y * 16.0) / 16.0;
        double del = (y - ysq) * (y + ysq);
        return Math.exp(-ysq * ysq) * Math.exp(-del);
    }

    /**
     * The quantile Phi^-1(p) for 0 &lt;= p &lt;= 1 (Wichura AS 241, PPND16); returns -infinity at 0, +infinity at
     * 1 and throws for p outside [0, 1].
     */
    public static double inverseCdf(double p) {
        if (!(p >= 0.0 && p <= 1.0)) {
            throw new IllegalArgumentException("probability must be in [0, 1], got " + p);
        }
        if (p == 0.0) {
            return Double.NEGATIVE_INFINITY;
        }
        if (p == 1.0) {
            return Double.POSITIVE_INFINITY;
        }
        double q = p - 0.5;
        if (Math.abs(q) <= 0.425) {
            double r = 0.180625 - q * q;
            return q * poly(PA, r) / poly(PB, r);
        }
        double r = q < 0 ? p : 1.0 - p;
        return tailQuantile(r, q < 0);
    }

    /** The upper-tail quantile: x with Q(x) = p, accurate also for p far below 1e-16 (where 1 - p rounds). */
    public static double inverseUpperTail(double p) {
        if (!(p >= 0.0 && p <= 1.0)) {
            throw new IllegalArgumentException("probability must be in [0, 1], got " + p);
        }
        if (p <= 0.5) {
            if (p == 0.0) {
                return Double.POSITIVE_INFINITY;
            }
            return p >= 0.075 ? -inverseCdf(p) : tailQuantile(p, false);
        }
        return -inverseUpperTail(1.0 - p);
    }

    private static double tailQuantile(double tailP, boolean lower) {
        double r = Math.sqrt(-Math.log(tailP));
        double value;
        if (r <= 5.0) {
            r -= 1.6;
            value = poly(PC, r) / poly(PD, r);
        } else {
            r -= 5.0;
            value = poly(PE, r) / poly(PF, r);
        }
        return lower ? -value : value;
    }

    private static double poly(double[] c, double x) {
        double v = c[c.length - 1];
        for (int i = c.length - 2; i >= 0; i--) {
            v = v * x + c[i];
        }
        return v;
    }
}
