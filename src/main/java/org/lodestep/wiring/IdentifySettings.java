package org.lodestep.wiring;

import java.util.Objects;

/**
 * Settings of lead identification.
 *
 * @param imbalanceTolerance   largest accepted (max − min)/mean of phase or half-winding resistances, as a fraction
 *                             (0.10 = 10 %, common practice: datasheets quote ±10 % on phase resistance)
 * @param contactAllowanceOhm  largest probe contact resistance expected per reading, ohms (0.3 Ω default: common
 *                             practice for clip or needle probes on tinned leads)
 * @param continuityRatio      a finite reading above this many times the lowest finite reading counts as leakage
 *                             between isolated leads rather than winding continuity (10, common practice)
 * @param ambientC             winding temperature when measured, °C, or NaN when unknown
 * @param referenceC           temperature to correct resistances to, °C (20 by default)
 * @param copper               the copper constant to correct with
 */
public record IdentifySettings(double imbalanceTolerance, double contactAllowanceOhm, double continuityRatio,
                               double ambientC, double referenceC, CopperTemperature.Constant copper) {

    /** 10 % tolerance, 0.3 Ω contact allowance, ratio 10, temperature unknown, reference 20 °C, IEC 60034-1. */
    public static final IdentifySettings DEFAULT =
            new IdentifySettings(0.10, 0.3, 10.0, Double.NaN, 20.0, CopperTemperature.DEFAULT);

    public IdentifySettings {
        if (!(imbalanceTolerance > 0 && imbalanceTolerance < 1)) {
            throw new IllegalArgumentException("imbalance tolerance must be between 0 and 100 %: "
                    + imbalanceTolerance * 100 + " %");
        }
        if (!(contactAllowanceOhm >= 0) || Double.isInfinite(contactAllowanceOhm)) {
            throw new IllegalArgumentException("contact allowance must be finite and >= 0 ohm: " + contactAllowanceOhm);
        }
        if (!(continuityRatio > 2) || Double.isInfinite(continuityRatio)) {
            throw new IllegalArgumentException("continuity ratio must be finite and > 2: " + continuityRatio);
        }
        if (Double.isInfinite(ambientC)) {
            throw new IllegalArgumentException("ambient temperature must be finite °C or NaN (unknown): " + ambientC);
        }
        if (!Double.isFinite(referenceC)) {
            throw new IllegalArgumentException("reference temperature must be finite °C: " + referenceC);
        }
        Objects.requireNonNull(copper, "copper");
    }

    public IdentifySettings withImbalanceTolerance(double fraction) {
        return new IdentifySettings(fraction, contactAllowanceOhm, continuityRatio, ambientC, referenceC, copper);
    }

    public IdentifySettings withTemperatures(double ambientCelsius, double referenceCelsius) {
        return new IdentifySettings(imbalanceTolerance, contactAllowanceOhm, continuityRatio, ambientCelsius,
                referenceCelsius, copper);
    }

    public IdentifySettings withCopper(CopperTemperature.Constant constant) {
        return new IdentifySettings(imbalanceTolerance, contactAllowanceOhm, continuityRatio, ambientC, referenceC,
                constant);
    }
}
