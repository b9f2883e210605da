package org.lodestep.qa;

/**
 * The scale a parameter's control limits and capability are computed on.
 *
 * <p>Every QA quantity is non-negative (a resistance, an inductance, an angle, a percentage of imbalance). On the
 * linear scale a lower control limit below zero is clipped at zero, the natural limit of the quantity, and the report
 * says so (Montgomery, <i>Introduction to Statistical Quality Control</i>, 7th ed., Wiley 2013: a lower limit that
 * comes out negative for a quantity that cannot be negative is set to zero, as for the attributes charts of ch. 7;
 * references §25). Insulation resistance is strongly right-skewed and spans decades, so its limits and capability are
 * computed on ln R and transformed back (Montgomery, same edition, section 6.4, which recommends a transformation
 * when individuals are far from normal; references §25): the centre line is then the geometric mean.
 */
public enum ValueScale {
    /** Limits on the values themselves; a negative lower limit clipped at zero. */
    LINEAR,
    /** Limits on ln x, transformed back with exp. */
    LOG;

    /** The scale of a parameter's series: LOG for insulation resistance when every value is positive. */
    static ValueScale of(String parameter, double[] x) {
        if (!Parameters.INSULATION_RESISTANCE.equals(parameter)) {
            return LINEAR;
        }
        for (double v : x) {
            if (!(v > 0)) {
                return LINEAR; // a dead short (0 Ω) has no logarithm: fall back to the clipped linear chart
            }
        }
        return LOG;
    }

    /** The values on this scale. */
    double[] transform(double[] x) {
        if (this == LINEAR) {
            return x.clone();
        }
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = Math.log(x[i]);
        }
        return y;
    }

    /** One value on this scale (a spec limit). */
    double transform(double x) {
        return this == LINEAR || Double.isNaN(x) ? x : Math.log(x);
    }

    /** A value on this scale back in the parameter's unit. */
    double back(double y) {
        return this == LINEAR || Double.isNaN(y) ? y : Math.exp(y);
    }
}
