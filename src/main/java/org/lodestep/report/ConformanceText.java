package org.lodestep.report;

import java.util.Locale;

import org.lodestep.rig.RigConformance;

/** The conformance kit's pass/fail table as plain text. Computes nothing. */
public final class ConformanceText {
    private ConformanceText() {
    }

    public static String table(RigConformance.Report r) {
        StringBuilder b = new StringBuilder();
        b.append("rig ").append(r.rig()).append(" at ").append(r.address()).append('\n');
        b.append(String.format(Locale.ROOT, "%-4s  %-7s  %s%n", "", "section", "check"));
        long pass = 0;
        long skip = 0;
        for (RigConformance.Check c : r.checks()) {
            b.append(String.format(Locale.ROOT, "%-4s  %-7s  %s%n", c.verdict(), "§" + c.section(), c.name()));
            if (c.verdict() != RigConformance.Verdict.PASS && !c.detail().isEmpty()) {
                b.append(String.format(Locale.ROOT, "%-4s  %-7s    %s%n", "", "", c.detail()));
            }
            pass += c.verdict() == RigConformance.Verdict.PASS ? 1 : 0;
            skip += c.verdict() == RigConformance.Verdict.SKIP ? 1 : 0;
        }
        b.append(String.format(Locale.ROOT, "%d passed, %d failed, %d skipped of %d checks%n", pass, r.failures(),
                skip, r.checks().size()));
        if (r.failures() > 0) {
            b.append("Each failure names the section of firmware-protocol.md the rig departs from.\n");
        }
        return b.toString();
    }
}
