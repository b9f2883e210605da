package org.lodestep.qa;

/**
 * Process capability indices against specification limits, with a confidence interval.
 *
 * <p>Source: D. C. Montgomery, <i>Introduction to Statistical Quality Control</i>, 7th ed., Wiley 2013, ch. 8
 * (process capability ratios): Cp = (USL − LSL)/(6σ), Cpu = (USL − μ)/(3σ), Cpl = (μ − LSL)/(3σ),
 * Cpk = min(Cpu, Cpl); also ISO 22514-2. Cp/Cpk use the within-process σ (here MR̄/d2 from the individuals chart);
 * Pp/Ppk are the same formulas with the overall sample standard deviation s. With one limit only, Cp is undefined
 * (NaN) and the index is the one-sided one (Cpl for a minimum, Cpu for a maximum), named so.
 *
 * <p>Interval: A. F. Bissell, "How reliable is your capability index?", <i>Applied Statistics</i> 39(3), 1990,
 * pp. 331–340 (references §26), normal approximation Ĉ ± z·√(1/(9n) + Ĉ²/(2(n − 1))) with z = 1.959964 for 95 %.
 * Bissell derives it for σ estimated by s; with σ from moving ranges (Cpk) fewer degrees of freedom stand behind σ
 * and the true interval is somewhat wider than shown. Below {@link #MIN_N} values no index is given: with n = 10 the
 * interval of a Cpk of 1.33 already spans ±49 % of it (Bissell's formula), so fewer values say nothing useful.
 */
final class ProcessCapability {

    /** Fewest values for a capability figure (our choice, justified above). */
    static final int MIN_N = 10;

    /** z for a two-sided 95 % interval, Φ⁻¹(0.975) (any table of the normal distribution). */
    static final double Z_95 = 1.959963984540054;

    /** Cp and Cpk (or Pp and Ppk), NaN where undefined. */
    record Indices(double potential, double actual) {
    }

    private ProcessCapability() {
    }

    /**
     * @param mean  process mean, in the limits' unit
     * @param sigma standard deviation, same unit, positive (NaN or 0 gives NaN indices)
     * @param lsl   lower specification limit, or NaN
     * @param usl   upper specification limit, or NaN
     */
    static Indices of(double mean, double sigma, double lsl, double usl) {
        if (!(sigma > 0) || !Double.isFinite(mean)) {
            return new Indices(Double.NaN, Double.NaN);
        }
        double cp = Double.isNaN(lsl) || Double.isNaN(usl) ? Double.NaN : (usl - lsl) / (6 * sigma);
        double cpu = Double.isNaN(usl) ? Double.NaN : (usl - mean) / (3 * sigma);
        double cpl = Double.isNaN(lsl) ? Double.NaN : (mean - lsl) / (3 * sigma);
        double cpk = Double.isNaN(cpu) ? cpl : Double.isNaN(cpl) ? cpu : Math.min(cpu, cpl);
        return new Indices(cp, cpk);
    }

    /** The name of the index: {@code prefix + "k"} two-sided, {@code + "u"} maximum only, {@code + "l"} minimum only. */
    static String name(String prefix, double lsl, double usl) {
        return prefix + (Double.isNaN(lsl) ? "u" : Double.isNaN(usl) ? "l" : "k");
    }

    /** Half-width of Bissell's 95 % interval of an index {@code c} estimated from {@code n} values. */
    static double halfWidth95(double c, int n) {
        return Z_95 * Math.sqrt(1.0 / (9.0 * n) + c * c / (2.0 * (n - 1)));
    }

    /**
     * The index {@code actual} of {@code n} values, named and with its interval; refused below {@link #MIN_N} values.
     *
     * @param prefix "Cp" or "Pp"
     */
    static Capability estimate(String prefix, double actual, int n, double lsl, double usl) {
        String name = name(prefix, lsl, usl);
        if (n < MIN_N) {
            return new Capability(name, Double.NaN, Double.NaN, Double.NaN, n, "too few motors for a capability"
                    + " figure: n = " + n + ", at least " + MIN_N);
        }
        if (Double.isNaN(actual)) {
            return new Capability(name, Double.NaN, Double.NaN, Double.NaN, n, null);
        }
        double h = halfWidth95(actual, n);
        return new Capability(name, actual, actual - h, actual + h, n, null);
    }
}
