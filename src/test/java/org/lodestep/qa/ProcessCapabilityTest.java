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

    // Bissell, "How reliable is your capability index?", Applied Statistics 39(3), 1990, normal approximation
    // (references §26): Cpk 1.33 from n = 30 -> 1.33 ± z·sqrt(1/270 + 1.33²/58), z = Φ⁻¹(0.975) from Commons Math's
    // NormalDistribution (reference library) = 1.959964 -> 0.9675 to 1.6925 (by hand).
    @Test
    void bissellIntervalMatchesAnIndependentComputation() {
        double z = new org.apache.commons.math3.distribution.NormalDistribution().inverseCumulativeProbability(0.975);
        double h = z * Math.sqrt(1.0 / 270 + 1.33 * 1.33 / 58);
        Capability c = ProcessCapability.estimate("Cp", 1.33, 30, 1.71, 2.09);
        assertEquals("Cpk", c.index());
        assertEquals(1.33 - h, c.lower(), 1e-12);
        assertEquals(1.33 + h, c.upper(), 1e-12);
        assertEquals(0.9675, c.lower(), 1e-4);
        assertEquals(1.6925, c.upper(), 1e-4);
        assertEquals(30, c.n());
    }

    // One-sided specs name the one-sided index; below ten values the figure is refused with the reason (our
    // minimum: at n = 10 the interval of a Cpk of 1.33 is already ±49 %, by Bissell's formula above).
    @Test
    void oneSidedSpecsNameTheirIndexAndTooFewValuesAreRefused() {
        assertEquals("Cpu", ProcessCapability.estimate("Cp", 0.5, 12, Double.NaN, 5).index());
        assertEquals("Ppl", ProcessCapability.estimate("Pp", 0.5, 12, 100e6, Double.NaN).index());
        Capability few = ProcessCapability.estimate("Cp", 1.5, 9, 1.71, 2.09);
        assertTrue(Double.isNaN(few.value()));
        assertTrue(few.refusal().contains("n = 9, at least 10"), few.refusal());
        assertEquals(0.49, ProcessCapability.halfWidth95(1.33, 10) / 1.33, 0.005);
    }
}
