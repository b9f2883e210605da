package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.lodestep.wiring.Connection;
import org.lodestep.motor.BackEmfTrace;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.OrientedLeads;
import org.lodestep.motor.WindingInput;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigInfo;
import org.lodestep.workflow.MotorCardSettings;
import org.lodestep.workflow.MotorFromFiles;
import org.lodestep.workflow.MotorOnRig;
import org.lodestep.workflow.Progress;
import org.lodestep.report.IdentifyProgressText;
import org.lodestep.report.MotorHtml;
import org.lodestep.report.MotorJson;
import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.report.MotorCardText;
import org.lodestep.safety.Cautions;
import org.lodestep.safety.Hazard;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code lodestep motor identify}: combines resistances, step responses and back-EMF into a motor card. */
@Command(name = "identify",
        mixinStandardHelpOptions = true,
        description = {
            "Combine whatever is given (resistance matrix, current step responses, a hand-turned back-EMF capture) "
                    + "into a motor card: topology and leads, complete A+/A-/B+/B- wiring for the chosen "
                    + "connection, step angle, R, L, Ke, estimated torque, and what remains unknown.",
            "Step-response files need '# leads=1,2' (and '# joined=2,5' when two coils were joined in series); "
                    + "'# supply_v=' and '# series_ohm=' give the step voltage and the sense resistance. Back-EMF "
                    + "columns are named after the lead pair, + on the first lead: emf_1_2_v."},
        footerHeading = "%nExamples:%n",
        footer = {
            "  lodestep motor identify --resistance res.csv \\",
            "      --step-response step-1-2.csv --step-response step-3-4.csv \\",
            "      --back-emf emf.csv --revolutions 3",
            "  lodestep motor identify --back-emf emf.csv --revolutions 2 \\",
            "      --connection parallel --json",
            "",
            "Exit code 3 when an error-severity finding is present",
            "(an open coil, phases that contradict the resistances)."
        })
final class MotorIdentifyCommand implements Callable<Integer> {

    @Option(names = "--resistance", paramLabel = "FILE",
            description = "Lead-pair resistances (CSV pair list or matrix, ohms), as for 'lodestep leads'.")
    Path resistance;

    @Option(names = "--step-response", paramLabel = "FILE", arity = "1..*",
            description = "Current step response of a coil or of a whole phase in series (CSV: time_s, current_a); "
                    + "repeatable.")
    List<Path> stepResponses = new ArrayList<>();

    @Option(names = "--back-emf", paramLabel = "FILE",
            description = "Back-EMF capture taken while the shaft is turned by hand (CSV or WAV, channels emf_<lead>_"
                    + "<lead>_v in volts; optional index or tach channel).")
    Path backEmf;

    @Option(names = "--revolutions", paramLabel = "N",
            description = "Mechanical revolutions turned during the back-EMF capture (overrides '# revolutions=').")
    Double revolutions;

    @Option(names = "--pulses-per-rev", paramLabel = "N",
            description = "Pulses per revolution of the index or tach channel (default 1, or '# pulses_per_rev=').")
    Integer pulsesPerRev;

    @Option(names = "--connection", paramLabel = "KIND",
            description = "Connection to wire: series, parallel, half or unipolar (default: series; unipolar for "
                    + "5-lead).")
    Connection connection;

    @Option(names = "--phase-current-a", paramLabel = "A",
            description = "Phase current for the torque and step-rate figures, in amperes (default: middle of the "
                    + "estimated rated range).")
    Double phaseCurrentA;

    @Option(names = "--supply-v", paramLabel = "V",
            description = "Driver supply voltage for the step-rate figure, in volts (default: the rule-of-thumb "
                    + "suggestion).")
    Double supplyV;

    @Option(names = "--step-supply-v", paramLabel = "V",
            description = "Voltage of the step responses, in volts, for files without '# supply_v='.")
    Double stepSupplyV;

    @Option(names = "--series-ohm", paramLabel = "OHM",
            description = "Resistance in series with the coil during the step responses (sense resistor, source), "
                    + "in ohms, for files without '# series_ohm=' (default 0).")
    Double seriesOhm;

    @Option(names = "--inertia-kgm2", paramLabel = "KGM2",
            description = "Rotor plus load inertia in kg·m² (1 g·cm² = 1e-7 kg·m²), for the natural-frequency "
                    + "prediction.")
    Double inertiaKgM2;

