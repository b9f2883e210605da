package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.lodestep.capture.Captures;
import org.lodestep.sample.Channel;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampledSignal;
import org.lodestep.motor.BackEmfAnalyzer;
import org.lodestep.motor.BackEmfResult;
import org.lodestep.motor.BackEmfTrace;
import org.lodestep.motor.EmfChannel;
import org.lodestep.motor.OrientedLeads;
import org.lodestep.motor.StepInput;
import org.lodestep.motor.StepResponseFit;
import org.lodestep.motor.StepResponseFitter;

/** Turns step-response and back-EMF files into motor inputs: picks channels, reads metadata, runs the fits. */
public final class MotorCaptureInputs {
    private MotorCaptureInputs() {
    }

    /**
     * Reads and fits one step response. Metadata: {@code # leads=1,2} (without it the file is one coil, named after
     * its current column or {@code coil 1}), {@code # joined=2,5},
     * {@code # supply_v=}, {@code # series_ohm=}; the flags are used where the file has none, and a recorded
     * {@code voltage_v} channel where neither gives the step voltage.
     */
    public static StepInput stepResponse(Path file, Double supplyFlagV, Double seriesFlagOhm, Double knownWindingOhm)
            throws IOException, InputFormatException {
        return stepResponse(Captures.readAll(file), supplyFlagV, seriesFlagOhm, knownWindingOhm);
    }

    /**
     * The recorded current of a step response, for drawing under its fit.
     *
     * @param source   the file's name
     * @param timeS    sample times, s
     * @param currentA the current channel the fit used, A
     */
    public record StepTrace(String source, double[] timeS, double[] currentA) {
        public StepTrace {
            java.util.Objects.requireNonNull(source, "source");
            if (timeS.length != currentA.length) {
                throw new IllegalArgumentException("trace of " + source + ": " + timeS.length + " times but "
                        + currentA.length + " currents");
            }
        }
    }

    /** A fitted step response and the recording it was fitted to. */
    public record StepCapture(StepInput input, StepTrace trace) {
    }

    /** As {@link #stepResponse(Path, Double, Double, Double)}, keeping the recorded current with the fit. */
    public static StepCapture stepCapture(Path file, Double supplyFlagV, Double seriesFlagOhm, Double knownWindingOhm)
            throws IOException, InputFormatException {
        SampledSignal s = Captures.readAll(file);
        StepInput input = stepResponse(s, supplyFlagV, seriesFlagOhm, knownWindingOhm);
        int current = currentChannel(s);
        return new StepCapture(input, new StepTrace(file.getFileName().toString(), times(s, s.channel(current).length),
                s.channel(current)));
    }

    /** The current channel a step response is fitted on: the first in amperes, or one named current*; -1 if none. */
    private static int currentChannel(SampledSignal s) {
        int current = -1;
        for (int c = 0; c < s.channels().size(); c++) {
            Channel ch = s.channels().get(c);
            if (ch.unit().equals("a") && (current < 0 || ch.name().startsWith("current"))) {
                current = c;
            }
        }
        return current;
    }

