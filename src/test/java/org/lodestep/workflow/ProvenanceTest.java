package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ProvenanceTest {
    private static final Instant AT = Instant.parse("2026-12-02T10:15:30.750Z");

    @Test
    void hashesEachInputFileWithSha256(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("abc.csv");
        Files.writeString(f, "abc", StandardCharsets.US_ASCII);
        Provenance p = Provenance.of("0.1.0", List.of("lodestep", "leads", "identify", f.toString()), AT)
                .withInput("readings", f);
        // references §24: NIST FIPS 180-2, Appendix B.1, SHA-256("abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", p.inputs().get(0).sha256());
        assertEquals(3, p.inputs().get(0).bytes());
        assertEquals("readings", p.inputs().get(0).role());
        assertEquals("lodestep 0.1.0", p.tool());
        // to the second: a report says when it ran, not the clock's noise
        assertEquals(Instant.parse("2026-12-02T10:15:30Z"), p.runAtUtc());
    }

    @Test
    void reportIdFollowsTheContentOfTheRun(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("r.csv");
        Files.writeString(f, "lead_a,lead_b,resistance_ohm\n1,2,2.4\n");
        Provenance a = Provenance.of("0.1.0", List.of("lodestep", "x"), AT).withInput("readings", f);
        Provenance again = Provenance.of("0.1.0", List.of("lodestep", "x"), AT).withInput("readings", f);
        assertTrue(a.reportId().matches("[0-9a-f]{12}"), a.reportId());
        assertEquals(a.reportId(), again.reportId(), "a reprint of one run keeps its ID");
        Files.writeString(f, "lead_a,lead_b,resistance_ohm\n1,2,2.5\n");
        Provenance changed = Provenance.of("0.1.0", List.of("lodestep", "x"), AT).withInput("readings", f);
        assertNotEquals(a.reportId(), changed.reportId(), "another input, another report");
        assertNotEquals(a.reportId(), a.withRig("virtual rig, firmware 0.1.0").reportId());
        assertNotEquals(a.reportId(), Provenance.of("0.1.0", List.of("lodestep", "x"), AT.plusSeconds(1))
                .withInput("readings", f).reportId());
    }

    @Test
    void aFileThatCannotBeReadKeepsANoteInsteadOfAHash(@TempDir Path dir) {
        Provenance p = Provenance.of("0.1.0", List.of("lodestep"), AT).withInput("readings", dir.resolve("gone.csv"));
        assertNull(p.inputs().get(0).sha256());
        assertEquals(-1, p.inputs().get(0).bytes());
        assertTrue(p.inputs().get(0).note().startsWith("not readable"), p.inputs().get(0).note());
    }

    @Test
    void uploadsAreHashedFromTheirBytes() {
        Provenance p = Provenance.of("0.1.0", List.of("station"), AT).withInput("sweep", "up.csv",
                "abc".getBytes(StandardCharsets.US_ASCII));
        // references §24: NIST FIPS 180-2, Appendix B.1
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", p.inputs().get(0).sha256());
    }

    @Test
    void commandTextQuotesArgumentsAShellWouldSplit() {
        Provenance p = Provenance.of("0.1.0", List.of("lodestep", "leads", "identify", "--pair", "red-blue=2.4",
                "my file.csv", "it's"), AT);
        assertEquals("lodestep leads identify --pair red-blue=2.4 'my file.csv' 'it'\\''s'", p.commandText());
    }
}
