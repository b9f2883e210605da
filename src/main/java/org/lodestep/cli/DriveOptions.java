package org.lodestep.cli;

import java.nio.file.Path;

import org.lodestep.drive.DriveMode;
import org.lodestep.drive.Load;
import org.lodestep.drive.Margin;
import org.lodestep.workflow.DriveCurve;

import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Option;

/** The motor, drive, load and target options shared by {@code drive curve} and {@code drive plan}. */
final class DriveOptions {
    @Option(names = "--card", paramLabel = "FILE.json",
            description = "Motor card JSON written by 'motor identify --json' (R, L, Kt, rotor teeth, current, supply).")
    Path card;

    /** The run's provenance with the motor card file, when one was given. */
    org.lodestep.workflow.Provenance provenance(picocli.CommandLine.Model.CommandSpec spec) {
        org.lodestep.workflow.Provenance p = RunProvenance.of(spec);
        return card == null ? p : p.withInput("motor card", card);
    }

    @Option(names = "--phase-resistance-ohm", paramLabel = "OHM", description = "Phase resistance, ohm (overrides the card).")
    Double resistanceOhm;

    @Option(names = "--phase-inductance-h", paramLabel = "H", description = "Phase inductance, H (overrides the card).")
    Double inductanceH;

    @Option(names = "--kt-nm-per-a", paramLabel = "NM_PER_A",
            description = "Torque constant per phase, N·m per peak A (= Ke in V·s/rad; overrides the card).")
    Double ktNmPerA;

    @Option(names = "--rotor-teeth", paramLabel = "N", description = "Rotor teeth (default: the card's, else 50).")
    Integer rotorTeeth;

    @Option(names = "--rotor-inertia-kgm2", paramLabel = "KGM2",
            description = "Rotor inertia, kg·m² (datasheet; 1 g·cm² = 1e-7 kg·m²).")
    Double rotorInertiaKgm2;

    @Option(names = "--detent-torque-nm", paramLabel = "NM", defaultValue = "0",
            description = "Detent torque, N·m, reported only (no mean torque at speed; default: ${DEFAULT-VALUE}).")
    double detentTorqueNm;

    @Option(names = "--drive", paramLabel = "KIND", defaultValue = "chopper",
            description = "chopper (current-regulating) or constant-voltage (default: ${DEFAULT-VALUE}).")
    String drive;

    @Option(names = "--supply-v", paramLabel = "V", description = "Supply voltage, V (default: the card's).")
    Double supplyV;

    @Option(names = "--current-a", paramLabel = "A",
            description = "Chopper current setting, peak A per phase (default: the card's).")
    Double currentA;

    @Option(names = "--microsteps", paramLabel = "N", defaultValue = "1",
            description = "Step pulses per full step: 1 = full steps, two phases on (default: ${DEFAULT-VALUE}).")
    int microsteps;

    @Option(names = "--series-resistance-ohm", paramLabel = "OHM", defaultValue = "0",
            description = "Resistor in series with each phase (L/R drive), ohm (default: ${DEFAULT-VALUE}).")
    double seriesOhm;

    @Option(names = "--load-inertia-kgm2", paramLabel = "KGM2", defaultValue = "0",
            description = "Load inertia reflected to the motor shaft, kg·m² (default: ${DEFAULT-VALUE}).")
    double loadInertiaKgm2;

    @Option(names = "--load-mass-kg", paramLabel = "KG", defaultValue = "0",
            description = "Moving mass of a linear axis, kg; reflected with the travel per revolution.")
    double loadMassKg;

    @Option(names = "--friction-torque-nm", paramLabel = "NM", defaultValue = "0",
            description = "Friction torque at the motor shaft, N·m (default: ${DEFAULT-VALUE}).")
    double frictionNm;

    @Option(names = "--gravity-force-n", paramLabel = "N", defaultValue = "0",
            description = "Gravity force along a vertical axis, N (needs --travel-mm-per-rev).")
    double gravityN;

