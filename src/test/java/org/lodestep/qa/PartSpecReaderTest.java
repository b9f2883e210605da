package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.lodestep.sample.InputFormatException;

class PartSpecReaderTest {

    private static InputFormatException bad(String text) {
        return assertThrows(InputFormatException.class,
                () -> PartSpecReader.parse("spec.toml", text.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void readsEveryCheckWithLimitsInSiUnits() {
        PartSpec s = Fixtures.spec();
        assertEquals("KV-4218-M", s.partNumber());
        assertEquals("B", s.revision());
        assertEquals(2, s.specVersion());
        assertEquals("kv-4218-m.toml", s.source());
        assertEquals(5, s.specVersionLine(), "after the comment, [part], number and revision");
        assertEquals(20.0, s.referenceTemperatureC());
        Limit r = s.limit(Parameters.PHASE_RESISTANCE).orElseThrow();
        assertEquals(1.8, r.lower(), 1e-12);
        assertEquals(2.2, r.upper(), 1e-12);
        Limit l = s.limit(Parameters.PHASE_INDUCTANCE).orElseThrow();
        assertEquals(3.2e-3, l.nominal(), 1e-15);
        assertEquals(2.56e-3, l.lower(), 1e-15);
        assertEquals(5.0, s.limit(Parameters.PHASE_IMBALANCE).orElseThrow().upper());
        // Defaults: 100 Mohm (common practice) at 500 V, IEEE 43 Table 1 for a 24 V winding.
        assertEquals(100e6, s.limit(Parameters.INSULATION_RESISTANCE).orElseThrow().lower());
        assertEquals(500, s.insulationTestVoltageV());
        // Step angle default tolerance 5 % (common practice): 1.71 .. 1.89 deg.
        assertEquals(1.89, s.limit(Parameters.STEP_ANGLE).orElseThrow().upper(), 1e-12);
        assertEquals(64, s.specSha256().length());
    }

    @Test
    void anyEditChangesTheSpecHash() {
        assertNotEquals(Fixtures.spec().specSha256(), Fixtures.spec(Fixtures.SPEC + "\n# note\n").specSha256());
    }

    @Test
    void misspelledKeyNamesItsLineAndTheKnownKeys() {
        InputFormatException e = bad(Fixtures.SPEC.replace("tolerance_pct = 10", "tolerence_pct = 10"));
        assertEquals(10, e.line());
        assertEquals("resistance.tolerence_pct", e.column());
        assertTrue(e.expected().contains("tolerance_pct"), e.getMessage());
    }

    @Test
    void textWhereNumberExpectedNamesLineKeyAndUnit() {
        InputFormatException e = bad(Fixtures.SPEC.replace("phase_nominal_ohm = 2.0", "phase_nominal_ohm = \"2,0\""));
        assertEquals(9, e.line());
        assertEquals("resistance.phase_nominal_ohm", e.column());
        assertTrue(e.getMessage().startsWith("spec.toml line 9, column resistance.phase_nominal_ohm: '2,0' expected ohms"),
                e.getMessage());
    }

    @Test
    void brokenTomlReportsItsLine() {
        InputFormatException e = bad("[part]\nnumber = \"A\"\nrevision = \nspec_version = 1\n");
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("is not valid TOML"), e.getMessage());
    }

    @Test
    void missingRequiredKeyAndSection() {
        assertTrue(bad("[part]\nnumber = \"A\"\nrevision = \"1\"\n[resistance]\nphase_nominal_ohm = 1\ntolerance_pct = 5\n")
                .getMessage().contains("lacks the key spec_version"));
        assertTrue(bad("[resistance]\nphase_nominal_ohm = 1\ntolerance_pct = 5\n").getMessage()
                .contains("has no [part] section"));
        assertTrue(bad("[part]\nnumber = \"A\"\nrevision = \"1\"\nspec_version = 1\n").getMessage()
                .contains("has no checks"));
    }

    @Test
    void fractionalOrZeroVersionIsRefused() {
        assertEquals("part.spec_version", bad(Fixtures.SPEC.replace("spec_version = 2", "spec_version = 2.5")).column());
        assertEquals("part.spec_version", bad(Fixtures.SPEC.replace("spec_version = 2", "spec_version = 0")).column());
    }

    @Test
    void impossibleToleranceAndBothVoltagesAreRefused() {
        assertEquals("resistance.tolerance_pct",
                bad(Fixtures.SPEC.replace("tolerance_pct = 10", "tolerance_pct = -3")).column());
        assertEquals("insulation.rated_voltage_v",
                bad(Fixtures.SPEC.replace("rated_voltage_v = 24", "rated_voltage_v = 24\ntest_voltage_v = 500")).column());
    }

    @Test
    void unknownSectionIsNamed() {
        InputFormatException e = bad(Fixtures.SPEC + "\n[torque]\nholding_nm = 0.4\n");
        assertEquals("torque", e.column());
        assertTrue(e.line() > 20);
    }
}
