package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.lodestep.sample.InputFormatException;
import org.lodestep.motor.BackEmfResult;
import org.lodestep.wiring.Finding;
import org.lodestep.motor.IdentifyRequest;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.MotorIdentifier;
import org.lodestep.motor.PhaseCard;
import org.lodestep.wiring.Severity;
import org.lodestep.motor.StepInput;
import org.lodestep.qa.CaptureRef;
import org.lodestep.qa.Hashes;

/**
 * Phase inductance, back-EMF constant and step angle of one motor from its step-response and back-EMF captures, read
 * and fitted exactly as {@code motor identify} does ({@link MotorCaptureInputs}, {@link MotorIdentifier}).
 */
final class QaMotorCaptures {
    private QaMotorCaptures() {
    }

    /**
     * What the captures gave; NaN or empty where they gave nothing.
     *
     * @param inductancesH  phase inductances, H, phase A first
     * @param keVsPerRad    back-EMF constant of a phase, peak V per mechanical rad/s
     * @param stepAngleDeg  full-step angle from the rotor teeth, degrees
     * @param captures      each file with its SHA-256
     */
    record Result(List<Double> inductancesH, double keVsPerRad, double stepAngleDeg, List<CaptureRef> captures) {
        public Result {
            inductancesH = List.copyOf(inductancesH);
            captures = List.copyOf(captures);
        }
    }

    /** Reads, fits and combines the given captures (either may be empty or null). */
    static Result read(List<Path> stepFiles, Double stepSupplyV, Double seriesOhm, Path backEmfFile, Double revolutions,
                       Progress progress) throws IOException, InputFormatException {
        List<CaptureRef> captures = new ArrayList<>();
        List<StepInput> steps = new ArrayList<>();
        for (Path p : stepFiles) {
            steps.add(MotorCaptureInputs.stepResponse(p, stepSupplyV, seriesOhm, null));
            captures.add(new CaptureRef(p.toString(), "step_response", Hashes.sha256(p)));
        }
        BackEmfResult emf = null;
        if (backEmfFile != null) {
            emf = MotorCaptureInputs.backEmf(backEmfFile, revolutions, null);
            captures.add(new CaptureRef(backEmfFile.toString(), "back_emf", Hashes.sha256(backEmfFile)));
        }
        MotorCard card = MotorIdentifier.identify(new IdentifyRequest(null, steps, emf, null, null, null, null));
        List<Double> inductances = new ArrayList<>();
        List<Double> kes = new ArrayList<>();
        for (PhaseCard p : card.phases()) {
            if (p.inductanceH() != null) {
                inductances.add(p.inductanceH());
            }
            if (p.keVsPerRad() != null) {
                kes.add(p.keVsPerRad());
            }
        }
        if (!card.phases().isEmpty() && inductances.size() < card.phases().size()) {
            // Labels go by position, so a partial list would put phase B's value under A: judge none of them.
            if (!steps.isEmpty()) {
                progress.note("the step responses do not give the inductance of every phase (" + card.phases().size()
                        + " phases found): phase inductance not taken from them");
            }
            inductances.clear();
        } else if (card.phases().isEmpty()) {
            // The coils could not be put into phases (no back-EMF to phase them): each step is taken as one whole
            // phase winding, in the order given, as a 4-lead motor is measured.
            for (int k = 0; k < steps.size(); k++) {
                StepInput s = steps.get(k);
                if (s.fit().inductanceH() == null) {
                    throw new InputFormatException(stepFiles.get(k).toString(), InputFormatException.NO_LINE, null, null,
                            "step response gives no inductance: expected a supply voltage ('# supply_v=' or "
                                    + "--step-supply-v) and a complete rise");
                }
                inductances.add(s.fit().inductanceH());
            }
        }
        double ke = kes.isEmpty() ? Double.NaN : kes.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
        double step = card.stepAngleDeg() == null ? Double.NaN : card.stepAngleDeg();
        for (Finding f : card.findings()) {
            if (f.severity() != Severity.INFO) {
                progress.note("capture " + f.severity().name().toLowerCase(Locale.ROOT) + ": " + f.message());
            }
        }
        if (emf != null && emf.findings().stream().anyMatch(f -> f.severity() == Severity.ERROR)) {
            // A dead channel or an impossible tooth count: neither Ke nor the step angle is judged on half a capture;
            // the checks stay incomplete and the inspector repeats the capture.
            progress.note("back-EMF capture " + backEmfFile + " has an error: back-EMF constant and step angle not "
                    + "taken from it");
            ke = Double.NaN;
            step = Double.NaN;
        }
        return new Result(inductances, ke, step, captures);
    }
}
