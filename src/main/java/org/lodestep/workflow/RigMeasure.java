package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.lodestep.wiring.InsulationReading;
import org.lodestep.rig.ResistanceReading;
import org.lodestep.rig.RigCapture;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.rig.RigInfo;

/**
 * One kind of bench measurement through a rig: four-wire resistance of lead pairs (all pairs unless named),
 * insulation resistance of leads to the frame (every lead unless named), a coil current step response, or back-EMF
 * while the shaft is turned by hand; a step response or back-EMF capture is saved when a file is given
 * ({@link RigCaptureFile}). The insulation test applies high voltage and the step response energises a winding:
 * the front end shows the caution, and for insulation obtains the confirmation, before calling {@link #run}.
 */
public final class RigMeasure {
    /** Default insulation test voltage, V DC (the highest the rig applies; common practice for low-voltage motors). */
    public static final int DEFAULT_INSULATION_VOLTS = 500;
    /** Default step-response drive voltage, V. */
    public static final double DEFAULT_STEP_VOLTS = 2.0;

    private RigMeasure() {
    }

    /** What to measure. */
    public enum Kind { RESISTANCE, INSULATION, STEP_RESPONSE, BACK_EMF }

    /** Two leads by their relay positions, from 1. */
    public record LeadPair(int leadA, int leadB) {
        public LeadPair {
            if (leadA < 1 || leadB < 1 || leadA == leadB) {
                throw new IllegalArgumentException("a lead pair is two different lead numbers from 1, got " + leadA
                        + "-" + leadB);
            }
        }
    }

    /**
     * Null means the default.
     *
     * @param address     rig address
     * @param kind        what to measure
     * @param pairs       resistance: pairs to measure (empty: all); step response: exactly one; back-EMF: one
     *                    channel per pair (empty: 1-2)
     * @param leads       insulation: leads to test against the frame (empty: every lead)
     * @param volts       insulation: DC test voltage (default 500 V); step response: drive voltage (default 2 V)
     * @param seconds     insulation: dwell before the reading (default 60 s); back-EMF: record length (default 2 s)
     * @param stepMs      step response: record length, ms
     * @param rateHz      sample rate (step response default 50 kHz, back-EMF 20 kHz)
     * @param saveTo      step response and back-EMF: capture file to write, or null
     * @param toolVersion this program's version, for a saved capture's sidecar
     */
    public record Settings(String address, Kind kind, List<LeadPair> pairs, List<Integer> leads, Double volts,
                           Double seconds, double stepMs, Double rateHz, Path saveTo, String toolVersion) {
        public Settings {
            Objects.requireNonNull(address, "address");
            Objects.requireNonNull(kind, "kind");
            pairs = List.copyOf(pairs);
            leads = List.copyOf(leads);
            if (saveTo != null && kind != Kind.STEP_RESPONSE && kind != Kind.BACK_EMF) {
                throw new IllegalArgumentException("only step-response and back-emf captures are saved to a file");
            }
            if (kind == Kind.STEP_RESPONSE && pairs.size() != 1) {
                throw new IllegalArgumentException("step-response needs exactly one lead pair, got " + pairs.size());
            }
        }

        /** The insulation test voltage these settings apply, V. */
        public int insulationVolts() {
            return volts == null ? DEFAULT_INSULATION_VOLTS : (int) Math.round(volts);
        }

        /** The step-response drive voltage these settings apply, V. */
        public double stepVolts() {
            return volts == null ? DEFAULT_STEP_VOLTS : volts;
        }
    }

    /**
     * What was measured; lists are empty and the capture null where the kind gives none.
     *
     * @param rig         the rig that measured, as its handshake named it (its lead labels among it)
     * @param resistances resistance readings in the order measured
     * @param insulation  insulation readings in the order measured
     * @param capture     the step-response or back-EMF capture
     * @param saved       where the capture was saved, or null
     */
    public record Result(Kind kind, RigInfo rig, List<ResistanceReading> resistances,
                         List<InsulationReading> insulation, RigCapture capture, Path saved) {
        public Result {
            resistances = List.copyOf(resistances);
            insulation = List.copyOf(insulation);
        }
    }