    @Option(names = "--rig", paramLabel = "ADDR",
            description = "Measure everything on a bench rig instead of reading files: every lead-pair resistance, "
                    + "a 0.5 A current step on each coil, then a back-EMF capture while you turn the shaft by hand "
                    + "(serial:DEVICE, tcp:HOST:PORT or sim:SCENARIO for the virtual rig). Give --revolutions.")
    String rig;

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write the motor card as a self-contained HTML report: wiring diagram, constants,"
                    + " phases, step-response fits drawn over their data.")
    Path report;

    @Option(names = "--json", description = "Write the motor card as JSON instead of text.")
    boolean json;

    @Spec
    CommandSpec spec;

    /** The report's heading: the first input file's folder and name. */
    private String title() {
        Path first = resistance != null ? resistance : !stepResponses.isEmpty() ? stepResponses.get(0) : backEmf;
        return first != null ? first.toString() : rig != null ? "Motor on rig " + rig : "motor";
    }

    @Override
    public Integer call() throws Exception {
        boolean files = resistance != null || !stepResponses.isEmpty() || backEmf != null;
        if (!files && rig == null) {
            throw new UsageException("nothing to identify: give --resistance, --step-response and/or --back-emf, "
                    + "or --rig");
        }
        if (files && rig != null) {
            throw new UsageException("--rig measures everything itself; give either --rig or files, not both");
        }
        if (connection == Connection.WHOLE) {
            throw new UsageException("--connection whole: expected series, parallel, half or unipolar");
        }
        positive(revolutions, "--revolutions");
        positive(phaseCurrentA, "--phase-current-a");
        positive(supplyV, "--supply-v");
        positive(stepSupplyV, "--step-supply-v");
        positive(inertiaKgM2, "--inertia-kgm2");
        if (seriesOhm != null && !(seriesOhm >= 0)) {
            throw new UsageException("--series-ohm must be 0 or more, got " + seriesOhm);
        }
        if (pulsesPerRev != null && pulsesPerRev < 1) {
            throw new UsageException("--pulses-per-rev must be at least 1, got " + pulsesPerRev);
        }
        PrintWriter out = spec.commandLine().getOut();
        MotorCardSettings cardSettings = new MotorCardSettings(connection, phaseCurrentA, supplyV, inertiaKgM2);
        MotorCard card;
        List<MotorHtml.Trace> traces = new ArrayList<>();
        Provenance provenance = RunProvenance.of(spec);
        if (resistance != null) {
            provenance = provenance.withInput("resistance", resistance);
        }
        provenance = provenance.withInputs("step response", stepResponses);
        if (backEmf != null) {
            provenance = provenance.withInput("back-EMF", backEmf);
        }
        BackEmfTrace emfTrace = null;
        if (rig != null) {
            if (!json) {
                SAFETY.forEach(out::println);
                out.println();
            }
            PrintWriter log = json ? spec.commandLine().getErr() : out;
            RigLog rigLog = new RigLog(log, new RigInfo[1]);
            try (RigClient c = RigCli.connect(rig)) {
                MotorOnRig.Result r = WorkflowCall.run(() -> MotorOnRig.run(c, new MotorOnRig.Settings(revolutions,
                        cardSettings), rigLog));
                card = r.card();
                emfTrace = r.emf();
            }
            if (rigLog.info()[0] != null) {
                provenance = provenance.withRig(RunProvenance.rig(rigLog.info()[0]));
            }
        } else {
            MotorFromFiles.Result r = WorkflowCall.run(() -> MotorFromFiles.run(new MotorFromFiles.Settings(
                    resistance, stepResponses, backEmf, revolutions, pulsesPerRev, stepSupplyV, seriesOhm,
                    cardSettings, report != null), Progress.NONE));
            card = r.card();
            // Recorded step responses are drawn under their fits; the rig's are measured in memory and listed only.
            r.traces().forEach(t -> traces.add(new MotorHtml.Trace(t.source(), t.timeS(), t.currentA())));
            emfTrace = r.emf();
        }
        if (report != null) {
            ProvenanceBlock.html(MotorHtml.report(title(), card, traces, emfTrace, MotorOptionHints.INSTANCE),
                    provenance).write(report);
        }
        if (json) {
            out.println(ProvenanceBlock.json(MotorJson.write(card, MotorOptionHints.INSTANCE), provenance));
        } else {
            out.print(MotorCardText.render(card, MotorOptionHints.INSTANCE));
            out.println();
            SAFETY.forEach(out::println);
            out.print(ProvenanceBlock.text(provenance));
        }
        out.flush();
        return card.hasError() ? ExitCode.FINDING : ExitCode.OK;
    }

    /** Prints the rig sequence's stages as they begin. */
    record RigLog(PrintWriter out, RigInfo[] info) implements MotorOnRig.Listener {
        RigLog(PrintWriter out) {
            this(out, new RigInfo[1]);
        }

        @Override
        public void connected(RigInfo info, List<String> leads) {
            this.info[0] = info;
            out.println(IdentifyProgressText.motorConnected(info, leads));
        }

        @Override
        public void measuringResistances(int pairs) {
            out.println(IdentifyProgressText.motorResistances(pairs));
            out.flush();
        }

        @Override
        public void windingsFound(WindingInput windings) {
            out.println(IdentifyProgressText.motorWindings(windings));
        }

        @Override
        public void stepResponse(int k, int n, double volts, OrientedLeads coil) {
            out.println(IdentifyProgressText.motorStep(k, n, volts, coil));
            out.flush();
        }

        @Override
        public void turnTheShaft(int coils, double seconds) {
            out.println(IdentifyProgressText.motorTurnTheShaft(coils, seconds));
            out.flush();
        }

        @Override
        public void outputsOff() {
            out.println(IdentifyProgressText.motorOutputsOff());
            out.println();
            out.flush();
        }
    }

    /** The cautions printed under every text card: the card's tests energise coils and turn the shaft. */
    static final List<String> SAFETY = List.of("Safety: " + String.join(" ",
            Cautions.sentences(Hazard.ENERGISED_WINDING, Hazard.TURNED_SHAFT, Hazard.HOT_MOTOR)));

    private static void positive(Double v, String option) {
        if (v != null && !(v > 0 && Double.isFinite(v))) {
            throw new UsageException(option + " must be a positive number, got " + v);
        }
    }
}
