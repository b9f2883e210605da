package org.lodestep.drive;

/**
 * The torque margin: the share of the pull-out torque left unused, {@code 1 − T_required/T_pull-out}.
 *
 * <p>Common practice (no published source): size a stepper axis so that 30 to 50 % of the pull-out torque stays in
 * reserve, for the model's errors (saturation, heat, supply sag), wear and resonance; {@link #DEFAULT} is the low end
 * of that range.
 */
public final class Margin {
    /** Default margin, 30 % (common practice: 30 to 50 %). */
    public static final double DEFAULT = 0.30;
    /** Low end of the common-practice range. */
    public static final double COMMON_LOW = 0.30;
    /** High end of the common-practice range. */
    public static final double COMMON_HIGH = 0.50;

    private Margin() {
    }

    /** Rejects a margin outside [0, 1). */
    public static double check(double margin) {
        if (!(margin >= 0 && margin < 1)) {
            throw new IllegalArgumentException("torque margin must be from 0 to below 1 (0.3 = 30 %), got " + margin);
        }
        return margin;
    }

    /** Margin left when {@code requiredNm} is asked of {@code pullOutNm}; negative when the load exceeds it. */
    public static double of(double pullOutNm, double requiredNm) {
        return pullOutNm > 0 ? 1 - requiredNm / pullOutNm : Double.NEGATIVE_INFINITY;
    }

    /** Torque usable with a margin kept in reserve, N·m. */
    public static double usableNm(double pullOutNm, double margin) {
        return (1 - margin) * pullOutNm;
    }
}