    @Option(names = "--travel-mm-per-rev", paramLabel = "MM", description = "Axis travel per motor revolution, mm.")
    Double travelMmPerRev;

    @ArgGroup(exclusive = true)
    Target target;

    static final class Target {
        @Option(names = "--target-mm-per-s", paramLabel = "MM_S", description = "Target axis speed, mm/s.")
        Double mmPerS;
        @Option(names = "--target-rpm", paramLabel = "RPM", description = "Target shaft speed, rpm.")
        Double rpm;
        @Option(names = "--target-full-steps-per-s", paramLabel = "RATE", description = "Target rate, full steps/s.")
        Double fullStepsPerS;
        @Option(names = "--target-pulses-per-s", paramLabel = "RATE", description = "Target rate, step pulses/s.")
        Double pulsesPerS;
    }

    @Option(names = "--margin", paramLabel = "FRACTION", defaultValue = "0.3",
            description = "Share of the pull-out torque kept in reserve (default: ${DEFAULT-VALUE}; common practice"
                    + " 0.3 to 0.5).")
    double margin;

    /** Work whose IllegalArgumentException means the inputs cannot give an answer (exit 2). */
    interface Work<T> {
        T get() throws Exception;
    }

    static <T> T usage(Work<T> w) throws Exception {
        try {
            return w.get();
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

    /** The workflow's settings; bad combinations become a usage error. */
    DriveCurve.Settings settings(boolean dynamometer) {
        DriveMode kind = switch (drive.toLowerCase(java.util.Locale.ROOT)) {
            case "chopper" -> DriveMode.CHOPPER;
            case "constant-voltage", "cv", "l/r" -> DriveMode.CONSTANT_VOLTAGE;
            default -> throw new UsageException("--drive: '" + drive + "' is not a drive: expected chopper or"
                    + " constant-voltage");
        };
        if (kind == DriveMode.CONSTANT_VOLTAGE && currentA != null) {
            throw new UsageException("--current-a: a constant-voltage drive has no current setting; its current is"
                    + " the supply over the winding resistance (add --series-resistance-ohm for an L/R resistor)");
        }
        try {
            return build(kind, dynamometer);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private DriveCurve.Settings build(DriveMode kind, boolean dynamometer) {
        Margin.check(margin);
        double travel = travelMmPerRev == null ? Double.NaN : travelMmPerRev;
        double j = loadInertiaKgm2;
        if (loadMassKg > 0) {
            if (travelMmPerRev == null) {
                throw new IllegalArgumentException("--load-mass-kg needs --travel-mm-per-rev");
            }
            j += Load.massInertiaKgM2(loadMassKg, travel);
        }
        Load load = new Load(j, frictionNm, gravityN, travel);
        double value = Double.NaN;
        DriveCurve.SpeedUnit unit = DriveCurve.SpeedUnit.FULL_STEPS_PER_S;
        if (target != null) {
            if (target.mmPerS != null) {
                value = target.mmPerS;
                unit = DriveCurve.SpeedUnit.MM_PER_S;
            } else if (target.rpm != null) {
                value = target.rpm;
                unit = DriveCurve.SpeedUnit.RPM;
            } else if (target.pulsesPerS != null) {
                value = target.pulsesPerS;
                unit = DriveCurve.SpeedUnit.PULSES_PER_S;
            } else {
                value = target.fullStepsPerS;
            }
            if (!(value > 0) || !Double.isFinite(value)) {
                throw new IllegalArgumentException("target speed must be positive, got " + value);
            }
        }
        return new DriveCurve.Settings(card, resistanceOhm, inductanceH, ktNmPerA, rotorTeeth, rotorInertiaKgm2,
                detentTorqueNm, kind, supplyV, currentA, microsteps, seriesOhm, load, value, unit, margin, dynamometer);
    }
}
