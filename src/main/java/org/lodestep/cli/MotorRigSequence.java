package org.lodestep.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.lodestep.workflow.MotorCaptureInputs;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampledSignal;
import org.lodestep.motor.BackEmfAnalyzer;
import org.lodestep.motor.BackEmfResult;
import org.lodestep.motor.CoilResistance;
import org.lodestep.motor.EmfChannel;
import org.lodestep.motor.StepInput;
import org.lodestep.motor.WindingInput;
import org.lodestep.rig.ResistanceReading;
import org.lodestep.rig.RigCapture;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.wiring.IdentifySettings;
import org.lodestep.wiring.LeadIdentifier;
import org.lodestep.wiring.ResistanceMatrix;

/**
 * Drives a rig through the whole identification: every lead-pair resistance, a current step on each coil found,
 * then one back-EMF capture of all coils while the shaft is turned by hand. Progress goes to {@code out}.
 */
final class MotorRigSequence {
    /** Target current of the step responses, A: well under any small motor's rating. */
    static final double STEP_TARGET_A = 0.5;
    /** Length of each step response, ms (long enough for coils up to about 4 ms time constant). */
    static final double STEP_MS = 20;
    /** Length of the back-EMF capture, s. */
    static final double EMF_SECONDS = 2.5;

    /** What the rig measured. */
    record Measurements(WindingInput windings, List<StepInput> steps, BackEmfResult backEmf) {
    }

    private MotorRigSequence() {
    }

    static Measurements run(String address, Double revolutions, PrintWriter out)
            throws RigException, InputFormatException {
        try (RigClient rig = RigClient.open(address)) {
            try {
                return measure(rig, revolutions, out);
            } finally {
                rig.safe();
            }
        }
    }

    private static Measurements measure(RigClient rig, Double revolutions, PrintWriter out)
            throws RigException, InputFormatException {
        int n = rig.info().leads();
        List<String> labels = rig.info().labels().size() == n ? rig.info().labels() : numbers(n);
        out.printf(Locale.ROOT, "rig %s (%s), %d leads: %s%n", rig.info().rig(), rig.info().address(), n,
                String.join(" ", labels));
        out.printf(Locale.ROOT, "[1/3] resistance of %d lead pairs ...%n", n * (n - 1) / 2);
        out.flush();
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        labels.forEach(b::lead);
        for (int i = 1; i <= n; i++) {
            for (int j = i + 1; j <= n; j++) {
                ResistanceReading r = rig.resistance(i, j);
                b.reading(labels.get(i - 1), labels.get(j - 1), Double.isInfinite(r.resistanceOhm())
                        ? OptionalDouble.empty() : OptionalDouble.of(r.resistanceOhm()));
            }
        }
        WindingInput windings = MotorWindings.of(LeadIdentifier.identify(b.build(), IdentifySettings.DEFAULT));
        out.printf(Locale.ROOT, "      %s, %d coils%n", windings.topology().label(), windings.coils().size());

        double rate = Math.min(50_000, number(rig, "max_rate_hz", 50_000));
        double seriesOhm = number(rig, "drive_series_ohm", 0);
        List<StepInput> steps = new ArrayList<>();
        int k = 0;
        for (CoilResistance c : windings.coils()) {
            k++;
            int a = labels.indexOf(c.leads().first()) + 1;
            int z = labels.indexOf(c.leads().second()) + 1;
            double volts = Math.max(0.1, Math.min(24, STEP_TARGET_A * (c.resistanceOhm() + seriesOhm)));
            out.printf(Locale.ROOT, "[2/3] step response %d/%d: %.2f V across %s ...%n", k,
                    windings.coils().size(), volts, c.leads());
            out.flush();
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

        BackEmfResult emf = null;
        if (!windings.coils().isEmpty()) {
            List<int[]> pairs = new ArrayList<>();
            for (CoilResistance c : windings.coils()) {
                pairs.add(new int[] {labels.indexOf(c.leads().first()) + 1, labels.indexOf(c.leads().second()) + 1});
            }
            out.printf(Locale.ROOT, "[3/3] back-EMF of %d coils for %.1f s: turn the shaft by hand, one way, a whole "
                    + "number of turns ...%n", pairs.size(), EMF_SECONDS);
            out.flush();
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
                emf = new BackEmfAnalyzer(s.sampleRateHz()).analyze(channels, revs, null, 1);
            } catch (IllegalArgumentException e) {
                throw new InputFormatException(s.source(), InputFormatException.NO_LINE, null, null, e.getMessage());
            }
        }
        out.println("      done; outputs switched off");
        out.println();
        return new Measurements(windings, steps, emf);
    }

    private static double number(RigClient rig, String key, double fallback) {
        try {
            return Double.parseDouble(rig.info().capability(key, String.valueOf(fallback)));
        } catch (NumberFormatException e) {
            return fallback;
        }
    }

    private static List<String> numbers(int n) {
        List<String> out = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            out.add(String.valueOf(i));
        }
        return out;
    }
}
