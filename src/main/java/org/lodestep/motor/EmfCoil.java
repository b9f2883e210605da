package org.lodestep.motor;

import java.util.Objects;

/**
 * One back-EMF channel after phasing.
 *
 * @param measured              the lead pair as recorded, {@code +} on its first lead
 * @param phase                 {@code "A"} or {@code "B"}: channels of one phase are in phase or in antiphase,
 *                              the two phases are 90° electrical apart
 * @param oriented              the same leads ordered start to end: the start is positive when the reference channel
 *                              of its phase is positive
 * @param phaseDeg              electrical angle of the oriented channel relative to phase A's reference, degrees;
 *                              0 for phase A, -90 for phase B (B lags A in the direction turned)
 * @param rmsV                  RMS of the recorded voltage, V
 * @param keVsPerElectricalRad  peak volts per electrical rad/s
 * @param keVsPerRad            peak volts per mechanical rad/s; null until the rotor tooth count is known
 */
public record EmfCoil(OrientedLeads measured, String phase, OrientedLeads oriented, double phaseDeg, double rmsV,
                      double keVsPerElectricalRad, Double keVsPerRad) {
    public EmfCoil {
        Objects.requireNonNull(measured, "measured");
        Objects.requireNonNull(phase, "phase");
        Objects.requireNonNull(oriented, "oriented");
        Checks.finite(phaseDeg, "phase", "deg");
        Checks.nonNegative(rmsV, "RMS voltage", "V");
        Checks.nonNegative(keVsPerElectricalRad, "Ke", "V·s/rad (electrical)");
        Checks.positiveOrNull(keVsPerRad, "Ke", "V·s/rad");
    }

    /** True when the start of the coil is the second lead of the recorded pair. */
    public boolean reversed() {
        return !oriented.equals(measured);
    }
}
