package org.lodestep.drive;

import java.util.List;

import org.lodestep.resonance.RateUnits;

/**
 * Whether a load reaches its target speed with margin, and what to change if not.
 *
 * @param target                      the target speed in every unit
 * @param verdict                     the answer
 * @param pullOutAtTargetNm           pull-out torque at the target, N·m
 * @param requiredAtTargetNm          torque the load needs at constant target speed, N·m
 * @param marginAtTarget              margin left at the target ({@code 1 − required/pull-out}); negative when short
 * @param requiredMargin              margin asked for
 * @param maxRateWithMarginFullStepsPerS highest rate at which the margin still holds, full steps/s (0 when none;
 *                                    +inf when the load needs no torque at constant speed: no rate bounds it)
 * @param maxRateWithMargin           the same in every unit
 * @param accelerationAtTargetFullStepsPerS2 acceleration the torque with margin still gives at the target,
 *                                    full steps/s² (0 when none)
 * @param totalInertiaKgM2            rotor plus load inertia, kg·m²
 * @param suggestions                 changes that would reach the target with margin (empty when it already does)
 */
public record SpeedAnswer(RateUnits.Rate target, Verdict verdict, double pullOutAtTargetNm,
                          double requiredAtTargetNm, double marginAtTarget, double requiredMargin,
                          double maxRateWithMarginFullStepsPerS, RateUnits.Rate maxRateWithMargin,
                          double accelerationAtTargetFullStepsPerS2, double totalInertiaKgM2,
                          List<Suggestion> suggestions) {
    public SpeedAnswer {
        suggestions = List.copyOf(suggestions);
    }

    /** The answer in one word. */
    public enum Verdict {
        /** Reaches the target with at least the margin asked for. */
        REACHABLE,
        /** Reaches it, but with less margin than asked for. */
        MARGIN_SHORT,
        /** The load needs more than the pull-out torque at the target. */
        NOT_REACHABLE
    }
}
