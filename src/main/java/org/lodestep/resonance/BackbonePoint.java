package org.lodestep.resonance;

/**
 * One cycle of a ring-down: its swing amplitude, frequency and decay.
 *
 * @param amplitude       mean of the cycle's two half-wave peaks about the settled value, signal units
 * @param frequencyHz     1 / (cycle period between zero crossings), Hz
 * @param logDecrement    ln(peak / next cycle's peak), NaN on the last cycle
 * @param startTimeS      time of the cycle's first zero crossing, s
 */
public record BackbonePoint(double amplitude, double frequencyHz, double logDecrement, double startTimeS) {
    public BackbonePoint {
        Require.positive(amplitude, "cycle amplitude", "signal units");
        Require.positive(frequencyHz, "cycle frequency", "Hz");
    }
}
