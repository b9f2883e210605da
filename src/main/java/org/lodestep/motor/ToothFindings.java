package org.lodestep.motor;

import java.util.ArrayList;
import java.util.List;

import org.lodestep.wiring.Finding;

/** The findings a tooth count gives rise to: a refusal with its candidates, a preferred common count, an odd count. */
final class ToothFindings {
    private ToothFindings() {
    }

    static List<Finding> of(ToothCount t) {
        List<Finding> out = new ArrayList<>();
        String measured = String.format("%.2f ± %.2f electrical cycles over %s revolutions (%.2f to %.2f teeth)",
                t.cyclesCounted(), t.cyclesUncertainty(), trim(t.revolutions()), t.lowestTeeth(), t.highestTeeth());
        switch (t.confidence()) {
            case EXACT -> {
                if (!isCommon(t.teeth())) {
                    out.add(Finding.warning(MotorFindingCode.UNUSUAL_TEETH, t.teeth() + " rotor teeth is unusual for a hybrid "
                            + "motor (50 for 1.8°, 100 for 0.9°); " + measured + "; check the revolution count"));
                }
            }
            case COMMON_COUNT -> out.add(Finding.info(MotorFindingCode.TEETH_COMMON_COUNT, measured + " allow "
                    + t.candidates() + "; " + t.teeth() + ", the one common count among them, is taken"));
            case AMBIGUOUS -> out.add(Finding.warning(MotorFindingCode.TEETH_AMBIGUOUS, measured + " do not settle one whole "
                    + "number" + (t.candidates().isEmpty() ? "" : " (candidates " + t.candidates() + ")")
                    + ": no step angle is given; turn a whole number of turns against a mark, from rest to rest, "
                    + "at a steady speed, or record an index channel"));
            case INCONSISTENT -> out.add(Finding.warning(MotorFindingCode.TEETH_NOT_INTEGER, measured + " fit no whole number "
                    + "of teeth: check the revolution count"));
            default -> throw new IllegalStateException(t.confidence().toString());
        }
        return out;
    }

    private static boolean isCommon(int teeth) {
        for (int c : ToothCounter.COMMON_TEETH) {
            if (c == teeth) {
                return true;
            }
        }
        return false;
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }
}