    /**
     * @throws IllegalArgumentException a malformed address, or a save target that cannot be written (checked
     *                                  before the rig is touched)
     */
    public static Result run(Settings s, Progress progress) throws RigException, IOException {
        if (s.saveTo() != null) {
            RigCaptureFile.checkTarget(s.saveTo());
        }
        try (RigClient c = RigClient.open(s.address())) {
            List<String> labels = c.info().labels();
            int leadCount = c.info().leads();
            List<ResistanceReading> rs = new ArrayList<>();
            List<InsulationReading> ins = new ArrayList<>();
            RigCapture cap = null;
            switch (s.kind()) {
                case RESISTANCE -> {
                    List<LeadPair> todo = s.pairs().isEmpty() ? allPairs(leadCount) : s.pairs();
                    for (LeadPair p : todo) {
                        progress.step("measuring " + p.leadA() + "-" + p.leadB());
                        rs.add(c.resistance(p.leadA(), p.leadB()));
                        progress.advanced(rs.size(), todo.size());
                    }
                }
                case INSULATION -> {
                    List<Integer> which = s.leads();
                    if (which.isEmpty()) {
                        which = new ArrayList<>();
                        for (int a = 1; a <= leadCount; a++) {
                            which.add(a);
                        }
                    }
                    for (int lead : which) {
                        progress.step("insulation of lead " + lead + " at " + s.insulationVolts() + " V");
                        ins.add(c.insulation(lead, s.insulationVolts(), s.seconds() == null ? 60 : s.seconds()));
                        progress.advanced(ins.size(), which.size());
                    }
                }
                case STEP_RESPONSE -> {
                    LeadPair p = s.pairs().get(0);
                    progress.step("step response " + p.leadA() + "-" + p.leadB());
                    cap = c.stepResponse(p.leadA(), p.leadB(), s.stepVolts(), s.stepMs(),
                            s.rateHz() == null ? 50_000 : s.rateHz(), progress::advanced);
                }
                case BACK_EMF -> {
                    List<int[]> ps = new ArrayList<>();
                    for (LeadPair p : s.pairs().isEmpty() ? List.of(new LeadPair(1, 2)) : s.pairs()) {
                        ps.add(new int[] {p.leadA(), p.leadB()});
                    }
                    progress.step("back-EMF, turn the shaft by hand");
                    cap = c.backEmf(ps, s.seconds() == null ? 2.0 : s.seconds(),
                            s.rateHz() == null ? 20_000 : s.rateHz(), progress::advanced);
                }
                default -> throw new IllegalStateException(s.kind().toString());
            }
            Path saved = null;
            if (cap != null && s.saveTo() != null) {
                progress.step("saving " + s.saveTo());
                saved = RigCaptureFile.save(cap, s.saveTo(), null, s.toolVersion(),
                        analysisMetadata(s, labels, c.info().capabilities(), cap.metadata()));
            }
            return new Result(s.kind(), c.info(), rs, ins, cap, saved);
        }
    }

    private static List<LeadPair> allPairs(int leads) {
        List<LeadPair> out = new ArrayList<>();
        for (int a = 1; a <= leads; a++) {
            for (int b = a + 1; b <= leads; b++) {
                out.add(new LeadPair(a, b));
            }
        }
        return out;
    }

    /**
     * What {@code motor identify} and {@code qa check} need to analyse a saved capture: for a step response the
     * leads (the rig's labels), the drive voltage and the rig's own series resistance (its {@code drive_series_ohm}
     * capability); for back-EMF the revolutions turned, when the rig stated them.
     */
    static java.util.Map<String, String> analysisMetadata(Settings s, List<String> labels,
                                                          java.util.Map<String, String> capabilities,
                                                          java.util.Map<String, String> captured) {
        java.util.Map<String, String> m = new java.util.LinkedHashMap<>();
        if (s.kind() == Kind.STEP_RESPONSE) {
            LeadPair p = s.pairs().get(0);
            m.put("leads", label(labels, p.leadA()) + "," + label(labels, p.leadB()));
            m.put("supply_v", Double.toString(s.stepVolts()));
            m.put("series_ohm", capabilities.getOrDefault("drive_series_ohm", "0"));
        }
        if (s.kind() == Kind.BACK_EMF && captured.containsKey("revolutions")) {
            m.put("revolutions", captured.get("revolutions"));
        }
        return m;
    }

    private static String label(List<String> labels, int position) {
        return position >= 1 && position <= labels.size() ? labels.get(position - 1) : String.valueOf(position);
    }
}
