package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.format.DateTimeParseException;

import org.junit.jupiter.api.Test;

/** Day bounds of record queries, against the Gregorian calendar's rules (ISO 8601: a day runs from 00:00 to 24:00). */
class TimestampsTest {

    @Test
    void aDayRunsFromItsMidnightToTheNextOne() {
        assertEquals("2026-07-01T00:00:00.000Z", Timestamps.dayBound("2026-07-01", false));
        assertEquals("2026-07-02T00:00:00.000Z", Timestamps.dayBound("2026-07-01", true));
    }

    @Test
    void theUpperBoundCrossesMonthsYearsAndLeapDays() {
        // 2024 is a leap year (divisible by 4, not a century); 2100 is not (a century not divisible by 400).
        assertEquals("2024-03-01T00:00:00.000Z", Timestamps.dayBound("2024-02-29", true));
        assertEquals("2100-03-01T00:00:00.000Z", Timestamps.dayBound("2100-02-28", true));
        assertEquals("2027-01-01T00:00:00.000Z", Timestamps.dayBound("2026-12-31", true));
    }

    @Test
    void anythingButAPlainDateIsRefused() {
        assertThrows(DateTimeParseException.class, () -> Timestamps.dayBound("2026-02-30", false));
        assertThrows(DateTimeParseException.class, () -> Timestamps.dayBound("2026-07-01T08:00:00Z", false));
        assertThrows(DateTimeParseException.class, () -> Timestamps.dayBound("1.7.2026", true));
    }

    @Test
    void boundsSortAsTextInTimeOrder() {
        // The stores compare these as text: the fixed width keeps text order and time order the same.
        String a = Timestamps.dayBound("2026-09-30", true);
        String b = Timestamps.dayBound("2026-10-01", false);
        assertEquals(a, b);
        assertEquals(-1, Integer.signum(Timestamps.dayBound("2026-09-30", false).compareTo(b)));
    }
}
