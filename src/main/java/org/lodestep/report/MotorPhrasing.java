package org.lodestep.report;

import java.util.Locale;

import org.lodestep.motor.Unknown;
import org.lodestep.wiring.Finding;

/**
 * How a front end names the inputs that would settle what a motor card leaves unknown: the command line names its
 * options, a bench station its buttons. The sentences themselves are the report's; only the hints differ.
 */
public interface MotorPhrasing {

    /** Plain phrasing, naming no front end's controls. */
    MotorPhrasing PLAIN = new MotorPhrasing() {
    };

    /**
     * Where to give what {@code what} needs, as a short parenthetical without its brackets, e.g. the option and the
     * file metadata line; null to say nothing more than the sentence.
     */
    default String hint(Unknown.What what) {
        return null;
    }

    /** As {@link #hint(Unknown.What)}, for a finding whose remedy is an input; null for none. */
    default String hint(Finding.Code code) {
        return null;
    }

    /** The sentence for one unknown of a card wired in {@code connection} ({@code series}, {@code parallel}, ...). */
    default String unknown(Unknown u, String connection) {
        String hint = hint(u.what());
        String h = hint == null ? "" : " (" + hint + ")";
        String phases = u.subjects().isEmpty() ? "" : "phase" + (u.subjects().size() > 1 ? "s " : " ")
                + String.join(" and ", u.subjects());
        return switch (u.what()) {
            case STEP_INDUCTANCE -> "step response " + String.join(", ", u.subjects())
                    + ": inductance needs the supply voltage" + h + " or the coil resistance";
            case PHASES_OF_EIGHT_LEAD -> "which coils share a phase, and their polarity: an 8-lead motor needs a "
                    + "back-EMF capture" + h + " before it can be wired in series or parallel";
            case PHASES_OF_FIVE_LEAD -> "which coils form phases A and B: the four coils of a 5-lead motor share one "
                    + "lead, so only a back-EMF capture" + h + " can pair them";
            case PHASES_NO_LAYOUT -> "the phases: the resistances fit no 4-, 5-, 6- or 8-lead layout (see the "
                    + "findings)";
            case PHASES_NO_DATA -> "the phases: give a resistance matrix and/or a back-EMF capture" + h;
            case POLARITY -> "coil polarity: not needed to wire a " + String.join(", ", u.subjects()) + " motor, it "
                    + "only sets the direction (swap A+ and A- to reverse); a back-EMF capture fixes it";
            case COUPLING_ASSUMED_FULL -> "coupling of the two coils of a phase: the " + connection + " inductance of "
                    + phases + " assumes kappa = 1 (an upper bound); a step response across a whole phase in series "
                    + "measures it";
            case COUPLING_FROM_OTHER_PHASE -> String.format(Locale.ROOT, "coupling of %s not measured: the coupling "
                    + "%.3f of the other phase is used", phases, u.value());
            case STEP_ANGLE -> "step angle: needs a back-EMF capture with the number of revolutions turned" + h
                    + " or an index channel";
            case KE -> "Ke, Kt and torque: need a back-EMF capture with a known number of revolutions" + h;
            case RATED_CURRENT -> "rated current: needs the phases and their coil resistances";
            case INDUCTANCE -> "inductance, time constant and the full-current step rate: need step responses" + h;
            case NATURAL_FREQUENCY -> "natural frequency: needs the rotor teeth and Ke (back-EMF with revolutions)";
        };
    }

    /** What is unknown, by name in a few words ("coupling of phase B"), for the card's first lines. */
    default String name(Unknown u) {
        String phases = u.subjects().isEmpty() ? "" : " of phase" + (u.subjects().size() > 1 ? "s " : " ")
                + String.join(" and ", u.subjects());
        return switch (u.what()) {
            case STEP_INDUCTANCE -> "inductance of step response " + String.join(", ", u.subjects());
            case PHASES_OF_EIGHT_LEAD -> "which coils share a phase, and their polarity";
            case PHASES_OF_FIVE_LEAD -> "which coils form phases A and B";
            case PHASES_NO_LAYOUT, PHASES_NO_DATA -> "the phases";
            case POLARITY -> "coil polarity (direction only)";
            case COUPLING_ASSUMED_FULL -> "coupling" + phases + " (full coupling assumed)";
            case COUPLING_FROM_OTHER_PHASE -> "coupling" + phases + " (the other phase's used)";
            case STEP_ANGLE -> "step angle";
            case KE -> "Ke, Kt and torque";
            case RATED_CURRENT -> "rated current";
            case INDUCTANCE -> "inductance and time constant";
            case NATURAL_FREQUENCY -> "natural frequency";
        };
    }

    /** A finding's message, with the hint to its remedy where this phrasing has one. */
    default String finding(Finding f) {
        String hint = hint(f.code());
        return hint == null ? f.message() : f.message() + " (" + hint + ")";
    }
}
