package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.motor.MotorFindingCode;
import org.lodestep.motor.Unknown;
import org.lodestep.wiring.Finding;

class MotorPhrasingTest {

    private static Unknown unknown(Unknown.What w) {
        return switch (w) {
            case STEP_INDUCTANCE -> new Unknown(w, List.of("1-7"), null);
            case POLARITY -> new Unknown(w, List.of("6-lead"), null);
            case COUPLING_ASSUMED_FULL -> new Unknown(w, List.of("A", "B"), null);
            case COUPLING_FROM_OTHER_PHASE -> new Unknown(w, List.of("B"), 0.95);
            default -> new Unknown(w, List.of(), null);
        };
    }

    @Test
    void plainPhrasingNamesNoOptionOfAnyFrontEnd() {
        for (Unknown.What w : Unknown.What.values()) {
            String text = MotorPhrasing.PLAIN.unknown(unknown(w), "series");
            assertFalse(text.isBlank(), w.name());
            assertFalse(text.contains("--"), w + ": " + text);
        }
    }

    @Test
    void hintsGoInParenthesesWhereTheSentenceAsksForAnInput() {
        MotorPhrasing hints = new MotorPhrasing() {
            @Override
            public String hint(Unknown.What what) {
                return "HINT";
            }

            @Override
            public String hint(Finding.Code code) {
                return code == MotorFindingCode.TEETH_UNKNOWN ? "TURNS" : null;
            }
        };
        assertTrue(hints.unknown(unknown(Unknown.What.STEP_ANGLE), "series").contains("turned (HINT) or an index"));
        assertTrue(hints.unknown(unknown(Unknown.What.STEP_INDUCTANCE), "series")
                .startsWith("step response 1-7: inductance needs the supply voltage (HINT)"));
        assertTrue(hints.unknown(unknown(Unknown.What.COUPLING_FROM_OTHER_PHASE), "series")
                .contains("coupling of phase B not measured: the coupling 0.950"));
        assertTrue(hints.finding(Finding.info(MotorFindingCode.TEETH_UNKNOWN, "no turns")).equals("no turns (TURNS)"));
        assertTrue(hints.finding(Finding.info(MotorFindingCode.SATURATION, "saturates")).equals("saturates"));
    }
}
