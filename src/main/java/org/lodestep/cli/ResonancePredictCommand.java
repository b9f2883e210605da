package org.lodestep.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.report.ResonanceJson;
import org.lodestep.report.ResonanceText;
import org.lodestep.workflow.ResonancePredict;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code lodestep resonance predict}: natural frequency from motor data, or the load inertia from a measured one. */
@Command(name = "predict",
        mixinStandardHelpOptions = true,
        description = {
            "Predict the natural frequency f_n = (1/2π)·√(N_r·T_h/J) of rotor plus load and the risky full-step"
                + " rates f_n/k; or, with --measured-natural-hz, infer the inertia (and the load inertia) from a"
                + " measured f_n.",
            "Inertia in kg·m² (1 g·cm² = 1e-7 kg·m²); torque in N·m (1 N·cm = 0.01 N·m)."},
        footerHeading = "%nExamples:%n",
        footer = {
            "  lodestep resonance predict --holding-torque-nm 0.45 --inertia-kgm2 5.4e-6 --load-inertia-kgm2 3e-5",
            "  lodestep resonance predict --holding-torque-nm 0.45 --inertia-kgm2 5.4e-6 --measured-natural-hz 118"})
final class ResonancePredictCommand implements Callable<Integer> {

    @Option(names = "--holding-torque-nm", paramLabel = "NM", required = true,
            description = "Holding torque at the running current, N·m.")
    double holdingTorqueNm;

    @Option(names = "--inertia-kgm2", paramLabel = "KGM2",
            description = "Rotor inertia, kg·m² (required for a prediction; for the inverse it gives the load"
                    + " inertia).")
    Double rotorInertiaKgm2;

    @Option(names = "--load-inertia-kgm2", paramLabel = "KGM2", defaultValue = "0",
            description = "Load inertia reflected to the motor shaft, kg·m² (default: ${DEFAULT-VALUE}).")
    double loadInertiaKgm2;

    @Option(names = "--rotor-teeth", paramLabel = "N", defaultValue = "50",
            description = "Rotor teeth N_r (default: ${DEFAULT-VALUE}, a 1.8° motor).")
    int rotorTeeth;

    @Option(names = "--measured-natural-hz", paramLabel = "HZ",
            description = "Measured f_n (from a ring-down or a sweep): infer the inertia instead.")
    Double measuredNaturalHz;

    @Option(names = "--microsteps", paramLabel = "N", defaultValue = "1",
            description = "Step pulses per full step, for the pulses/s figures (default: ${DEFAULT-VALUE}).")
    int microsteps;

    @Option(names = "--travel-mm-per-rev", paramLabel = "MM", description = "Axis travel per revolution, mm.")
    Double travelMmPerRev;

    @Option(names = "--phase-resistance-ohm", paramLabel = "OHM",
            description = "Phase resistance, ohm; with --phase-inductance-h gives the mid-band instability centre.")
    Double phaseResistanceOhm;

    @Option(names = "--phase-inductance-h", paramLabel = "H", description = "Phase inductance, H.")
    Double phaseInductanceH;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if ((phaseResistanceOhm == null) != (phaseInductanceH == null)) {
            throw new UsageException("--phase-resistance-ohm and --phase-inductance-h go together");
        }
        if (measuredNaturalHz == null && rotorInertiaKgm2 == null) {
            throw new UsageException("a prediction needs --inertia-kgm2 (rotor inertia, kg·m²); or give"
                    + " --measured-natural-hz to infer the inertia");
        }
        ResonancePredict.Result r = WorkflowCall.run(() -> ResonancePredict.run(
                new ResonancePredict.Settings(holdingTorqueNm, nanIfNull(rotorInertiaKgm2), loadInertiaKgm2, rotorTeeth,
                        nanIfNull(measuredNaturalHz), microsteps, nanIfNull(travelMmPerRev),
                        nanIfNull(phaseResistanceOhm), nanIfNull(phaseInductanceH))));
        if (json) {
            out.println(ProvenanceBlock.json(ResonanceJson.prediction(r.prediction()), RunProvenance.of(spec)));
        } else {
            ResonanceText.prediction(out, r.prediction(), r.units());
            out.print(ProvenanceBlock.text(RunProvenance.of(spec)));
        }
        out.flush();
        return ExitCode.OK;
    }

    private static double nanIfNull(Double v) {
        return v == null ? Double.NaN : v;
    }
}
