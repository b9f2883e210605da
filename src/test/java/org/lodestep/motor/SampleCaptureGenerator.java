package org.lodestep.motor;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * Writes the motor sample captures of {@code sample-captures/motor/}: an invented salvaged 8-lead motor (scenario in
 * that folder's README), from the analytic models of {@link SyntheticMotor}. Deterministic: the same files every run,
 * which {@code SampleCaptureGeneratorTest} checks.
 *
 * <p>Run: {@code java -cp target/classes:target/test-classes:<deps> org.lodestep.motor.SampleCaptureGenerator DIR}.
 */
public final class SampleCaptureGenerator {
    /** Coils of the motor: leads as taped by the technician, phase, and whether the start is the second lead. */
    static final List<SyntheticMotor.Coil> COILS = List.of(
            new SyntheticMotor.Coil("1", "7", true, true),
            new SyntheticMotor.Coil("2", "5", false, false),
            new SyntheticMotor.Coil("3", "8", false, true),
            new SyntheticMotor.Coil("4", "6", true, false));
    static final double[] COIL_OHM = {1.21, 1.19, 1.24, 1.22};
    static final double COIL_H = 2.10e-3;
    static final double KAPPA = 0.96;
    static final double KE_VS_PER_RAD = 0.090;
    static final int ROTOR_TEETH = 50;
    static final double SUPPLY_V = 2.40;
    static final double SERIES_OHM = 0.50;
    static final double REVOLUTIONS = 3.0;
    static final double EMF_RATE_HZ = 2000;
    static final double STEP_DT_S = 20e-6;

    private SampleCaptureGenerator() {
    }

    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "sample-captures/motor");
        write(dir);
    }

    /** The files by name, as text. */
    static Map<String, String> files() {
        Map<String, String> out = new TreeMap<>();
        out.put("resistance.csv", resistance());
        for (int k = 0; k < COILS.size(); k++) {
            SyntheticMotor.Coil c = COILS.get(k);
            out.put("step-" + c.lead1() + "-" + c.lead2() + ".csv",
                    step(c.lead1() + "," + c.lead2(), null, COIL_OHM[k] + SERIES_OHM, COIL_H, 100 + k));
        }
        // Phase A in series: start 7 of coil 1-7 ... its end 1 joined to start 4 of coil 4-6, step across 7 and 6.
        double seriesH = 2 * COIL_H * (1 + KAPPA);
        out.put("step-7-6-joined-1-4.csv", step("7,6", "1,4", COIL_OHM[0] + COIL_OHM[3] + SERIES_OHM, seriesH, 200));
        out.put("back-emf.csv", backEmf());
        return out;
    }

    static void write(Path dir) throws IOException {
        Files.createDirectories(dir);
        for (Map.Entry<String, String> e : files().entrySet()) {
            Files.writeString(dir.resolve(e.getKey()), e.getValue());
        }
    }

    private static String resistance() {
        StringBuilder b = new StringBuilder();
        b.append("# motor=HX-5718-08 s/n 4471, salvaged, Harbourline Reclaim bench 2\n");
        b.append("# temperature_c=22\n");
        b.append("lead_a,lead_b,resistance_ohm\n");
        for (int i = 1; i <= 8; i++) {
            for (int j = i + 1; j <= 8; j++) {
                String value = "OL";
                for (int k = 0; k < COILS.size(); k++) {
                    SyntheticMotor.Coil c = COILS.get(k);
                    if (Set2.of(c.lead1(), c.lead2(), String.valueOf(i), String.valueOf(j))) {
                        value = String.format(Locale.ROOT, "%.2f", COIL_OHM[k]);
                    }
                }
                b.append(i).append(',').append(j).append(',').append(value).append('\n');
            }
        }
        return b.toString();
    }

    /** Unordered pair equality, spelled out. */
    private static final class Set2 {
        static boolean of(String a, String b, String x, String y) {
            return (a.equals(x) && b.equals(y)) || (a.equals(y) && b.equals(x));
        }
    }

    private static String step(String leads, String joined, double loopOhm, double inductanceH, long seed) {
        int n = 600;
        double[] t = SyntheticMotor.times(n, STEP_DT_S);
        // 0.2 ms of pre-trigger, 4 mA noise, 12-bit converter over 2.5 A
        double[] i = SyntheticMotor.rlStep(t, SUPPLY_V, loopOhm, inductanceH, 0.2e-3, 0.004, 2.5 / 4096, seed);
        StringBuilder b = new StringBuilder();
        b.append("# motor=HX-5718-08 s/n 4471\n");
        b.append("# leads=").append(leads).append('\n');
        if (joined != null) {
            b.append("# joined=").append(joined).append('\n');
        }
        b.append(String.format(Locale.ROOT, "# supply_v=%.2f%n", SUPPLY_V));
        b.append(String.format(Locale.ROOT, "# series_ohm=%.2f%n", SERIES_OHM));
        b.append("time_s,current_a\n");
        for (int k = 0; k < n; k++) {
            b.append(String.format(Locale.ROOT, "%.5f,%.5f%n", t[k], i[k]));
        }
        return b.toString();
    }

    private static String backEmf() {
        int n = (int) (2.0 * EMF_RATE_HZ);
        double[] theta = SyntheticMotor.handTurnAngleRad(n, EMF_RATE_HZ, REVOLUTIONS);
        List<EmfChannel> ch = SyntheticMotor.backEmf(COILS, theta, EMF_RATE_HZ, ROTOR_TEETH, KE_VS_PER_RAD, 0.005,
                300);
        StringBuilder b = new StringBuilder();
        b.append("# motor=HX-5718-08 s/n 4471, shaft turned by hand three turns against a tape mark\n");
        b.append(String.format(Locale.ROOT, "# revolutions=%.0f%n", REVOLUTIONS));
        b.append(String.format(Locale.ROOT, "# sample_rate_hz=%.0f%n", EMF_RATE_HZ));
        List<String> headers = new ArrayList<>();
        for (EmfChannel c : ch) {
            headers.add("emf_" + c.pair().first() + "_" + c.pair().second() + "_v");
        }
        b.append(String.join(",", headers)).append('\n');
        double[][] v = new double[ch.size()][];
        for (int k = 0; k < ch.size(); k++) {
            v[k] = ch.get(k).voltageV();
        }
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < ch.size(); k++) {
                if (k > 0) {
                    b.append(',');
                }
                b.append(String.format(Locale.ROOT, "%.4f", v[k][i]));
            }
            b.append('\n');
        }
        return b.toString();
    }
}
