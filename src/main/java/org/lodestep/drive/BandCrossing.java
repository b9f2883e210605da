package org.lodestep.drive;

/**
 * How the planned profile crosses one band on its way up (the way down mirrors it).
 *
 * @param band                 the band
 * @param accelerationFullStepsPerS2 least acceleration inside the band, full steps/s²
 * @param allowedFullStepsPerS2 least acceleration the torque with margin allows inside the band, full steps/s²
 * @param timeInBandS          time spent inside the band, s
 * @param raised               true when the acceleration was raised above the base level for this band
 */
public record BandCrossing(Band band, double accelerationFullStepsPerS2, double allowedFullStepsPerS2,
                           double timeInBandS, boolean raised) {
}
