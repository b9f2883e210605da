package org.lodestep.workflow;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.lodestep.qa.CaptureRef;
import org.lodestep.qa.Hashes;
import org.lodestep.wiring.InsulationReading;
import org.lodestep.wiring.InsulationReading;
import org.lodestep.rig.ResistanceReading;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.wiring.FindingCode;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.IdentifySettings;
import org.lodestep.wiring.LeadPair;
import org.lodestep.wiring.ProbeSession;
import org.lodestep.wiring.Winding;

/**
 * Readings of one motor taken through a bench rig: lead-pair resistances in the order the probe session asks for
 * them until the windings are certain, then one insulation reading from each winding to the frame at the spec's test
 * voltage (1-minute reading, IEEE 43 practice). Every reading goes into a canonical text whose SHA-256 is recorded
 * as the record's rig capture.
 */
final class QaRigReadings {

    /** IEEE 43's 1-minute insulation reading, s. */
    static final double INSULATION_DWELL_S = 60;

    /** What the rig measured. */
    record Readings(List<Double> phaseResistancesOhm, List<InsulationReading> insulation, CaptureRef capture) {
    }

    private QaRigReadings() {
    }

    static Readings measure(RigClient c, String address, double insulationTestVoltageV, Progress progress)
            throws RigException {
        StringBuilder raw = new StringBuilder();
        raw.append("rig ").append(c.info().rig()).append(" id ").append(c.info().id()).append(" fw ")
                .append(c.info().firmware()).append('\n');
        List<String> leads = c.info().leadLabels();
        ProbeSession session = new ProbeSession(leads, IdentifySettings.DEFAULT);
        while (!session.determined()) {
            Optional<LeadPair> next = session.nextPair();
            if (next.isEmpty()) {
                break;
            }
            LeadPair p = next.get();
            progress.step("measuring " + p.a() + "\u2013" + p.b());
            ResistanceReading r = c.resistance(leads.indexOf(p.a()) + 1, leads.indexOf(p.b()) + 1);
            session.record(p, r.open() ? OptionalDouble.empty() : OptionalDouble.of(r.resistanceOhm()));
            raw.append(String.format(Locale.ROOT, "res %s %s %s%n", p.a(), p.b(),
                    r.open() ? "open" : Double.toString(r.resistanceOhm())));
        }
        Identification id = session.result();
        boolean open = id.findings().stream().anyMatch(f -> f.code() == FindingCode.OPEN_WINDING);
        if (!id.determined() && !open) {
            throw new RigException("the rig's readings do not determine the windings of the motor on " + address
                    + "; check the clips and measure again");
        }
        List<Double> phases = id.windings().stream().map(Winding::resistanceOhm).toList();
        List<InsulationReading> ins = new ArrayList<>();
        if (!Double.isNaN(insulationTestVoltageV)) {
            for (Winding w : id.windings()) {
                String lead = w.ends().get(0);
                progress.step("insulation " + lead + " to frame");
                InsulationReading r = c.insulation(leads.indexOf(lead) + 1, (int) Math.round(insulationTestVoltageV),
                        INSULATION_DWELL_S).withLabel(lead + "-frame");
                raw.append(String.format(Locale.ROOT, "ins %s %d %s %s%n", lead, Math.round(r.testVoltageV()),
                        Double.toString(INSULATION_DWELL_S), Double.toString(r.resistanceOhm())));
                ins.add(r);
                progress.note(String.format(Locale.ROOT, "insulation %s to frame at %d V DC: %s", lead,
                        Math.round(r.testVoltageV()), Double.isInfinite(r.resistanceOhm()) ? "above range"
                                : String.format(Locale.ROOT, "%.4g M\u03A9", r.resistanceOhm() / 1e6)));
            }
        }
        String text = raw.toString();
        return new Readings(phases, ins, new CaptureRef("rig " + address, "rig", Hashes.sha256(text)));
    }
}
