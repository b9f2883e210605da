package org.lodestep.workflow;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

import org.lodestep.motor.BackEmfAnalyzer;
import org.lodestep.motor.BackEmfResult;
import org.lodestep.motor.BackEmfTrace;
import org.lodestep.motor.CoilResistance;
import org.lodestep.motor.EmfChannel;
import org.lodestep.motor.OrientedLeads;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.StepInput;
import org.lodestep.motor.WindingInput;
import org.lodestep.rig.ResistanceReading;
import org.lodestep.rig.RigCapture;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.rig.RigInfo;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampledSignal;
import org.lodestep.wiring.IdentifySettings;
import org.lodestep.wiring.LeadIdentifier;
import org.lodestep.wiring.ResistanceMatrix;

/**
 * Use case: identify a motor on a bench rig end to end: every lead-pair resistance, a current step on each coil
 * found, then one back-EMF capture of all coils while the shaft is turned by hand. Every output is switched off at
 * the end, also after a failure.
 */
public final class MotorOnRig {
    /** Target current of the step responses, A: well under any small motor's rating. */
    static final double STEP_TARGET_A = 0.5;
    /** Length of each step response, ms (long enough for coils up to about 4 ms time constant). */
    static final double STEP_MS = 20;
    /** Length of the back-EMF capture, s. */
    public static final double EMF_SECONDS = 2.5;

    private MotorOnRig() {
    }

    /**
     * @param revolutions revolutions the hand turns during the back-EMF capture; null to take the rig's own count
     *                    (the virtual rig states it) or leave the tooth count unknown
     * @param card        what the card should assume
     */
    public record Settings(Double revolutions, MotorCardSettings card) {
        public Settings {
            if (revolutions != null && !(revolutions > 0 && Double.isFinite(revolutions))) {
                throw new SettingsException("revolutions must be positive, got " + revolutions);
            }
            Objects.requireNonNull(card, "card");
        }
    }

    /** Hears which stage the sequence is in; the back-EMF stage needs someone to turn the shaft. */
    public interface Listener extends Progress {
        /** The rig answered: its identity and the lead labels used. */
        default void connected(RigInfo info, List<String> leads) {
        }

        /** Stage 1 of 3 begins: {@code pairs} lead-pair resistances. */
        default void measuringResistances(int pairs) {
        }

        /** The resistances gave this layout and these coils. */
        default void windingsFound(WindingInput windings) {
        }

        /** Stage 2 of 3: step response {@code k} of {@code n}, {@code volts} across {@code coil}. */
        default void stepResponse(int k, int n, double volts, OrientedLeads coil) {
        }

        /** Stage 3 of 3 begins: turn the shaft by hand, one way, a whole number of turns, for {@code seconds}. */
        default void turnTheShaft(int coils, double seconds) {
        }

        /** Every measurement is done and the rig's outputs are off. */
        default void outputsOff() {
        }
    }

    /**
     * @param rig  what the rig reports about itself
     * @param card the motor card
     * @param emf  a few electrical cycles of the back-EMF capture, for drawing; null without one
     */
    public record Result(RigInfo rig, MotorCard card, BackEmfTrace emf) {
        public Result {
            Objects.requireNonNull(rig, "rig");
            Objects.requireNonNull(card, "card");
        }
    }

    /** Runs the sequence on {@code rig} (already connected; the caller closes it). */
    public static Result run(RigClient rig, Settings settings, Listener listener)
            throws RigException, InputFormatException {
        WindingInput windings;
        List<StepInput> steps;
        MotorCaptureInputs.EmfCapture emf;
        try {
            List<String> labels = labels(rig.info());
            listener.connected(rig.info(), labels);
            windings = resistances(rig, labels, listener);
            steps = stepResponses(rig, labels, windings, listener);
            emf = windings.coils().isEmpty() ? null : backEmf(rig, labels, windings, settings.revolutions(), listener);
        } finally {
            rig.safe();
        }
        listener.outputsOff();
        listener.step("identifying the motor");
        return new Result(rig.info(), MotorFromFiles.identify(windings, steps, emf == null ? null : emf.result(),
                settings.card()), emf == null ? null : emf.trace());
    }

