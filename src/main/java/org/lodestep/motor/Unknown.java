package org.lodestep.motor;

import java.util.List;
import java.util.Objects;

/**
 * Something the motor card could not determine, and why, as a coded value: each front end phrases it in its own terms
 * (the command line names its options, a bench station its buttons).
 *
 * @param what     what is unknown and why
 * @param subjects what it concerns: the step response's leads ({@link What#STEP_INDUCTANCE}), the layout's label
 *                 ({@link What#POLARITY}), the phases ({@link What#COUPLING_ASSUMED_FULL},
 *                 {@link What#COUPLING_FROM_OTHER_PHASE}); otherwise empty
 * @param value    the coupling factor used instead ({@link What#COUPLING_FROM_OTHER_PHASE}); otherwise null
 */
public record Unknown(What what, List<String> subjects, Double value) {

    /** What is unknown, each with the measurement that would settle it. */
    public enum What {
        /** A step response's inductance: neither the step voltage nor the coil's resistance is known. */
        STEP_INDUCTANCE,
        /** Which coils of an 8-lead motor share a phase, and their polarity: needs a back-EMF capture. */
        PHASES_OF_EIGHT_LEAD,
        /** Which coils of a 5-lead motor form the phases: only a back-EMF capture can pair them. */
        PHASES_OF_FIVE_LEAD,
        /** The phases: the resistances fit no 4-, 5-, 6- or 8-lead layout. */
        PHASES_NO_LAYOUT,
        /** The phases: neither resistances nor a back-EMF capture were given. */
        PHASES_NO_DATA,
        /** Coil polarity: not needed to wire this layout, it only sets the direction; back-EMF fixes it. */
        POLARITY,
        /** Coupling of the two coils of a phase not measured: full coupling (an upper bound) is assumed. */
        COUPLING_ASSUMED_FULL,
        /** Coupling of these phases not measured: the other phase's measured coupling is used. */
        COUPLING_FROM_OTHER_PHASE,
        /** Step angle: needs a back-EMF capture with the revolutions turned, or an index channel. */
        STEP_ANGLE,
        /** Ke, Kt and torque: need a back-EMF capture with a known number of revolutions. */
        KE,
        /** Rated current: needs the phases and their coil resistances. */
        RATED_CURRENT,
        /** Inductance, time constant and the full-current step rate: need step responses. */
        INDUCTANCE,
        /** Natural frequency: needs the rotor teeth and Ke (a back-EMF capture with revolutions). */
        NATURAL_FREQUENCY
    }

    public Unknown {
        Objects.requireNonNull(what, "what");
        subjects = List.copyOf(subjects);
        Checks.finiteOrNull(value, "unknown's value", "");
    }

    static Unknown of(What what, String... subjects) {
        return new Unknown(what, List.of(subjects), null);
    }
}
