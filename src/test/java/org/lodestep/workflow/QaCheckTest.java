package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.qa.CheckResult;
import org.lodestep.qa.Parameters;
import org.lodestep.qa.PartSpec;
import org.lodestep.qa.PartSpecReader;
import org.lodestep.qa.RecordQuery;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.RecordStores;
import org.lodestep.qa.StoredRecord;
import org.lodestep.qa.Verdict;
import org.lodestep.workflow.QaReadingSources.TypedInsulation;

/** The QA workflows driven as a second front end would: settings records in, records out, no command line. */
class QaCheckTest {

    @TempDir
    Path dir;

    private static final String SPEC = """
            [part]
            number = "KV-4218-M"
            revision = "C"
            spec_version = 3

            [resistance]
            phase_nominal_ohm = 1.50
            tolerance_pct = 10
            max_imbalance_pct = 5

            [inductance]
            phase_nominal_mh = 2.80
            tolerance_pct = 20

            [insulation]
            """;

    private PartSpec spec() throws Exception {
        return PartSpecReader.parse("kv.toml", SPEC.getBytes(StandardCharsets.UTF_8));
    }

    private RecordStore store() throws Exception {
        return RecordStores.open(dir.resolve("qa.sqlite").toString(), Map.of());
    }

    private static QaReadingSources typed(List<Double> ohm, List<Double> mh, List<TypedInsulation> ins) {
        return new QaReadingSources(null, null, ohm, mh, ins, null, null, null, null, null, null, null, null, null,
                null, null, null);
    }

    private static QaCheck.Settings settings(PartSpec spec, QaReadingSources src, QaCheck.InsulationConfirmation c) {
        return new QaCheck.Settings(spec, "L-9", src, 20, "tester", "bench-9", "test", c);
    }

    private static CheckResult check(StoredRecord r, String parameter, String label) {
        return r.submission().checks().stream().filter(c -> c.parameter().equals(parameter) && c.label().equals(label))
                .findFirst().orElseThrow();
    }

    @Test
    void typedMeterValuesAreConvertedToSiOnceAndRecorded() throws Exception {
        try (RecordStore store = store()) {
            QaReadingSources src = typed(List.of(1.50, 1.52), List.of(2.82, 2.83),
                    List.of(new TypedInsulation("A-frame", 850, Double.NaN)));
            RecordStore.Appended a = new QaCheck(settings(spec(), src, null), store).check("SN-1", Progress.NONE);
            assertTrue(a.created());
            assertEquals(Verdict.PASS, a.record().submission().verdict());
            // 2.82 mH is 2.82e-3 H; 850 Mohm is 8.5e8 ohm; the spec's 500 V DC (IEEE Std 43-2013 Table 1) applies
            assertEquals(List.of(2.82e-3, 2.83e-3), a.record().submission().measurements().phaseInductancesH());
            assertEquals(850e6, a.record().submission().measurements().insulation().get(0).resistanceOhm(), 1e-3);
            assertEquals(500, a.record().submission().measurements().insulation().get(0).testVoltageV());
            assertEquals(1, store.find(new RecordQuery("SN-1", null, null, null, null)).size());
        }
    }

    @Test
    void deadShortToFrameIsAFailedReadingNotAnError() throws Exception {
        try (RecordStore store = store()) {
            QaReadingSources src = typed(List.of(1.50, 1.52), List.of(),
                    List.of(new TypedInsulation("A-frame", 0, Double.NaN)));
            RecordStore.Appended a = new QaCheck(settings(spec(), src, null), store).check("SN-2", Progress.NONE);
            assertEquals(Verdict.FAIL, check(a.record(), Parameters.INSULATION_RESISTANCE, "A-frame").verdict());
        }
    }

    @Test
    void rigInsulationTestWaitsForTheFrontEndsConfirmation() throws Exception {
        QaReadingSources src = new QaReadingSources(null, null, null, null, null, null, null, "sim:bench-4", null,
                null, null, null, null, null, null, null, null);
        List<Double> asked = new ArrayList<>();
        try (RecordStore store = store()) {
            SettingsException refused = assertThrows(SettingsException.class, () -> new QaCheck(settings(spec(), src,
                    v -> {
                        asked.add(v);
                        return false;
                    }), store).check("KL-1", Progress.NONE));
            assertTrue(refused.getMessage().contains("not confirmed"), refused.getMessage());
            // IEEE Std 43-2013 Table 1: windings rated below 1000 V are tested at 500 V DC
            assertEquals(List.of(500.0), asked);
            assertTrue(store.find(new RecordQuery("KL-1", null, null, null, null)).isEmpty());

            List<String> notes = new ArrayList<>();
            List<String> steps = new ArrayList<>();
            Progress p = new Progress() {
                @Override
                public void step(String step) {
                    steps.add(step);
                }

                @Override
                public void note(String message) {
                    notes.add(message);
                }
            };
            // The virtual rig's bench-4 motor: 4 leads, two 0.75 ohm halves per phase (1.5 ohm), insulation 5 Gohm.
            RecordStore.Appended a = new QaCheck(settings(spec(), src, v -> true), store).check("KL-1", p);
            assertEquals(Verdict.INCOMPLETE, a.record().submission().verdict()); // no inductance reading
            assertEquals(Verdict.PASS, check(a.record(), Parameters.PHASE_RESISTANCE, "A").verdict());
            assertEquals(2, a.record().submission().measurements().insulation().size());
            assertEquals("rig", a.record().submission().measurements().captures().get(0).kind());
            assertTrue(notes.stream().anyMatch(n -> n.startsWith("insulation blk to frame at 500 V DC")), notes.toString());
            assertTrue(steps.contains("recording KL-1"), steps.toString());
        }
    }