    private static List<String> labels(RigInfo info) {
        int n = info.leads();
        if (info.labels().size() == n) {
            return info.labels();
        }
        List<String> out = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            out.add(String.valueOf(i));
        }
        return out;
    }

    /** Every lead pair, then the lead identification handed over as coils. */
    private static WindingInput resistances(RigClient rig, List<String> labels, Listener listener)
            throws RigException {
        int n = labels.size();
        listener.measuringResistances(n * (n - 1) / 2);
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        labels.forEach(b::lead);
        int done = 0;
        for (int i = 1; i <= n; i++) {
            for (int j = i + 1; j <= n; j++) {
                ResistanceReading r = rig.resistance(i, j);
                b.reading(labels.get(i - 1), labels.get(j - 1), Double.isInfinite(r.resistanceOhm())
                        ? OptionalDouble.empty() : OptionalDouble.of(r.resistanceOhm()));
                listener.advanced(++done, n * (n - 1) / 2);
            }
        }
        WindingInput windings = MotorWindings.of(LeadIdentifier.identify(b.build(), IdentifySettings.DEFAULT));
        listener.windingsFound(windings);
        return windings;
    }

    /** A current step of about {@link #STEP_TARGET_A} on each coil, fitted as it arrives. */
    private static List<StepInput> stepResponses(RigClient rig, List<String> labels, WindingInput windings,
                                                 Listener listener) throws RigException, InputFormatException {
        double rate = Math.min(50_000, number(rig, "max_rate_hz", 50_000));
        double seriesOhm = number(rig, "drive_series_ohm", 0);
        List<StepInput> steps = new ArrayList<>();
        int k = 0;
        for (CoilResistance c : windings.coils()) {
            k++;
            int a = labels.indexOf(c.leads().first()) + 1;
            int z = labels.indexOf(c.leads().second()) + 1;
            double volts = Math.max(0.1, Math.min(24, STEP_TARGET_A * (c.resistanceOhm() + seriesOhm)));
            listener.stepResponse(k, windings.coils().size(), volts, c.leads());
            RigCapture cap = rig.stepResponse(a, z, volts, STEP_MS, rate, RigClient.Progress.NONE);
            SampledSignal s = cap.signal();
            int current = s.indexOf("current");
            int voltage = s.indexOf("voltage");
            Double supply = voltage >= 0 ? MotorCaptureInputs.settledLevel(s.channel(voltage)) : Double.valueOf(volts);
            try {
                steps.add(MotorCaptureInputs.fit(s, current, c.leads(), List.of(), supply, seriesOhm, null));
            } catch (IllegalArgumentException e) {
                throw new InputFormatException(s.source(), InputFormatException.NO_LINE, null, null, e.getMessage());
            }
        }
        return steps;
    }

    /** One back-EMF capture of every coil while the shaft is turned by hand. */
    private static MotorCaptureInputs.EmfCapture backEmf(RigClient rig, List<String> labels, WindingInput windings, Double revolutions,
                                         Listener listener) throws RigException, InputFormatException {
        List<int[]> pairs = new ArrayList<>();
        for (CoilResistance c : windings.coils()) {
            pairs.add(new int[] {labels.indexOf(c.leads().first()) + 1, labels.indexOf(c.leads().second()) + 1});
        }
        listener.turnTheShaft(pairs.size(), EMF_SECONDS);
        RigCapture cap = rig.backEmf(pairs, EMF_SECONDS, 5_000, RigClient.Progress.NONE);
        SampledSignal s = cap.signal();
        List<EmfChannel> channels = new ArrayList<>();
        for (int c = 0; c < pairs.size(); c++) {
            channels.add(new EmfChannel(windings.coils().get(c).leads(), s.channel(c)));
        }
        Double revs = revolutions;
        if (revs == null && cap.metadata().containsKey("revolutions")) {
            revs = Double.valueOf(cap.metadata().get("revolutions"));
        }
        try {
            BackEmfResult r = new BackEmfAnalyzer(s.sampleRateHz()).analyze(channels, revs, null, 1);
            return new MotorCaptureInputs.EmfCapture(r, BackEmfTrace.of(channels, s.sampleRateHz(), r));
        } catch (IllegalArgumentException e) {
            throw new InputFormatException(s.source(), InputFormatException.NO_LINE, null, null, e.getMessage());
        }
    }

    private static double number(RigClient rig, String key, double fallback) {
        try {
            return Double.parseDouble(rig.info().capability(key, String.valueOf(fallback)));
        } catch (NumberFormatException e) {
            return fallback;
        }
    }
}
