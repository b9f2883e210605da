package org.lodestep.sample;

/**
 * The bounds every reader holds a file's numbers and names to before it allocates or loops on them (the README's
 * "Limits" table is copied from here).
 *
 * <p>The bounds are far beyond any bench instrument and far below what would overflow an analysis, so a real
 * capture never meets them and a damaged or hostile header is stopped at its line. They are sanity bounds of our
 * own choosing (common practice for defensive readers), not physical limits.
 */
public final class InputLimits {
    /** Highest sample rate accepted, Hz: a fast bench digitiser runs at a few MHz; audio recorders at 384 kHz. */
    public static final double MAX_SAMPLE_RATE_HZ = 20e6;
    /** Lowest sample rate accepted, Hz: one sample every 1000 s is already far slower than any stepper signal. */
    public static final double MIN_SAMPLE_RATE_HZ = 1e-3;
    /** Most channels in one capture (a WAV or a CSV); a bench capture has a handful. */
    public static final int MAX_CHANNELS = 64;
    /**
     * Largest magnitude of one sample or reading: no bench quantity in SI comes near it, and its square summed over
     * billions of samples stays finite, so no spectrum or fit overflows to infinity.
     */
    public static final double MAX_SAMPLE_MAGNITUDE = 1e15;
    /** Longest lead label, channel name, check label or option word, in characters. */
    public static final int MAX_LABEL_CHARS = 64;
    /** Longest serial number or lot number, in characters (a barcode symbol holds far fewer). */
    public static final int MAX_SERIAL_CHARS = 64;
    /** Longest operator, station, part or description text, in characters. */
    public static final int MAX_NAME_CHARS = 200;

    private InputLimits() {
    }

    /** Whether a sample rate in Hz is finite and within the accepted range. */
    public static boolean plausibleSampleRate(double rateHz) {
        return rateHz >= MIN_SAMPLE_RATE_HZ && rateHz <= MAX_SAMPLE_RATE_HZ;
    }

    /** Whether a sample or reading is finite and no larger in magnitude than {@link #MAX_SAMPLE_MAGNITUDE}. */
    public static boolean plausibleMagnitude(double value) {
        return Math.abs(value) <= MAX_SAMPLE_MAGNITUDE;
    }

    /** The words a refusal of a sample rate ends with. */
    public static String sampleRateExpected() {
        return "expected a sample rate from " + MIN_SAMPLE_RATE_HZ + " Hz to " + (long) MAX_SAMPLE_RATE_HZ + " Hz";
    }
}
