package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ProcessCapabilityTest {

    // Montgomery, Introduction to Statistical Quality Control, 7th ed., ch. 8 (formulas); worked values from the
    // course notes "8.3 Using Process Capability Ratios" (Montgomery, Statistical Quality Control, 7th ed., ch. 8,
    // references §19): LSL 1.80, USL 2.20, mean 2.04,
    // sigma 0.05 -> Cp 1.3333, Cpk = Cpu = 1.0667 (Cpl 1.6000).
    @Test
    void offCentreProcessMatchesWorkedExample() {
        ProcessCapability.Indices i = ProcessCapability.of(2.04, 0.05, 1.80, 2.20);
        assertEquals(1.3333, i.potential(), 1.3333 * 1e-4);
        assertEquals(1.0667, i.actual(), 1.0667 * 1e-4);
    }

    // Same source: Cpl = (mean - LSL)/(3 sigma) = 1.6000 is the one-sided index when only a minimum is specified.
    @Test
    void minimumOnlySpecGivesOneSidedIndexAndNoCp() {
        ProcessCapability.Indices i = ProcessCapability.of(2.04, 0.05, 1.80, Double.NaN);
        assertTrue(Double.isNaN(i.potential()));
        assertEquals(1.6000, i.actual(), 1.6 * 1e-4);
    }

    @Test
    void zeroSpreadGivesUndefinedIndices() {
        ProcessCapability.Indices i = ProcessCapability.of(2.0, 0.0, 1.8, 2.2);
        assertTrue(Double.isNaN(i.potential()) && Double.isNaN(i.actual()));
    }
}
