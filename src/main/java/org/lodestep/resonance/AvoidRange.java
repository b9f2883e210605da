package org.lodestep.resonance;

/**
 * One step-rate range to avoid (or to cross quickly), in every unit the user may program, with advice.
 *
 * @param fromFullStepsPerS               lower edge, full steps/s
 * @param toFullStepsPerS                 upper edge, full steps/s
 * @param fromPulsesPerS                  lower edge in step pulses/s at the microstep setting
 * @param toPulsesPerS                    upper edge in step pulses/s
 * @param fromRpm                         lower edge, rpm
 * @param toRpm                           upper edge, rpm
 * @param fromMmPerS                      lower edge, mm/s of the axis (NaN without travel per revolution)
 * @param toMmPerS                        upper edge, mm/s (NaN without travel per revolution)
 * @param bandClass                       kind of resonance
 * @param subharmonic                     k when at f_n/k, else 0
 * @param oscillationHz                   frequency of the oscillation that builds up there, Hz
 * @param minAccelerationFullStepsPerS2   least acceleration to cross within the stated periods, full steps/s²
 * @param minAccelerationPulsesPerS2      the same in step pulses/s²
 * @param minAccelerationMmPerS2          the same in mm/s² (NaN without travel per revolution)
 * @param microsteppingHelps              whether finer microstepping is expected to weaken this band
 * @param dampingHelps                    whether more load damping is expected to weaken this band
 * @param advice                          one sentence for the user
 */
public record AvoidRange(double fromFullStepsPerS, double toFullStepsPerS, double fromPulsesPerS,
                         double toPulsesPerS, double fromRpm, double toRpm, double fromMmPerS, double toMmPerS,
                         BandClass bandClass, int subharmonic, double oscillationHz,
                         double minAccelerationFullStepsPerS2, double minAccelerationPulsesPerS2,
                         double minAccelerationMmPerS2, boolean microsteppingHelps, boolean dampingHelps,
                         String advice) {
    public AvoidRange {
        if (!(fromFullStepsPerS > 0 && toFullStepsPerS >= fromFullStepsPerS)) {
            throw new IllegalArgumentException("avoid range must be positive and rising, got " + fromFullStepsPerS
                    + " ... " + toFullStepsPerS + " full steps/s");
        }
    }
}
