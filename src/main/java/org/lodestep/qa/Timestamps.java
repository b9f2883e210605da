package org.lodestep.qa;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;

/**
 * Timestamps as fixed-width ISO-8601 UTC text ({@code 2026-03-14T09:26:53.589Z}), so they sort as text the same way
 * in SQLite and PostgreSQL and read the same in JSON.
 */
public final class Timestamps {
    private static final DateTimeFormatter FORMAT =
            DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSS'Z'").withZone(ZoneOffset.UTC);

    private Timestamps() {
    }

    public static String format(Instant t) {
        return FORMAT.format(t);
    }

    public static String now() {
        return format(Instant.now());
    }

    /**
     * A whole UTC day ({@code YYYY-MM-DD}) as the bound a record query compares with: the day's first instant, or for
     * an upper bound the first instant of the next day, so the day itself is included.
     *
     * @throws DateTimeParseException when {@code date} is not a date of that form
     */
    public static String dayBound(String date, boolean upperBound) {
        LocalDate d = LocalDate.parse(date);
        return format((upperBound ? d.plusDays(1) : d).atStartOfDay(ZoneOffset.UTC).toInstant());
    }

    /** Parses any ISO-8601 instant; rejects other text with a message naming it. */
    public static Instant parse(String text) {
        try {
            return Instant.parse(text);
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException("'" + text + "' is not an ISO-8601 UTC time such as 2026-03-14T09:26:53Z");
        }
    }
}
