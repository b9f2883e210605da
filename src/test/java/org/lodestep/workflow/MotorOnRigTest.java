package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.lodestep.motor.HalfWinding;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.StepInput;
import org.lodestep.rig.RigClient;

class MotorOnRigTest {

    @Test
    void identifiesShuffledEightLeadMotorOnVirtualRig() throws Exception {
        // Virtual rig scenario salvage-8 (rig package): coils red-red/wht and yel-yel/wht form one phase (starts red,
        // yel), blk-blk/wht and org-org/wht the other (starts blk, org); labels shuffled over the relay positions;
        // 50 rotor teeth, 1.1 mH and Ke 0.13 V·s/rad per half-winding. The simulated hand turns 2.5 s at 90 rpm
        // with 20 % ramps: 1.5 rev/s x 2.5 s x 0.8 = 3 revolutions.
        List<String> stages = new ArrayList<>();
        MotorCard card;
        try (RigClient rig = RigClient.open("sim:salvage-8")) {
            card = MotorOnRig.run(rig, new MotorOnRig.Settings(3.0, MotorCardSettings.NONE), new MotorOnRig.Listener() {
                @Override
                public void turnTheShaft(int coils, double seconds) {
                    stages.add("back-EMF of " + coils);
                }

                @Override
                public void outputsOff() {
                    stages.add("off");
                }
            }).card();
        }
        assertEquals("8-lead", card.topology());
        List<Set<String>> joins = new ArrayList<>();
        card.wiring().joinTogether().forEach(j -> joins.add(Set.copyOf(j)));
        // Series aiding joins the end of one coil to the start of the other coil of the same phase.
        assertTrue(joins.contains(Set.of("blk/wht", "org")) || joins.contains(Set.of("org/wht", "blk")), joins.toString());
        assertTrue(joins.contains(Set.of("red/wht", "yel")) || joins.contains(Set.of("yel/wht", "red")), joins.toString());
        // Acarnley, Stepping Motors, 4th ed., ch. 1-2, references §1: 50 teeth -> 1.8°
        assertEquals(1.8, card.stepAngleDeg(), 1e-12);
        assertEquals(0.13, card.keVsPerRad(), 0.13 * 0.03);
        HalfWinding hw = card.phases().get(0).halfWindings().get(0);
        assertEquals(1.1e-3, hw.inductanceH(), 1.1e-3 * 0.03);
        assertEquals(List.of("back-EMF of 4", "off"), stages);
        // The rig states the series resistance of its step drive (drive_series_ohm, firmware-protocol.md section 3);
        // without subtracting it the fitted coils read 1.35 ohm and every step response raised a mismatch finding.
        for (StepInput fit : card.stepResponses()) {
            assertEquals(1.25, fit.fit().windingResistanceOhm(), 1.25 * 0.02, fit.toString());
        }
        // The only finding says which limit sets the full-current rate: at the suggested supply the back-EMF of the
        // series phase (2 × 0.13 V·s/rad) binds well below the inductance-only rate.
        assertEquals(1, card.findings().size(), card.findings().toString());
        assertEquals(org.lodestep.motor.MotorFindingCode.FULL_CURRENT_LIMIT, card.findings().get(0).code());
        assertTrue(card.findings().get(0).message().contains("limited by back-EMF"), card.findings().toString());
        // ... and the card's own account of the rate says the same, not that the back-EMF was left out
        assertTrue(card.fullCurrentRateBasis().contains("back-EMF at its peak"), card.fullCurrentRateBasis());
        String text = org.lodestep.report.MotorCardText.render(card);
        assertFalse(text.contains("back-EMF ignored"), text);
    }
}
