package org.lodestep.workflow;

import org.lodestep.resonance.Prediction;
import org.lodestep.resonance.RateUnits;

/**
 * Predicts the natural frequency of rotor plus load from motor data, or, given a measured natural frequency,
 * infers the inertia (and with the rotor inertia, the load inertia). Formulas: {@link Prediction}.
 *
 * <p>Errors: impossible or missing settings are an {@link IllegalArgumentException} saying which.
 */
public final class ResonancePredict {
    private ResonancePredict() {
    }

    /**
     * NaN means "not given".
     *
     * @param holdingTorqueNm     holding torque at the running current, N·m
     * @param rotorInertiaKgm2    rotor inertia, kg·m² (required to predict; optional to infer)
     * @param loadInertiaKgm2     load inertia reflected to the shaft, kg·m², zero or more
     * @param rotorTeeth          rotor teeth N_r
     * @param measuredNaturalHz   a measured f_n, Hz: infer the inertia instead of predicting f_n
     * @param microsteps          step pulses per full step, for the pulses/s figures
     * @param travelMmPerRev      axis travel per revolution, mm
     * @param phaseResistanceOhm  phase resistance, Ω (with the inductance: the mid-band instability centre)
     * @param phaseInductanceH    phase inductance, H
     */
    public record Settings(double holdingTorqueNm, double rotorInertiaKgm2, double loadInertiaKgm2, int rotorTeeth,
                           double measuredNaturalHz, int microsteps, double travelMmPerRev,
                           double phaseResistanceOhm, double phaseInductanceH) {
    }

    /** The prediction (or inference) and the units its rates are given in. */
    public record Result(Prediction prediction, RateUnits units) {
    }

    public static Result run(Settings s) {
        if (Double.isNaN(s.phaseResistanceOhm()) != Double.isNaN(s.phaseInductanceH())) {
            throw new IllegalArgumentException("phase resistance and phase inductance go together: give both or"
                    + " neither");
        }
        RateUnits units = new RateUnits(s.microsteps(), s.rotorTeeth(), s.travelMmPerRev());
        if (!Double.isNaN(s.measuredNaturalHz())) {
            return new Result(Prediction.inverse(s.measuredNaturalHz(), s.holdingTorqueNm(), s.rotorTeeth(),
                    s.rotorInertiaKgm2(), units, s.phaseResistanceOhm(), s.phaseInductanceH()), units);
        }
        if (Double.isNaN(s.rotorInertiaKgm2())) {
            throw new IllegalArgumentException("a prediction needs the rotor inertia (kg·m²); or give a measured"
                    + " natural frequency to infer the inertia");
        }
        return new Result(Prediction.forward(s.holdingTorqueNm(), s.rotorTeeth(), s.rotorInertiaKgm2(),
                s.loadInertiaKgm2(), units, s.phaseResistanceOhm(), s.phaseInductanceH()), units);
    }
}
