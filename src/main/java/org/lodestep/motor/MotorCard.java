package org.lodestep.motor;

import java.util.List;
import java.util.Objects;
import org.lodestep.wiring.Finding;
import org.lodestep.wiring.Severity;

/**
 * Everything known about one motor after identification, and what is not known yet. Values that could not be
 * determined are null; {@link #unknowns()} says why and what to measure.
 *
 * @param topology                  {@code 4-lead}, {@code 5-lead}, {@code 6-lead}, {@code 8-lead} or {@code unknown}
 * @param leads                     every lead label seen
 * @param connection                {@code series}, {@code parallel}, {@code half} or {@code unipolar}
 * @param phases                    phases A and B with their half-windings and polarity (empty when not found)
 * @param wiring                    connection to the driver; null when it cannot be given yet
 * @param rotationConvention        what the phase order means for the direction of rotation
 * @param rotorTeeth                rotor teeth; null when unknown
 * @param fullStepsPerRevolution    {@code 4·Nr}; null when unknown
 * @param stepAngleDeg              full-step angle, degrees; null when unknown
 * @param keVsPerRad                back-EMF constant per half-winding (mean of the coils), peak V per mechanical
 *                                  rad/s; a full phase in series has twice this
 * @param ktNmPerA                  torque constant of a phase in the chosen connection, N·m/A (= its Ke)
 * @param phaseCurrentA             phase current the torque and rate figures use, A
 * @param phaseCurrentBasis         where that current came from
 * @param holdingTorqueNm           estimated peak torque at that current, N·m (ideal: no detent, no saturation)
 * @param ratedCurrentMinA          low end of the rated-current estimate, A
 * @param ratedCurrentMaxA          high end of the rated-current estimate, A
 * @param ratedCurrentAssumption    the assumption behind that range
 * @param supplyV                   supply voltage the rate figure uses, V
 * @param supplyBasis               where that voltage came from
 * @param suggestedSupplyV          rule-of-thumb supply voltage, V (common practice)
 * @param fullCurrentRateFullStepsPerS full-step rate above which the current no longer reaches its set value, in
 *                                  full stepping (each current reversal done within two full steps)
 * @param fullCurrentRateBasis      what that rate allows for (the inductance, and the back-EMF when Kt and the
 *                                  rotor teeth are known); null when there is no rate
 * @param inertiaKgM2               rotor plus load inertia used for the natural frequency, kg·m²
 * @param naturalFrequencyHz        small-oscillation natural frequency, Hz
 * @param unknowns                  what remains unknown and why, coded; each front end phrases it
 * @param findings                  every finding of every input, worst first
 * @param backEmf                   the back-EMF analysis the card used, or null
 * @param stepResponses             the step-response fits the card used
 */
public record MotorCard(String topology, List<String> leads, String connection, List<PhaseCard> phases, Wiring wiring,
                        String rotationConvention, Integer rotorTeeth, Integer fullStepsPerRevolution,
                        Double stepAngleDeg, Double keVsPerRad, Double ktNmPerA, Double phaseCurrentA,
                        String phaseCurrentBasis, Double holdingTorqueNm, Double ratedCurrentMinA,
                        Double ratedCurrentMaxA, String ratedCurrentAssumption, Double supplyV, String supplyBasis,
                        Double suggestedSupplyV, Double fullCurrentRateFullStepsPerS, String fullCurrentRateBasis,
                        Double inertiaKgM2, Double naturalFrequencyHz, List<Unknown> unknowns, List<Finding> findings,
                        BackEmfResult backEmf, List<StepInput> stepResponses) {
    public MotorCard {
        Objects.requireNonNull(topology, "topology");
        leads = List.copyOf(leads);
        Objects.requireNonNull(connection, "connection");
        phases = List.copyOf(phases);
        Checks.positiveOrNull(stepAngleDeg, "step angle", "deg");
        Checks.positiveOrNull(keVsPerRad, "Ke", "V·s/rad");
        Checks.positiveOrNull(ktNmPerA, "Kt", "N·m/A");
        Checks.positiveOrNull(phaseCurrentA, "phase current", "A");
        Checks.positiveOrNull(holdingTorqueNm, "holding torque", "N·m");
        Checks.positiveOrNull(ratedCurrentMinA, "rated current", "A");
        Checks.positiveOrNull(ratedCurrentMaxA, "rated current", "A");
        Checks.positiveOrNull(supplyV, "supply voltage", "V");
        Checks.positiveOrNull(suggestedSupplyV, "suggested supply", "V");
        Checks.finiteOrNull(fullCurrentRateFullStepsPerS, "full-current rate", "full steps/s");
        Checks.positiveOrNull(inertiaKgM2, "inertia", "kg·m²");
        Checks.positiveOrNull(naturalFrequencyHz, "natural frequency", "Hz");
        unknowns = List.copyOf(unknowns);
        findings = List.copyOf(findings);
        stepResponses = List.copyOf(stepResponses);
    }

    /** Ke per half-winding in volts per 1000 rpm, the unit of many data sheets; null when Ke is unknown. */
    public Double keVPerKrpm() {
        return keVsPerRad == null ? null : MotorConstants.keVPerKrpm(keVsPerRad);
    }

    /** The full-current step rate in revolutions per second; null when the rate or the steps per turn are unknown. */
    public Double fullCurrentRateRevPerS() {
        return fullCurrentRateFullStepsPerS == null || fullStepsPerRevolution == null ? null
                : fullCurrentRateFullStepsPerS / fullStepsPerRevolution;
    }

    /** True when any finding is an error. */
    public boolean hasError() {
        return findings.stream().anyMatch(f -> f.severity() == Severity.ERROR);
    }
}
