package org.lodestep.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.workflow.Progress;

import me.tongfei.progressbar.DelegatingProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/** Helpers shared by the rig commands: opening an address, parsing lead pairs, the progress bar. */
final class RigCli {
    static final String ADDRESS_HELP = "Rig address: serial:DEVICE[?baud=N] (default 921600 baud), tcp:HOST:PORT, or "
            + "sim:SCENARIO for the virtual rig (`lodestep rig info sim:` lists scenarios).";

    private RigCli() {
    }

    /** Opens and handshakes; a malformed address is a usage error. */
    static RigClient connect(String address) throws RigException {
        try {
            return RigClient.open(address);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

    /** Parses {@code A-B} lead pairs. */
    static List<int[]> pairs(List<String> texts, String option) {
        List<int[]> out = new ArrayList<>();
        for (String t : texts) {
            String[] ab = t.split("-");
            try {
                if (ab.length == 2) {
                    int a = Integer.parseInt(ab[0].trim());
                    int b = Integer.parseInt(ab[1].trim());
                    if (a >= 1 && b >= 1 && a != b) {
                        out.add(new int[] {a, b});
                        continue;
                    }
                }
            } catch (NumberFormatException e) {
                // reported below
            }
            throw new UsageException(option + " '" + t + "' is not two different lead numbers like 1-2");
        }
        return out;
    }

    /**
     * A progress bar with ETA on the command's error stream when it is a terminal and not {@code quiet}; otherwise
     * a no-op. Close it when the stream ends.
     */
    static final class Bar implements AutoCloseable, RigClient.Progress, Progress {
        private final ProgressBar bar;
        private final PrintWriter err;

        Bar(String task, PrintWriter err, boolean quiet) {
            this.err = err;
            if (quiet || System.console() == null) {
                bar = null;
            } else {
                bar = new ProgressBarBuilder().setTaskName(task).setInitialMax(1).setStyle(ProgressBarStyle.ASCII)
                        .setUnit(" frames", 1).setUpdateIntervalMillis(200)
                        .setConsumer(new DelegatingProgressBarConsumer(s -> {
                            err.print('\r' + s);
                            err.flush();
                        })).build();
            }
        }

        @Override
        public void frames(long received, long total) {
            if (bar != null) {
                bar.maxHint(total);
                bar.stepTo(received);
            }
        }

        @Override
        public void advanced(long done, long total) {
            frames(done, total);
        }

        @Override
        public void close() {
            if (bar != null) {
                bar.close();
                err.println();
                err.flush();
            }
        }
    }
}
