package org.lodestep.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** Test helper: one in-process command line with captured output. */
record CliRun(int code, String out, String err) {
    static CliRun of(String... args) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = Main.run(new PrintWriter(o, true), new PrintWriter(e, true), args);
        return new CliRun(code, o.toString(), e.toString());
    }
}
