package org.lodestep.cli;

import org.lodestep.motor.MotorFindingCode;
import org.lodestep.motor.Unknown;
import org.lodestep.report.MotorPhrasing;
import org.lodestep.wiring.Finding;

/** {@code motor identify}'s phrasing of what is unknown: its options and the capture files' metadata lines. */
final class MotorOptionHints implements MotorPhrasing {
    static final MotorOptionHints INSTANCE = new MotorOptionHints();

    private MotorOptionHints() {
    }

    @Override
    public String hint(Unknown.What what) {
        return switch (what) {
            case STEP_INDUCTANCE -> "--step-supply-v or '# supply_v='";
            case PHASES_OF_EIGHT_LEAD -> "--back-emf";
            case STEP_ANGLE -> "--revolutions or '# revolutions='";
            default -> null;
        };
    }

    @Override
    public String hint(Finding.Code code) {
        return code == MotorFindingCode.TEETH_UNKNOWN ? "give --revolutions or a '# revolutions=' line" : null;
    }
}
