package org.lodestep.cli;

import java.time.format.DateTimeParseException;

import org.lodestep.qa.RecordQuery;
import org.lodestep.qa.Timestamps;

import picocli.CommandLine.Option;

/** Which records a report or export covers: a lot, a part, a date range (any combination; none means all). */
final class QaFilterOptions {

    @Option(names = "--lot", paramLabel = "LOT", description = "Only this delivery lot.")
    String lot;

    @Option(names = "--part", paramLabel = "PART", description = "Only this part number.")
    String part;

    @Option(names = "--from", paramLabel = "DATE",
            description = "Only tests started at or after this date (YYYY-MM-DD, UTC) or instant (ISO-8601).")
    String from;

    @Option(names = "--to", paramLabel = "DATE",
            description = "Only tests started before the end of this date (YYYY-MM-DD, UTC) or before this instant.")
    String to;

    RecordQuery query() {
        return new RecordQuery(null, lot, part, instant("--from", from, false), instant("--to", to, true));
    }

    /** A title naming the selection. */
    String title() {
        return org.lodestep.report.QaText.selectionTitle(lot, part, from, to);
    }

    private static String instant(String option, String text, boolean endOfDay) {
        if (text == null) {
            return null;
        }
        try {
            return Timestamps.dayBound(text, endOfDay);
        } catch (DateTimeParseException notADate) {
            try {
                return Timestamps.format(Timestamps.parse(text));
            } catch (IllegalArgumentException e) {
                throw new UsageException(option + " '" + text + "': expected a date YYYY-MM-DD or an ISO-8601 instant"
                        + " such as 2026-07-01T08:00:00Z");
            }
        }
    }
}
