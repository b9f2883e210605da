package org.lodestep.resonance;

import org.lodestep.sample.SweepShape;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

/**
 * Writes the sample captures of {@code sample-captures/resonance/} from {@link RotorSimulator}, so they are
 * reproducible: {@code SampleCapturesTest} checks the committed files equal a fresh run.
 *
 * <p>Scenario (invented): Harrow &amp; Vane Motion Works commissions the Y belt axis (40 mm per revolution) of its
 * HV-420 engraver frame, driven by a 1.8° motor of part number HV-17M-045 (holding torque 0.45 N·m). With pulley
 * and belt the natural frequency is 120 Hz (small-angle model); damping ratio 0.08; winding L/R 0.8 ms.
 *
 * <p>Regenerate with {@code LODESTEP_WRITE_SAMPLES=1 mvn -q -B -o test -Dtest=SampleCaptureGeneratorTest}.
 */
public final class SampleCaptureGenerator {
    static final double HOLDING_TORQUE_NM = 0.45;
    static final int ROTOR_TEETH = 50;
    static final double NATURAL_HZ = 120;
    static final double INERTIA_KGM2 = ROTOR_TEETH * HOLDING_TORQUE_NM / Math.pow(2 * Math.PI * NATURAL_HZ, 2);
    static final double ROTOR_INERTIA_KGM2 = 5.4e-6;

    private SampleCaptureGenerator() {
    }

    static RotorSimulator rotor() {
        return new RotorSimulator(HOLDING_TORQUE_NM, ROTOR_TEETH, INERTIA_KGM2, 0.08, 1, 0.02, 0.0008);
    }

    public static void writeAll(Path dir) throws IOException {
        Files.createDirectories(dir);
        sweepCsv(dir.resolve("belt-axis-sweep.csv"));
        phoneWav(dir.resolve("belt-axis-phone.wav"));
        ringDownCsv(dir.resolve("belt-axis-ringdown.csv"));
    }

    /** Accelerometer on the pulley and the driver's step line, full stepping, linear sweep 30 → 400 in 16 s. */
    static void sweepCsv(Path file) throws IOException {
        double fs = 3000;
        SweepLaw law = new SweepLaw(SweepShape.LINEAR, 30, 400, 16);
        double[][] sig = rotor().run(law::rateFullStepsPerSAt, fs, (int) (fs * 16));
        Random noise = new Random(41);
        StringBuilder b = new StringBuilder();
        b.append("# lodestep sample capture: Harrow & Vane Motion Works, HV-420 Y belt axis, motor HV-17M-045 s/n"
                + " HV17-0093\n");
        b.append("# sample_rate_hz=3000\n# sweep=linear\n# sweep_start_full_steps_per_s=30\n"
                + "# sweep_end_full_steps_per_s=400\n# sweep_duration_s=16\n# microsteps=1\n");
        b.append("accel_g,step_v\n");
        for (int i = 0; i < sig[0].length; i++) {
            b.append(String.format(Locale.ROOT, "%.4f,%.0f%n", sig[0][i] + 0.02 * noise.nextGaussian(),
                    sig[1][i]));
        }
        Files.writeString(file, b.toString().replace(System.lineSeparator(), "\n"), StandardCharsets.UTF_8);
    }

    /** A phone on the frame: 8 kHz, 16-bit mono, log sweep 40 → 600 in 24 s, room noise; no metadata. */
    static void phoneWav(Path file) throws IOException {
        int fs = 8000;
        SweepLaw law = new SweepLaw(SweepShape.LOG, 40, 600, 24);
        double[] a = rotor().run(law::rateFullStepsPerSAt, fs, fs * 24)[0];
        double max = 0;
        for (double v : a) {
            max = Math.max(max, Math.abs(v));
        }
        Random noise = new Random(43);
        ByteBuffer data = ByteBuffer.allocate(a.length * 2).order(ByteOrder.LITTLE_ENDIAN);
        for (double v : a) {
            double s = 0.4 * v / max + 0.01 * noise.nextGaussian();
            data.putShort((short) Math.max(-32768, Math.min(32767, Math.round(s * 32768))));
        }
        ByteBuffer h = ByteBuffer.allocate(44).order(ByteOrder.LITTLE_ENDIAN);
        h.put("RIFF".getBytes(StandardCharsets.US_ASCII)).putInt(36 + a.length * 2)
                .put("WAVE".getBytes(StandardCharsets.US_ASCII))
                .put("fmt ".getBytes(StandardCharsets.US_ASCII)).putInt(16).putShort((short) 1).putShort((short) 1)
                .putInt(fs).putInt(fs * 2).putShort((short) 2).putShort((short) 16)
                .put("data".getBytes(StandardCharsets.US_ASCII)).putInt(a.length * 2);
        byte[] out = new byte[44 + a.length * 2];
        System.arraycopy(h.array(), 0, out, 0, 44);
        System.arraycopy(data.array(), 0, out, 44, a.length * 2);
        Files.write(file, out);
    }

    /** A single full step from rest, rotor angle error from the axis encoder in degrees, 10 kHz, 20 ms pre-trigger. */
    static void ringDownCsv(Path file) throws IOException {
        double fs = 10_000;
        int pre = 200;
        double[] theta = rotor().singleStep(fs, 2800);
        Random noise = new Random(47);
        StringBuilder b = new StringBuilder();
        b.append("# lodestep sample capture: Harrow & Vane Motion Works, HV-420 Y axis, single full step of motor"
                + " HV17-0093\n");
        b.append("time_s,angle_deg\n");
        for (int i = 0; i < pre + theta.length; i++) {
            double deg = i < pre ? 0 : Math.toDegrees(theta[i - pre]);
            b.append(String.format(Locale.ROOT, "%.4f,%.4f%n", i / fs, deg + 0.002 * noise.nextGaussian()));
        }
        Files.writeString(file, b.toString().replace(System.lineSeparator(), "\n"), StandardCharsets.UTF_8);
    }
}
