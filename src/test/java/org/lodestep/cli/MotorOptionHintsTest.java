package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;
import org.lodestep.motor.MotorFindingCode;
import org.lodestep.motor.Unknown;

class MotorOptionHintsTest {

    @Test
    void eachHintNamesTheOptionThatSuppliesTheMissingInput() {
        // the step voltage of a step-response file is --step-supply-v; --supply-v is the driver's supply
        assertEquals("--step-supply-v or '# supply_v='",
                MotorOptionHints.INSTANCE.hint(Unknown.What.STEP_INDUCTANCE));
        assertEquals("--revolutions or '# revolutions='", MotorOptionHints.INSTANCE.hint(Unknown.What.STEP_ANGLE));
        assertEquals("--back-emf", MotorOptionHints.INSTANCE.hint(Unknown.What.PHASES_OF_EIGHT_LEAD));
        assertNull(MotorOptionHints.INSTANCE.hint(Unknown.What.RATED_CURRENT));
        assertEquals("give --revolutions or a '# revolutions=' line",
                MotorOptionHints.INSTANCE.hint(MotorFindingCode.TEETH_UNKNOWN));
    }
}
