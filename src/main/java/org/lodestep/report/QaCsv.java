package org.lodestep.report;

import java.io.IOException;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.lodestep.qa.CheckResult;
import org.lodestep.qa.StoredRecord;
import org.lodestep.qa.Submission;

/**
 * QA records as CSV (RFC 4180), one row per check result, values in SI units as stored. Every text cell that a
 * spreadsheet would evaluate (starting with {@code =}, {@code +}, {@code -}, {@code @}, tab or carriage return, so
 * {@code -2+3} too) gets a leading apostrophe, as the OWASP "CSV Injection" guidance recommends (references §28);
 * numbers we format ourselves are written as numbers.
 */
public final class QaCsv {
    /** The header, in column order. */
    static final List<String> HEADER = List.of("record_id", "retest_of", "serial", "lot", "part_number",
            "part_revision", "spec_version", "spec_sha256", "verdict", "started_at", "finished_at", "recorded_at",
            "operator", "station", "tool_version", "ambient_c", "winding_c", "parameter", "label", "measured", "judged",
            "unit", "lower", "upper", "check_verdict", "note", "record_sha256", "intact");

    private QaCsv() {
    }

    public static void write(List<StoredRecord> records, Appendable out) throws IOException {
        CSVFormat format = CSVFormat.RFC4180.builder().setHeader(HEADER.toArray(String[]::new)).get();
        try (CSVPrinter p = new CSVPrinter(out, format)) {
            for (StoredRecord r : records) {
                Submission s = r.submission();
                for (CheckResult c : s.checks()) {
                    p.printRecord(r.id(), r.retestOf() == null ? "" : r.retestOf(), text(s.serial()), text(s.lot()),
                            text(s.partNumber()), text(s.partRevision()), s.specVersion(), s.specSha256(),
                            s.verdict(), s.startedAtUtc(), s.finishedAtUtc(), r.recordedAtUtc(), text(s.operator()),
                            text(s.station()), text(s.toolVersion()), num(s.ambientC()),
                            num(s.measurements().windingTemperatureC()), c.parameter(), text(c.label()),
                            num(c.measured()), num(c.judged()), c.limit().unit(), num(c.limit().lower()),
                            num(c.limit().upper()), c.verdict(), text(c.note()), r.bodySha256(), r.intact());
                }
            }
        }
    }

    private static String num(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    static String text(String s) {
        if (s.isEmpty()) {
            return s;
        }
        char c = s.charAt(0);
        boolean formula = c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r';
        return formula ? "'" + s : s;
    }
}
