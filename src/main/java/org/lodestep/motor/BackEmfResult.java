package org.lodestep.motor;

import java.util.List;
import java.util.Objects;
import org.lodestep.wiring.Finding;

/**
 * Phasing, electrical frequency and tooth count from a hand-turned back-EMF capture.
 *
 * @param coils                      every live channel, phased; dead channels appear only as findings
 * @param electricalCycles           electrical cycles turned (net when both phases were recorded)
 * @param movingDurationS            time the shaft was turning fast enough to measure, s
 * @param meanElectricalFrequencyHz  cycles over moving time, Hz
 * @param minElectricalFrequencyHz   slowest 20 ms block while moving, Hz
 * @param maxElectricalFrequencyHz   fastest 20 ms block, Hz
 * @param revolutions                mechanical revolutions the cycles were counted over; null when unknown
 * @param revolutionSource           where {@code revolutions} came from
 * @param cyclesPerRevolution        electrical cycles per revolution before rounding; null when unknown
 * @param rotorTeeth                 rotor teeth; null when unknown
 * @param quadratureLagDeg           how far phase B lags phase A, electrical degrees (about 90); null with one phase
 * @param directionReversals         times the turning direction changed during the capture
 * @param toothCount                 how the tooth count was read and how far it is trusted; null without revolutions
 * @param findings                   warnings and errors about the capture
 */
public record BackEmfResult(List<EmfCoil> coils, double electricalCycles, double movingDurationS,
                            double meanElectricalFrequencyHz, double minElectricalFrequencyHz,
                            double maxElectricalFrequencyHz, Double revolutions, RevolutionSource revolutionSource,
                            Double cyclesPerRevolution, Integer rotorTeeth, Double quadratureLagDeg,
                            int directionReversals, ToothCount toothCount, List<Finding> findings) {
    public BackEmfResult {
        coils = List.copyOf(coils);
        Checks.nonNegative(electricalCycles, "electrical cycles", "cycles");
        Checks.nonNegative(movingDurationS, "moving duration", "s");
        Checks.nonNegative(meanElectricalFrequencyHz, "mean electrical frequency", "Hz");
        Checks.nonNegative(minElectricalFrequencyHz, "min electrical frequency", "Hz");
        Checks.nonNegative(maxElectricalFrequencyHz, "max electrical frequency", "Hz");
        Checks.positiveOrNull(revolutions, "revolutions", "rev");
        Objects.requireNonNull(revolutionSource, "revolutionSource");
        Checks.positiveOrNull(cyclesPerRevolution, "cycles per revolution", "cycles/rev");
        if (rotorTeeth != null && rotorTeeth < 1) {
            throw new IllegalArgumentException("rotor teeth must be at least 1, got " + rotorTeeth);
        }
        Checks.finiteOrNull(quadratureLagDeg, "phase B lag", "deg");
        if (directionReversals < 0) {
            throw new IllegalArgumentException("direction reversals must be zero or more, got " + directionReversals);
        }
        findings = List.copyOf(findings);
    }

    /** The coils of one phase ({@code "A"} or {@code "B"}), in recorded order. */
    public List<EmfCoil> phase(String name) {
        return coils.stream().filter(c -> c.phase().equals(name)).toList();
    }
}
