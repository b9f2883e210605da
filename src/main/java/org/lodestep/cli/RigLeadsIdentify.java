package org.lodestep.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.OptionalDouble;

import org.lodestep.report.LeadsJsonView;
import org.lodestep.report.LeadsTextReport;
import org.lodestep.report.ProvenanceBlock;
import org.lodestep.workflow.Provenance;
import org.lodestep.report.IdentifyProgressText;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigInfo;
import org.lodestep.wiring.LeadPair;
import org.lodestep.workflow.LeadsOnRig;
import org.lodestep.workflow.LeadsSettings;

/**
 * {@code leads identify --rig ADDR}: runs {@link LeadsOnRig}, logging each reading as it comes, then reports the
 * identification as for a file.
 */
final class RigLeadsIdentify {
    private RigLeadsIdentify() {
    }

    /** Runs the session; returns {@link ExitCode#FINDING} when the motor has an error-severity finding. */
    static int run(Provenance run, String address, LeadsSettings settings, boolean json, PrintWriter out,
                   PrintWriter log) throws Exception {
        LeadsOnRig.Result r;
        RigInfo[] rig = new RigInfo[1];
        try (RigClient c = RigCli.connect(address)) {
            r = WorkflowCall.run(() -> LeadsOnRig.run(c, settings, new LeadsOnRig.Listener() {
                @Override
                public void connected(RigInfo info, List<String> leads, int allPairs) {
                    rig[0] = info;
                    log.println(IdentifyProgressText.leadsConnected(address, info, leads.size(), allPairs));
                }

                @Override
                public void measured(LeadPair p, OptionalDouble ohms) {
                    log.println(IdentifyProgressText.leadsMeasured(p, ohms));
                }
            }));
        }
        log.println(IdentifyProgressText.leadsDone(r.readings(), r.allPairs()));
        log.flush();
        String motor = r.motorSerial();
        Provenance provenance = rig[0] == null ? run : run.withRig(RunProvenance.rig(rig[0]));
        if (json) {
            out.println(ProvenanceBlock.json(LeadsJsonView.write(List.of(LeadsJsonView.of(address, motor,
                    r.identification(), new LeadsJsonView.ProbeJson(r.readings(), r.allPairs())))), provenance));
        } else {
            LeadsTextReport.write(out, "Motor on " + address + (motor == null ? "" : " (" + motor + ")"),
                    r.identification());
            out.println();
            out.println(LeadsIdentifyOptions.CAUTION);
            out.print(ProvenanceBlock.text(provenance));
        }
        out.flush();
        return ExitCode.ofIdentification(r.identification().hasError(), r.identification().determined());
    }
}
