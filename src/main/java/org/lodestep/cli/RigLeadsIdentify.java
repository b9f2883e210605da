package org.lodestep.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.lodestep.report.LeadsJsonView;
import org.lodestep.report.LeadsTextReport;
import org.lodestep.report.RigText;
import org.lodestep.rig.ResistanceReading;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadPair;
import org.lodestep.wiring.ProbeSession;

/**
 * {@code leads identify --rig ADDR}: the rig measures lead pairs in the order the probe session asks for them, until
 * the answer is certain, then the identification is reported as for a file.
 */
final class RigLeadsIdentify {
    private RigLeadsIdentify() {
    }

    /** Runs the session; returns {@link ExitCode#FINDING} when the motor has an error-severity finding. */
    static int run(String address, LeadsIdentifyOptions options, PrintWriter out, PrintWriter log)
            throws RigException {
        try (RigClient c = RigCli.connect(address)) {
            List<String> leads = labels(c.info().labels(), c.info().leads());
            ProbeSession session = new ProbeSession(leads, options.settings(OptionalDouble.empty()));
            int all = leads.size() * (leads.size() - 1) / 2;
            log.printf(Locale.ROOT, "Measuring through %s (%s, id %s): %d leads, up to %d pairs.%n", address,
                    c.info().rig(), c.info().id(), leads.size(), all);
            int taken = 0;
            while (!session.determined()) {
                Optional<LeadPair> next = session.nextPair();
                if (next.isEmpty()) {
                    break;
                }
                LeadPair p = next.get();
                ResistanceReading r = c.resistance(leads.indexOf(p.a()) + 1, leads.indexOf(p.b()) + 1);
                session.record(p, r.open() ? OptionalDouble.empty() : OptionalDouble.of(r.resistanceOhm()));
                taken++;
                log.printf(Locale.ROOT, "  %-8s - %-8s %s%n", p.a(), p.b(), r.open() ? "open" : RigText.ohm(
                        r.resistanceOhm()));
            }
            log.printf(Locale.ROOT, "%d of %d pairs measured.%n", taken, all);
            log.flush();
            Identification id = session.result();
            String motor = c.info().capability("motor_serial", null);
            if (options.json) {
                out.println(LeadsJsonView.write(List.of(LeadsJsonView.of(address, motor, id,
                        new LeadsJsonView.ProbeJson(taken, all)))));
            } else {
                LeadsTextReport.write(out, "Motor on " + address + (motor == null ? "" : " (" + motor + ")"), id);
                out.println();
                out.println(LeadsTextReport.CAUTION);
            }
            out.flush();
            return id.hasError() ? ExitCode.FINDING : ExitCode.OK;
        }
    }

    /** The rig's lead labels when it has distinct ones, else the position numbers. */
    static List<String> labels(List<String> rigLabels, int leads) {
        if (rigLabels.size() == leads && rigLabels.stream().distinct().count() == leads
                && rigLabels.stream().noneMatch(String::isBlank)) {
            return rigLabels;
        }
        List<String> out = new ArrayList<>();
        for (int i = 1; i <= leads; i++) {
            out.add(Integer.toString(i));
        }
        return out;
    }
}
