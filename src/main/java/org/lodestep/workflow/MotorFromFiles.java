package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.lodestep.motor.BackEmfResult;
import org.lodestep.motor.BackEmfTrace;
import org.lodestep.motor.IdentifyRequest;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.MotorIdentifier;
import org.lodestep.motor.StepInput;
import org.lodestep.motor.WindingInput;
import org.lodestep.sample.InputFormatException;

/**
 * Use case: identify a motor from recorded files: a resistance matrix, current step responses and a hand-turned
 * back-EMF capture, whichever are given, combined into a motor card.
 */
public final class MotorFromFiles {
    private MotorFromFiles() {
    }

    /**
     * @param resistance    lead-pair resistances (pair list or matrix), or null
     * @param stepResponses current step responses of coils or of whole phases in series
     * @param backEmf       back-EMF capture taken while the shaft was turned by hand, or null
     * @param revolutions   revolutions turned during that capture, overriding its {@code # revolutions=}; or null
     * @param pulsesPerRev  pulses per revolution of its index channel, overriding {@code # pulses_per_rev=}; or null
     * @param stepSupplyV   step voltage for step files without {@code # supply_v=}, V; or null
     * @param seriesOhm     series resistance for step files without {@code # series_ohm=}, Ω; or null for 0
     * @param card          what the card should assume
     * @param keepTraces    whether to return the recorded step currents (for drawing under their fits) and a few
     *                      cycles of the back-EMF capture
     */
    public record Settings(Path resistance, List<Path> stepResponses, Path backEmf, Double revolutions,
                           Integer pulsesPerRev, Double stepSupplyV, Double seriesOhm, MotorCardSettings card,
                           boolean keepTraces) {
        public Settings {
            stepResponses = List.copyOf(stepResponses);
            Objects.requireNonNull(card, "card");
            if (resistance == null && stepResponses.isEmpty() && backEmf == null) {
                throw new SettingsException("nothing to identify: no resistance, step-response or back-EMF "
                        + "file");
            }
        }
    }

    /**
     * @param card   the motor card
     * @param traces the recorded current of each step response, in the order given (empty unless kept)
     * @param emf    a few electrical cycles of the back-EMF capture, for drawing; null unless kept, without a
     *               capture, or when it has no clean stretch
     */
    public record Result(MotorCard card, List<MotorCaptureInputs.StepTrace> traces, BackEmfTrace emf) {
        public Result {
            Objects.requireNonNull(card, "card");
            traces = List.copyOf(traces);
        }
    }

    /** Reads and fits every file, then identifies the motor. */
    public static Result run(Settings s, Progress progress) throws IOException, InputFormatException {
        WindingInput windings = null;
        if (s.resistance() != null) {
            progress.step("reading " + s.resistance().getFileName());
            windings = MotorWindings.read(s.resistance());
        }
        List<StepInput> steps = new ArrayList<>();
        List<MotorCaptureInputs.StepTrace> traces = new ArrayList<>();
        for (Path p : s.stepResponses()) {
            progress.step("fitting " + p.getFileName());
            MotorCaptureInputs.StepCapture c = MotorCaptureInputs.stepCapture(p, s.stepSupplyV(), s.seriesOhm(), null);
            steps.add(c.input());
            if (s.keepTraces()) {
                traces.add(c.trace());
            }
        }
        BackEmfResult emf = null;
        BackEmfTrace emfTrace = null;
        if (s.backEmf() != null) {
            progress.step("phasing " + s.backEmf().getFileName());
            MotorCaptureInputs.EmfCapture c = MotorCaptureInputs.backEmfCapture(s.backEmf(), s.revolutions(),
                    s.pulsesPerRev());
            emf = c.result();
            emfTrace = s.keepTraces() ? c.trace() : null;
        }
        progress.step("identifying the motor");
        return new Result(identify(windings, steps, emf, s.card()), traces, emfTrace);
    }

    /** The card from whatever was measured; shared with {@link MotorOnRig}. */
    static MotorCard identify(WindingInput windings, List<StepInput> steps, BackEmfResult emf, MotorCardSettings c) {
        return MotorIdentifier.identify(new IdentifyRequest(windings, steps, emf, c.connection(), c.phaseCurrentA(),
                c.supplyV(), c.inertiaKgM2()));
    }
}