    @Test
    void valueFromTwoSourcesIsRefusedNamingBoth() throws Exception {
        Path csv = dir.resolve("m.csv");
        Files.writeString(csv, "lead_a,lead_b,resistance_ohm\nred,blue,1.5\ngreen,black,1.5\nred,green,OL\n");
        QaReadingSources src = new QaReadingSources(csv, null, List.of(1.5, 1.5), null, null, null, null, null, null,
                null, null, null, null, null, null, null, null);
        try (RecordStore store = store()) {
            SettingsException e = assertThrows(SettingsException.class,
                    () -> new QaCheck(settings(spec(), src, null), store).check("SN-3", Progress.NONE));
            assertTrue(e.getMessage().contains("not both"), e.getMessage());
        }
    }

    @Test
    void lotReportCertificateAndExportComeFromTheStore() throws Exception {
        try (RecordStore store = store()) {
            QaCheck check = new QaCheck(settings(spec(), typed(List.of(1.50, 1.52), List.of(2.8, 2.8),
                    List.of(new TypedInsulation("A-frame", 850, Double.NaN))), null), store);
            for (String sn : List.of("SN-10", "SN-11", "SN-12")) {
                check.check(sn, Progress.NONE);
            }
            RecordQuery lot = new RecordQuery(null, "L-9", null, null, null);
            QaLotReport.Result report = QaLotReport.run(lot, store, Progress.NONE);
            assertEquals(3, report.records().size());
            assertEquals(3, report.summary().counts().motors());
            assertEquals(100.0, report.summary().counts().finalYieldPct(), 1e-12);
            // one series per phase, a point per motor in production order; every motor read the same 1.50 ohm on
            // phase A, so that series does not vary
            var r = report.summary().parameters().stream()
                    .filter(p -> p.parameter().equals(Parameters.PHASE_RESISTANCE) && p.label().equals("A"))
                    .findFirst().orElseThrow();
            assertEquals(3, r.points().size());
            assertEquals(2, r.movingRanges().length);
            assertEquals(0.0, r.movingRanges()[0], 1e-12);
            assertTrue(r.constant());

            QaCertificate.Result cert = QaCertificate.run("SN-11", null, store, Progress.NONE);
            assertTrue(cert.certifies());
            assertTrue(cert.earlier().isEmpty());
            assertThrows(SettingsException.class, () -> QaCertificate.run("NOPE", null, store, Progress.NONE));

            QaExport.Result export = QaExport.run(lot, store, Progress.NONE);
            assertEquals(3, export.records().size());
            int checks = export.records().get(0).submission().checks().size();
            assertEquals(3 * checks, export.rows());
            assertFalse(export.records().isEmpty());
        }
    }

    @Test
    void impossibleMeterLogInsulationIsABadLineNotAnInternalError() throws Exception {
        Path log = dir.resolve("log.csv");
        Files.writeString(log, "serial,phase_a_ohm,phase_b_ohm,insulation_a_frame_mohm\nSN-5,1.5,1.5,-5\n");
        QaReadingSources src = new QaReadingSources(null, null, null, null, null, null, null, null, log, null, null,
                null, null, null, null, null, null);
        try (RecordStore store = store()) {
            org.lodestep.sample.InputFormatException e = assertThrows(org.lodestep.sample.InputFormatException.class,
                    () -> new QaCheck(settings(spec(), src, null), store).check("SN-5", Progress.NONE));
            assertTrue(e.getMessage().contains("line 2") && e.getMessage().contains("insulation_a_frame_mohm"),
                    e.getMessage());
        }
    }

    @Test
    void patternsRefuseSerialsThatLeaveTheFolder() throws IOException {
        assertThrows(SettingsException.class,
                () -> QaMeasurementsAssembly.patternFile("--resistance-pattern", "caps/{serial}.csv", "../etc"));
        assertThrows(SettingsException.class,
                () -> QaMeasurementsAssembly.patternFile("--resistance-pattern", "caps/fixed.csv", "SN-1"));
        assertEquals(Path.of("caps/SN-1.csv"),
                QaMeasurementsAssembly.patternFile("--resistance-pattern", "caps/{serial}.csv", "SN-1"));
    }
}