    private static double[] times(SampledSignal s, int n) {
        double[] t = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = s.startTimeS() + k / s.sampleRateHz();
        }
        return t;
    }

    /** As {@link #stepResponse(Path, Double, Double, Double)}, for a signal already in memory (a rig capture). */
    public static StepInput stepResponse(SampledSignal s, Double supplyFlagV, Double seriesFlagOhm, Double knownWindingOhm)
            throws InputFormatException {
        String src = s.source();
        int current = currentChannel(s);
        if (current < 0) {
            throw missingColumn(s, "current", "a column such as current_a (amperes)");
        }
        String leadsText = s.metadata().get("leads");
        List<String> leads;
        if (leadsText == null) {
            // One file of one coil is the commonest thing a technician has: it still gives L, R and tau, named
            // after its column (current_<lead>_<lead>_a) or as coil 1.
            leads = coilFromColumn(s.channels().get(current).name());
        } else {
            leads = labels(src, "leads", leadsText);
        }
        if (leads.size() != 2) {
            throw new InputFormatException(src, InputFormatException.NO_LINE, "leads", leadsText,
                    "expected two lead labels, e.g. '# leads=1,2'");
        }
        List<String> joined = List.of();
        if (s.metadata().containsKey("joined")) {
            joined = labels(src, "joined", s.metadata().get("joined"));
            if (joined.size() != 2) {
                throw new InputFormatException(src, InputFormatException.NO_LINE, "joined", s.metadata().get("joined"),
                        "expected the two leads joined during the test, e.g. '# joined=2,5'");
            }
        }
        Double supply = number(s, "supply_v", "volts", false, MAX_STEP_SUPPLY_V);
        if (supply == null) {
            supply = supplyFlagV;
            if (supply != null && !(supply > 0 && supply <= MAX_STEP_SUPPLY_V)) {
                throw new SettingsException("step supply " + supply + " V is not plausible: expected above 0 and at"
                        + " most " + MAX_STEP_SUPPLY_V + " V");
            }
        }
        int voltage = s.indexOf("voltage");
        if (supply == null && voltage >= 0 && s.channels().get(voltage).unit().equals("v")) {
            // a recorded drive voltage: its level over the last half of the record is the step voltage
            supply = settledLevel(s.channel(voltage));
        }
        Double series = number(s, "series_ohm", "ohms", true, MAX_SERIES_OHM);
        if (series == null) {
            series = seriesFlagOhm == null ? 0.0 : seriesFlagOhm;
        }
        try {
            return fit(s, current, new OrientedLeads(leads.get(0), leads.get(1)), joined, supply, series,
                    joined.isEmpty() ? knownWindingOhm : null);
        } catch (IllegalArgumentException e) {
            throw new InputFormatException(src, InputFormatException.NO_LINE, null, null, e.getMessage());
        }
    }

    /** The two leads a current column names ({@code current_1_2}), else {@code coil 1} and {@code coil 1'}. */
    static List<String> coilFromColumn(String name) {
        String[] parts = name.split("_");
        if (parts.length == 3 && parts[0].equals("current") && !parts[1].isEmpty() && !parts[2].isEmpty()
                && !parts[1].equals(parts[2])) {
            return List.of(parts[1], parts[2]);
        }
        return List.of("coil 1", "coil 1'");
    }

    /** Fits channel {@code current} of {@code s} as a step across {@code pair}. */
    static StepInput fit(SampledSignal s, int current, OrientedLeads pair, List<String> joined, Double supplyV,
                         double seriesOhm, Double knownWindingOhm) {
        double[] i = s.channel(current);
        double[] t = times(s, i.length);
        StepResponseFit fit = new StepResponseFitter(supplyV, seriesOhm, knownWindingOhm).fit(t, i);
        return new StepInput(pair, joined, fit);
    }

    /** The level of a recorded drive voltage over the last half of the record, V; null when not positive. */
    static Double settledLevel(double[] v) {
        double sum = 0;
        for (int k = v.length / 2; k < v.length; k++) {
            sum += v[k];
        }
        double level = sum / (v.length - v.length / 2);
        return level > 0 ? level : null;
    }

    /**
     * Reads and analyses a back-EMF capture: channels {@code emf_<lead>_<lead>} in volts, optionally an index or
     * tachometer channel ({@code index}, {@code tach}); {@code # revolutions=} and {@code # pulses_per_rev=}
     * metadata, overridden by the flags.
     */
    public static BackEmfResult backEmf(Path file, Double revolutionsFlag, Integer pulsesFlag)
            throws IOException, InputFormatException {
        return backEmf(Captures.readAll(file), revolutionsFlag, pulsesFlag);
    }

    /** A back-EMF analysis and a few cycles of the capture it came from, for drawing. */
    public record EmfCapture(BackEmfResult result, BackEmfTrace trace) {
        public EmfCapture {
            java.util.Objects.requireNonNull(result, "result");
        }
    }

    /** As {@link #backEmf(Path, Double, Integer)}, keeping a few electrical cycles ({@link BackEmfTrace}). */
    public static EmfCapture backEmfCapture(Path file, Double revolutionsFlag, Integer pulsesFlag)
            throws IOException, InputFormatException {
        return emf(Captures.readAll(file), revolutionsFlag, pulsesFlag, true);
    }

    /** As {@link #backEmf(Path, Double, Integer)}, for a signal already in memory (a rig capture). */
    public static BackEmfResult backEmf(SampledSignal s, Double revolutionsFlag, Integer pulsesFlag)
            throws InputFormatException {
        return emf(s, revolutionsFlag, pulsesFlag, false).result();
    }

    private static EmfCapture emf(SampledSignal s, Double revolutionsFlag, Integer pulsesFlag, boolean keepTrace)
            throws InputFormatException {
        String src = s.source();
        List<EmfChannel> channels = new ArrayList<>();
        double[] index = null;
        for (int c = 0; c < s.channels().size(); c++) {
            Channel ch = s.channels().get(c);
            OrientedLeads pair = OrientedLeads.fromChannelName(ch.name());
            if (pair != null) {
                if (!ch.unit().isEmpty() && !ch.unit().equals("v")) {
                    throw new InputFormatException(src, InputFormatException.NO_LINE, ch.header(), ch.unit(),
                            "is not a voltage: expected back-EMF columns in volts, e.g. emf_1_2_v");
                }
                channels.add(new EmfChannel(pair, s.channel(c)));
            } else if (ch.name().equals("index") || ch.name().equals("tach")) {
                index = s.channel(c);
            }
        }
        if (channels.isEmpty()) {
            throw missingColumn(s, "back-EMF", "columns named emf_<lead>_<lead>_v, + on the first lead, e.g. emf_1_2_v");
        }
        Double revs = revolutionsFlag != null ? revolutionsFlag : number(s, "revolutions", "revolutions", false, MAX_REVOLUTIONS);
        Double pulses = pulsesFlag != null ? Double.valueOf(pulsesFlag) : number(s, "pulses_per_rev", "pulses", false, MAX_PULSES_PER_REV);
        try {
            BackEmfResult r = new BackEmfAnalyzer(s.sampleRateHz()).analyze(channels, revs, index,
                    pulses == null ? 1 : (int) Math.round(pulses));
            return new EmfCapture(r, keepTrace ? BackEmfTrace.of(channels, s.sampleRateHz(), r) : null);
        } catch (IllegalArgumentException e) {
            throw new InputFormatException(src, InputFormatException.NO_LINE, null, null, e.getMessage());
        }
    }

    private static List<String> labels(String src, String key, String text) throws InputFormatException {
        List<String> out = new ArrayList<>();
        for (String part : text.split("[,;\\s]+")) {
            if (!part.isBlank()) {
                out.add(part.trim());
            }
        }
        if (out.stream().distinct().count() != out.size()) {
            throw new InputFormatException(src, InputFormatException.NO_LINE, key, text,
                    "names the same lead twice: expected different lead labels");
        }
        return out;
    }

    /**
     * Upper bounds of capture metadata: far above any bench value (a step test runs from a bench supply of a few
     * volts to a drive supply of a few hundred), so only damage or a slip is refused. Our own sanity bounds (common
     * practice), not physical limits.
     */
    static final double MAX_STEP_SUPPLY_V = 1000;
    static final double MAX_SERIES_OHM = 1e6;
    static final double MAX_REVOLUTIONS = 1e6;
    static final double MAX_PULSES_PER_REV = 1e7;

    private static Double number(SampledSignal s, String key, String unit, boolean zeroAllowed, double max)
            throws InputFormatException {
        String text = s.metadata().get(key);
        if (text == null) {
            return null;
        }
        double v;
        try {
            v = Double.parseDouble(text.trim());
        } catch (NumberFormatException e) {
            v = Double.NaN;
        }
        if (!(v > 0 || zeroAllowed && v == 0) || !(v <= max)) {
            throw new InputFormatException(s.source(), InputFormatException.NO_LINE, key, text,
                    "is not a plausible value: expected a " + (zeroAllowed ? "non-negative" : "positive") + " number"
                            + " of " + unit.toLowerCase(Locale.ROOT) + " up to " + max);
        }
        return v;
    }

    /** A capture without the column a test needs, naming the columns it has. */
    private static InputFormatException missingColumn(SampledSignal s, String what, String expected) {
        return new InputFormatException(s.source(), InputFormatException.NO_LINE, null, null, "has no " + what
                + " column (its columns: " + String.join(", ", s.channelNames()) + "): expected " + expected);
    }
}
