package org.lodestep.qa;

/**
 * Process capability indices against specification limits.
 *
 * <p>Source: D. C. Montgomery, <i>Introduction to Statistical Quality Control</i>, 7th ed., Wiley 2013, ch. 8
 * (process capability ratios): Cp = (USL − LSL)/(6σ), Cpu = (USL − μ)/(3σ), Cpl = (μ − LSL)/(3σ),
 * Cpk = min(Cpu, Cpl); also ISO 22514-2. Cp/Cpk use the within-process σ (here MR̄/d2 from the individuals chart);
 * Pp/Ppk are the same formulas with the overall sample standard deviation s. With one limit only, Cp is undefined
 * (NaN) and Cpk is the one-sided index (Cpl for a minimum, Cpu for a maximum).
 */
final class ProcessCapability {

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
}
