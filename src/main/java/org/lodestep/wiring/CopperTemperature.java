package org.lodestep.wiring;

/**
 * Copper winding resistance at another temperature: R2/R1 = (k + θ2)/(k + θ1), where k is the inferred temperature
 * of zero resistance of copper in °C (with sign reversed).
 *
 * <p>Sources: IEC 60034-1 (rotating electrical machines, rating and performance; resistance method for temperature
 * rise) uses k = 235 for copper, which is the default here. North-American practice (IEEE test procedures for
 * machines, e.g. IEEE Std 112 / 118) uses k = 234.5, consistent with the annealed-copper coefficient
 * α20 = 0.00393 K⁻¹ of IEC 60028 (1/α20 − 20 = 234.45 K). The formula is linear in temperature; it departs from
 * real copper by well under 0.1 % between −20 °C and 150 °C.
 */
public final class CopperTemperature {

    /** Which constant k to use. */
    public enum Constant {
        /** k = 235 °C, IEC 60034-1. */
        IEC_60034_1(235.0, "IEC 60034-1"),
        /** k = 234.5 °C, IEEE (North-American) usage, from the IEC 60028 annealed-copper coefficient. */
        IEEE_234_5(234.5, "IEEE usage (234.5, annealed copper per IEC 60028)");

        private final double kC;
        private final String standard;

        Constant(double kC, String standard) {
            this.kC = kC;
            this.standard = standard;
        }

        /** The constant k in °C. */
        public double kC() {
            return kC;
        }

        /** The standard or usage the constant comes from, for output. */
        public String standard() {
            return standard;
        }
    }

    /** The default constant: IEC 60034-1, k = 235. */
    public static final Constant DEFAULT = Constant.IEC_60034_1;

    private CopperTemperature() {
    }

    /**
     * Resistance at {@code toC} of a copper winding that reads {@code resistanceOhm} at {@code fromC}.
     *
     * @param resistanceOhm measured resistance, ohms, finite and ≥ 0
     * @param fromC         temperature of the winding when measured, °C, above −k
     * @param toC           temperature to correct to, °C, above −k
     * @param k             the copper constant
     * @return resistance at {@code toC} in ohms
     */
    public static double correct(double resistanceOhm, double fromC, double toC, Constant k) {
        if (!(resistanceOhm >= 0) || Double.isInfinite(resistanceOhm)) {
            throw new IllegalArgumentException("resistance must be finite and >= 0 ohm: " + resistanceOhm);
        }
        checkTemperature(fromC, k);
        checkTemperature(toC, k);
        return resistanceOhm * (k.kC() + toC) / (k.kC() + fromC);
    }

    /**
     * Winding temperature from a resistance rise: θ2 = (R2/R1)(k + θ1) − k.
     *
     * @param coldOhm resistance at {@code coldC}, ohms, positive
     * @param hotOhm  resistance now, ohms, positive
     * @param coldC   temperature at which {@code coldOhm} was measured, °C
     * @return present winding temperature in °C
     */
    public static double temperatureC(double coldOhm, double hotOhm, double coldC, Constant k) {
        if (!(coldOhm > 0) || !(hotOhm > 0) || Double.isInfinite(coldOhm) || Double.isInfinite(hotOhm)) {
            throw new IllegalArgumentException("resistances must be finite and > 0 ohm: " + coldOhm + ", " + hotOhm);
        }
        checkTemperature(coldC, k);
        return hotOhm / coldOhm * (k.kC() + coldC) - k.kC();
    }

    private static void checkTemperature(double c, Constant k) {
        if (!Double.isFinite(c) || c <= -k.kC()) {
            throw new IllegalArgumentException("temperature must be finite and above " + (-k.kC()) + " °C: " + c + " °C");
        }
    }
}
