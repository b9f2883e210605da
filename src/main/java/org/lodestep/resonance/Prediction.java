package org.lodestep.resonance;

import java.util.List;

import org.lodestep.motor.NaturalFrequency;

/**
 * Natural frequency predicted from motor data, with the risky full-step rates, or the inertia inferred from a
 * measured natural frequency.
 *
 * @param holdingTorqueNm          holding torque T_h at the running current, N·m
 * @param rotorTeeth               rotor teeth N_r
 * @param stiffnessNmPerRad        N_r·T_h, N·m/rad
 * @param rotorInertiaKgm2         rotor inertia, kg·m² (NaN when not given)
 * @param loadInertiaKgm2          load inertia reflected to the shaft, kg·m² (inferred in the inverse; NaN if the
 *                                 rotor inertia is unknown there)
 * @param totalInertiaKgm2         rotor plus load, kg·m²
 * @param naturalFrequencyHz       f_n, Hz (given in the inverse, predicted otherwise)
 * @param inferred                 true when the inertia was inferred from a measured f_n
 * @param riskyRates               f_n/k for k = 1 ... 4 in the user's units, highest first
 * @param midBandCentreFullStepsPerS centre of the mid-band instability from R/L, full steps/s (NaN without R, L)
 */
public record Prediction(double holdingTorqueNm, int rotorTeeth, double stiffnessNmPerRad, double rotorInertiaKgm2,
                         double loadInertiaKgm2, double totalInertiaKgm2, double naturalFrequencyHz,
                         boolean inferred, List<RateUnits.Rate> riskyRates, double midBandCentreFullStepsPerS) {
    public Prediction {
        riskyRates = List.copyOf(riskyRates);
        Require.positive(naturalFrequencyHz, "natural frequency", "Hz");
        Require.positive(totalInertiaKgm2, "total inertia", "kg·m²");
    }

    /**
     * Predicts f_n from holding torque, teeth and rotor plus load inertia.
     *
     * @param phaseResistanceOhm NaN, or with the inductance, the phase resistance for the mid-band centre
     * @param phaseInductanceH   NaN, or the phase inductance
     */
    public static Prediction forward(double holdingTorqueNm, int rotorTeeth, double rotorInertiaKgm2,
                                     double loadInertiaKgm2, RateUnits units, double phaseResistanceOhm,
                                     double phaseInductanceH) {
        if (!(loadInertiaKgm2 >= 0) || !Double.isFinite(loadInertiaKgm2)) {
            throw new IllegalArgumentException("load inertia must be zero or more, got " + loadInertiaKgm2 + " kg·m²");
        }
        double total = rotorInertiaKgm2 + loadInertiaKgm2;
        double fn = NaturalFrequency.naturalHz(holdingTorqueNm, rotorTeeth, total);
        return new Prediction(holdingTorqueNm, rotorTeeth, NaturalFrequency.stiffnessNmPerRad(holdingTorqueNm,
                rotorTeeth), rotorInertiaKgm2, loadInertiaKgm2, total, fn, false, risky(fn, units),
                midBand(phaseResistanceOhm, phaseInductanceH));
    }

    /**
     * Infers the total (and, with the rotor inertia, the load) inertia from a measured natural frequency.
     *
     * @param rotorInertiaKgm2 rotor inertia, or NaN when unknown
     */
    public static Prediction inverse(double measuredNaturalHz, double holdingTorqueNm, int rotorTeeth,
                                     double rotorInertiaKgm2, RateUnits units, double phaseResistanceOhm,
                                     double phaseInductanceH) {
        double total = NaturalFrequency.totalInertiaKgm2(measuredNaturalHz, holdingTorqueNm, rotorTeeth);
        double load = Double.isNaN(rotorInertiaKgm2) ? Double.NaN : total - rotorInertiaKgm2;
        return new Prediction(holdingTorqueNm, rotorTeeth, NaturalFrequency.stiffnessNmPerRad(holdingTorqueNm,
                rotorTeeth), rotorInertiaKgm2, load, total, measuredNaturalHz, true, risky(measuredNaturalHz, units),
                midBand(phaseResistanceOhm, phaseInductanceH));
    }

    private static List<RateUnits.Rate> risky(double fn, RateUnits units) {
        return LowSpeedResonance.riskyRatesFullStepsPerS(fn, BandClassifier.MAX_SUBHARMONIC).stream()
                .map(units::of).toList();
    }

    private static double midBand(double r, double l) {
        return Double.isNaN(r) || Double.isNaN(l) ? Double.NaN : MidBandInstability.centreFullStepsPerS(r, l);
    }
}
