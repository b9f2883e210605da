package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.lodestep.capture.MotorCardFile;
import org.lodestep.capture.MotorCardReader;
import org.lodestep.drive.DriveMode;
import org.lodestep.drive.Driver;
import org.lodestep.drive.Load;
import org.lodestep.drive.PhaseModel;
import org.lodestep.drive.SpeedAnswer;
import org.lodestep.drive.SpeedQuestion;
import org.lodestep.drive.TorqueCurve;
import org.lodestep.drive.TorqueCurves;
import org.lodestep.resonance.Prediction;
import org.lodestep.resonance.RateUnits;
import org.lodestep.sample.InputFormatException;

/**
 * Use case: the torque curve of a motor (typed constants or its motor card) on a drive, and the answer whether a
 * load reaches a target speed with margin.
 */
public final class DriveCurve {
    private DriveCurve() {
    }

    /** A target speed with its unit. */
    public enum SpeedUnit {
        FULL_STEPS_PER_S, PULSES_PER_S, RPM, MM_PER_S
    }

    /**
     * @param card                 motor card JSON, or null when every constant is typed
     * @param phaseResistanceOhm   typed phase resistance, ohm (overrides the card), or null
     * @param phaseInductanceH     typed phase inductance, H, or null
     * @param ktNmPerA             typed torque constant, N·m/A, or null
     * @param rotorTeeth           typed rotor teeth, or null (card, else 50)
     * @param rotorInertiaKgM2     rotor inertia, kg·m², or null (then the card's inertia)
     * @param detentTorqueNm       detent torque, N·m
     * @param mode                 chopper or constant-voltage
     * @param supplyV              supply, V, or null (the card's)
     * @param phaseCurrentA        chopper current setting, A, or null (the card's)
     * @param microsteps           pulses per full step
     * @param seriesResistanceOhm  resistor in series with each phase (L/R drives), ohm
     * @param load                 the load
     * @param target               target speed, or NaN for the curve alone
     * @param targetUnit           its unit
     * @param margin               margin to keep (common practice 0.3 to 0.5)
     * @param dynamometer          also measure the curve on the virtual rig's dynamometer ({@link DriveDynamometer})
     */
    public record Settings(Path card, Double phaseResistanceOhm, Double phaseInductanceH, Double ktNmPerA,
                           Integer rotorTeeth, Double rotorInertiaKgM2, double detentTorqueNm, DriveMode mode,
                           Double supplyV, Double phaseCurrentA, int microsteps, double seriesResistanceOhm,
                           Load load, double target, SpeedUnit targetUnit, double margin, boolean dynamometer) {
    }

    /**
     * @param motorSource what the constants came from (the card's file name, or "typed")
     * @param motor       the constants used
     * @param units       the user's units
     * @param load        the load
     * @param curve       the torque curve
     * @param answer      the answer at the target, or null without a target
     * @param midBandCentreFullStepsPerS where mid-band instability is expected, full steps/s (the model does not
     *                    hold near it)
     * @param notes       what the user should know about the inputs
     * @param dynamometer the virtual dynamometer's points, or null when not asked for
     */
    public record Result(String motorSource, PhaseModel motor, RateUnits units, Load load, TorqueCurve curve,
                         SpeedAnswer answer, double midBandCentreFullStepsPerS, List<String> notes,
                         List<DriveDynamometer.Point> dynamometer) {
        public Result {
            notes = List.copyOf(notes);
            dynamometer = dynamometer == null ? null : List.copyOf(dynamometer);
        }
    }

