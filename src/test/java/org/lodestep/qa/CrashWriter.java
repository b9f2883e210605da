package org.lodestep.qa;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;

/**
 * A station that writes records as fast as it can until it is killed, printing {@code committed ID} after each
 * commit; run in a child JVM by {@link StoreCrashTest}.
 */
public final class CrashWriter {
    private CrashWriter() {
    }

    public static void main(String[] args) throws Exception {
        PrintStream out = new PrintStream(System.out, true, StandardCharsets.UTF_8);
        try (RecordStore store = RecordStores.open(args[0], Map.of())) {
            for (int i = 0; ; i++) {
                // Three captures per record: a torn write would show as fewer capture rows than the body lists.
                List<CaptureRef> captures = List.of(
                        new CaptureRef("r" + i + ".csv", "resistance", Fixtures.sha("r" + i)),
                        new CaptureRef("l" + i + ".csv", "inductance", Fixtures.sha("l" + i)),
                        new CaptureRef("i" + i + ".csv", "insulation", Fixtures.sha("i" + i)));
                Measurements m = new Measurements(List.of(2.0, 2.01), 20.0, List.of(3.2e-3, 3.2e-3), List.of(),
                        Double.NaN, 1.8, captures);
                long id = store.append(Fixtures.submission("CRASH-" + i, "L-crash", m, "2026-07-01T08:00:00.000Z"))
                        .record().id();
                out.println("committed " + id);
            }
        }
    }
}
