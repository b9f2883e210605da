package org.lodestep.qa;

import java.util.List;
import java.util.Objects;
import java.util.TreeSet;

/**
 * One motor's check as handed to the store: who tested which serial number against which spec version, what was
 * measured and what was concluded. The store keeps it verbatim (as JSON) with a SHA-256 over that text.
 *
 * @param serial        motor serial number, exactly as scanned (any characters)
 * @param lot           delivery lot, or empty
 * @param partNumber    part number of the spec used
 * @param partRevision  part revision of the spec used
 * @param specVersion   version of the spec used
 * @param specSha256    SHA-256 of the spec file used
 * @param verdict       overall verdict
 * @param checks        every check result
 * @param measurements  the raw values and captures
 * @param ambientC      ambient temperature at the bench, °C, or NaN when not given
 * @param operator      who tested, or empty
 * @param station       which test station, or empty
 * @param startedAtUtc  when the test started, ISO-8601 UTC ({@link Timestamps})
 * @param finishedAtUtc when the verdict was reached, ISO-8601 UTC
 * @param toolVersion   Lodestep version that judged it
 */
public record Submission(String serial, String lot, String partNumber, String partRevision, int specVersion,
                         String specSha256, Verdict verdict, List<CheckResult> checks, Measurements measurements,
                         double ambientC, String operator, String station, String startedAtUtc, String finishedAtUtc,
                         String toolVersion) {
    public Submission {
        Objects.requireNonNull(serial, "serial");
        Objects.requireNonNull(lot, "lot");
        Objects.requireNonNull(partNumber, "partNumber");
        Objects.requireNonNull(partRevision, "partRevision");
        Objects.requireNonNull(specSha256, "specSha256");
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(measurements, "measurements");
        Objects.requireNonNull(operator, "operator");
        Objects.requireNonNull(station, "station");
        Objects.requireNonNull(startedAtUtc, "startedAtUtc");
        Objects.requireNonNull(finishedAtUtc, "finishedAtUtc");
        Objects.requireNonNull(toolVersion, "toolVersion");
        checks = List.copyOf(checks);
        if (serial.isEmpty()) {
            throw new IllegalArgumentException("serial number is empty");
        }
        for (String[] f : new String[][] {{"serial", serial}, {"lot", lot}, {"operator", operator}, {"station", station}}) {
            // PostgreSQL text cannot hold U+0000; every other character is stored verbatim.
            if (f[1].indexOf('\u0000') >= 0) {
                throw new IllegalArgumentException(f[0] + " contains a NUL character (U+0000), which cannot be stored");
            }
        }
        if (!Double.isNaN(ambientC) && !(ambientC > -60 && ambientC < 100)) {
            throw new IllegalArgumentException("ambient temperature " + ambientC + " °C is outside -60..100 °C");
        }
        Timestamps.parse(startedAtUtc);
        Timestamps.parse(finishedAtUtc);
    }

    /** Builds a submission from a judgement. */
    public static Submission of(String serial, String lot, PartSpec spec, Inspection.Judgement j, Measurements m,
                                double ambientC, String operator, String station, String startedAtUtc,
                                String finishedAtUtc, String toolVersion) {
        return new Submission(serial, lot, spec.partNumber(), spec.revision(), spec.specVersion(), spec.specSha256(),
                j.verdict(), j.checks(), m, ambientC, operator, station, startedAtUtc, finishedAtUtc, toolVersion);
    }

    /**
     * The idempotency key: the same captures and values of the same serial judged by the same spec are one record,
     * however often submitted. Values typed in by hand alone (no capture) are keyed by their start time as well, so a
     * real re-test with equal readings is kept.
     */
    public String submissionKey() {
        StringBuilder b = new StringBuilder();
        b.append(serial).append('\u0000').append(specSha256).append('\u0000');
        TreeSet<String> hashes = new TreeSet<>();
        for (CaptureRef c : measurements.captures()) {
            hashes.add(c.kind() + ":" + c.sha256());
        }
        if (hashes.isEmpty()) {
            b.append("manual\u0000").append(startedAtUtc).append('\u0000');
        } else {
            b.append(String.join(",", hashes)).append('\u0000');
        }
        // The values too: the same capture with other hand-typed readings beside it is a different test.
        b.append(measurements.withoutCaptures());
        return Hashes.sha256(b.toString());
    }
}
