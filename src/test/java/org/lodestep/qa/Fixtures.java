package org.lodestep.qa;

import org.lodestep.wiring.InsulationReading;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.lodestep.sample.InputFormatException;

/** A small invented part spec and motors measured against it. */
final class Fixtures {
    static final String SPEC = """
            # Invented part: Kestrel Vale Motion KV-4218-M, NEMA 17 class hybrid stepper
            [part]
            number = "KV-4218-M"
            revision = "B"
            spec_version = 2
            description = "1.8 deg, 1.5 A/phase, bipolar"

            [resistance]
            phase_nominal_ohm = 2.0
            tolerance_pct = 10
            reference_c = 20
            max_imbalance_pct = 5

            [inductance]
            phase_nominal_mh = 3.2
            tolerance_pct = 20

            [insulation]
            minimum_mohm = 100
            rated_voltage_v = 24

            [step_angle]
            nominal_deg = 1.8
            """;

    private Fixtures() {
    }

    static PartSpec spec() {
        return spec(SPEC);
    }

    static PartSpec spec(String text) {
        try {
            return PartSpecReader.parse("kv-4218-m.toml", text.getBytes(StandardCharsets.UTF_8));
        } catch (InputFormatException e) {
            throw new AssertionError(e.getMessage(), e);
        }
    }

    static Measurements motor(double ra, double rb, double tempC, String captureSha) {
        return new Measurements(List.of(ra, rb), tempC, List.of(3.1e-3, 3.2e-3),
                List.of(new InsulationReading("A-frame", 800e6, 500), new InsulationReading("B-frame", 750e6, 500)),
                Double.NaN, 1.8,
                captureSha == null ? List.of() : List.of(new CaptureRef("m.csv", "resistance", captureSha)));
    }

    static Submission submission(String serial, String lot, Measurements m, String startedAt) {
        PartSpec spec = spec();
        Inspection.Judgement j = Inspection.judge(spec, m);
        return Submission.of(serial, lot, spec, j, m, 22.0, "inspector", "bench-1", startedAt, startedAt, "test");
    }

    static String sha(String text) {
        return Hashes.sha256(text);
    }
}