    public static Result run(Settings s, Progress progress) throws IOException, InputFormatException {
        List<String> notes = new ArrayList<>();
        MotorCardFile card = null;
        if (s.card() != null) {
            progress.step("reading " + s.card().getFileName());
            card = MotorCardReader.read(s.card());
        }
        double r = pick(s.phaseResistanceOhm(), card == null ? null : card.phaseResistanceOhm(),
                "phase resistance (--phase-resistance-ohm, or a motor card with phase resistances)");
        double l = pick(s.phaseInductanceH(), card == null ? null : card.phaseInductanceH(),
                "phase inductance (--phase-inductance-h, or a motor card with step responses)");
        double kt = pick(s.ktNmPerA(), card == null ? null : card.ktNmPerA(),
                "torque constant (--kt-nm-per-a, or a motor card with a back-EMF capture)");
        int teeth = s.rotorTeeth() != null ? s.rotorTeeth()
                : card != null && card.rotorTeeth() != null ? card.rotorTeeth() : 50;
        if (s.rotorTeeth() == null && (card == null || card.rotorTeeth() == null)) {
            notes.add("rotor teeth not given: 50 assumed (a 1.8° motor)");
        }
        Double inertia = s.rotorInertiaKgM2();
        if (inertia == null && card != null && card.inertiaKgM2() != null) {
            inertia = card.inertiaKgM2();
            notes.add("rotor inertia taken from the card (" + String.format(Locale.ROOT, "%.3g", inertia)
                    + " kg·m²); if that figure already held a load, do not give the load again");
        }
        if (inertia == null) {
            throw new SettingsException("rotor inertia is needed for accelerations: give"
                    + " --rotor-inertia-kgm2 (datasheet; 1 g·cm² = 1e-7 kg·m²)");
        }
        double v = pick(s.supplyV(), card == null ? null : card.supplyV(), "supply voltage (--supply-v)");
        double i = Double.NaN;
        if (s.mode() == DriveMode.CHOPPER) {
            i = pick(s.phaseCurrentA(), card == null ? null : card.phaseCurrentA(),
                    "current setting (--current-a, peak A per phase)");
        }
        PhaseModel motor = new PhaseModel(r, l, kt, teeth, inertia, s.detentTorqueNm())
                .withSeriesResistance(s.seriesResistanceOhm());
        Driver drive = new Driver(s.mode(), v, i, s.microsteps());
        RateUnits units = new RateUnits(s.microsteps(), teeth, s.load().travelMmPerRev());
        progress.step("computing the torque curve");
        TorqueCurve curve = TorqueCurves.of(motor, drive);
        SpeedAnswer answer = null;
        if (!Double.isNaN(s.target())) {
            double rate = fullStepsPerS(s.target(), s.targetUnit(), units);
            boolean canParallel = card != null && "8-lead".equals(card.topology())
                    && "series".equals(card.connection());
            answer = SpeedQuestion.answer(curve, s.load(), rate, s.margin(), units, canParallel);
        }
        // the resonance prediction names the mid-band centre 4·(R/L)/2π (Acarnley section 5.5), once
        double midBand = Prediction.forward(curve.holdingTorqueNm(), teeth, inertia, s.load().inertiaKgM2(), units,
                r, l).midBandCentreFullStepsPerS();
        List<DriveDynamometer.Point> dyno = s.dynamometer() ? DriveDynamometer.run(curve, s.load(), progress) : null;
        return new Result(card == null ? "typed" : card.source(), motor, units, s.load(), curve, answer, midBand,
                notes, dyno);
    }

    /** A target speed in full steps/s. */
    static double fullStepsPerS(double value, SpeedUnit unit, RateUnits units) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new SettingsException("target speed must be positive, got " + value);
        }
        return switch (unit) {
            case FULL_STEPS_PER_S -> value;
            case PULSES_PER_S -> value / units.microsteps();
            case RPM -> value / 60 * units.fullStepsPerRev();
            case MM_PER_S -> {
                if (!units.hasTravel()) {
                    throw new SettingsException("a target in mm/s needs the travel per revolution"
                            + " (--travel-mm-per-rev)");
                }
                yield value / units.travelMmPerRev() * units.fullStepsPerRev();
            }
        };
    }

    private static double pick(Double typed, Double fromCard, String what) {
        if (typed != null) {
            return typed;
        }
        if (fromCard != null) {
            return fromCard;
        }
        throw new SettingsException("missing " + what);
    }
}
