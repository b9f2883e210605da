package org.lodestep.motor;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * Step-response and back-EMF capture files of an invented 4-lead motor (phase A on leads 1-2, phase B on 3-4), made
 * from the analytic models of {@link SyntheticMotor} (Alexander and Sadiku, Fundamentals of Electric Circuits,
 * first-order circuits, references §10; Acarnley, Stepping Motors, 4th ed., references §14), for tests outside this
 * package that need the files rather than the engine.
 */
public final class FourLeadCaptures {
    /** Step voltage of the captures, V. */
    public static final double SUPPLY_V = 2.40;
    /** Sense resistance in series during the steps, ohm. */
    public static final double SERIES_OHM = 0.50;
    /** Winding resistance of each phase, ohm. */
    public static final double PHASE_OHM = 1.90;
    /** Rotor teeth of the motor (1.8° step). */
    public static final int ROTOR_TEETH = 50;

    private FourLeadCaptures() {
    }

    /**
     * Writes the step response of one phase winding ({@code phaseA}: leads 1,2; else 3,4) of inductance
     * {@code inductanceH}, with 4 mA noise and a 12-bit converter over 2.5 A.
     */
    public static void step(Path file, boolean phaseA, double inductanceH, long seed) throws IOException {
        int n = 600;
        double dt = 20e-6;
        double[] t = SyntheticMotor.times(n, dt);
        double[] i = SyntheticMotor.rlStep(t, SUPPLY_V, PHASE_OHM + SERIES_OHM, inductanceH, 0.2e-3, 0.004,
                2.5 / 4096, seed);
        StringBuilder b = new StringBuilder();
        b.append("# motor under incoming inspection\n");
        b.append(phaseA ? "# leads=1,2\n" : "# leads=3,4\n");
        b.append(String.format(Locale.ROOT, "# supply_v=%.2f%n# series_ohm=%.2f%n", SUPPLY_V, SERIES_OHM));
        b.append("time_s,current_a\n");
        for (int k = 0; k < n; k++) {
            b.append(String.format(Locale.ROOT, "%.5f,%.5f%n", t[k], i[k]));
        }
        Files.writeString(file, b.toString());
    }

    /**
     * Writes a back-EMF capture of both phases, shaft turned {@code revolutions} by hand over 2 s at 2 kHz, with a
     * per-phase constant {@code keVsPerRad} (peak V per mechanical rad/s) and 5 mV noise.
     */
    public static void backEmf(Path file, double keVsPerRad, double revolutions, long seed) throws IOException {
        double rateHz = 2000;
        int n = (int) (2.0 * rateHz);
        double[] theta = SyntheticMotor.handTurnAngleRad(n, rateHz, revolutions);
        List<EmfChannel> ch = SyntheticMotor.backEmf(List.of(
                new SyntheticMotor.Coil("1", "2", true, false),
                new SyntheticMotor.Coil("3", "4", false, false)), theta, rateHz, ROTOR_TEETH, keVsPerRad, 0.005, seed);
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "# revolutions=%s%n# sample_rate_hz=%.0f%n", revolutions, rateHz));
        b.append("emf_1_2_v,emf_3_4_v\n");
        for (int i = 0; i < n; i++) {
            b.append(String.format(Locale.ROOT, "%.4f,%.4f%n", ch.get(0).voltageV()[i], ch.get(1).voltageV()[i]));
        }
        Files.writeString(file, b.toString());
    }
}
