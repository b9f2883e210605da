package org.lodestep.workflow;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

import org.lodestep.rig.ResistanceReading;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.rig.RigInfo;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadPair;
import org.lodestep.wiring.ProbeSession;

/**
 * Use case: identify the leads of the motor on a bench rig. The rig measures lead pairs in the order the probe
 * session asks for them, until the answer is certain; the result is the same identification as from a file.
 */
public final class LeadsOnRig {
    private LeadsOnRig() {
    }

    /** Hears what the rig measures, as it measures it. */
    public interface Listener extends Progress {
        /** The rig answered: its identity, the lead labels used and how many pairs there are in all. */
        default void connected(RigInfo info, List<String> leads, int allPairs) {
        }

        /** One pair was read; empty {@code ohms} for open circuit (over range). */
        default void measured(LeadPair pair, OptionalDouble ohms) {
        }
    }

    /**
     * @param rig            what the rig reports about itself
     * @param motorSerial    the motor's serial as the rig knows it, or null
     * @param leads          the labels the identification uses
     * @param identification windings, taps, findings and connections
     * @param readings       pairs measured
     * @param allPairs       every pair the leads make
     */
    public record Result(RigInfo rig, String motorSerial, List<String> leads, Identification identification,
                         int readings, int allPairs) {
        public Result {
            Objects.requireNonNull(rig, "rig");
            leads = List.copyOf(leads);
            Objects.requireNonNull(identification, "identification");
        }
    }

    /** Measures through {@code rig} (already connected; the caller closes it). */
    public static Result run(RigClient rig, LeadsSettings settings, Listener listener) throws RigException {
        RigInfo info = rig.info();
        List<String> leads = labels(info.labels(), info.leads());
        ProbeSession session = new ProbeSession(leads, settings.identifySettings(OptionalDouble.empty()));
        int all = leads.size() * (leads.size() - 1) / 2;
        listener.connected(info, leads, all);
        int taken = 0;
        while (!session.determined()) {
            Optional<LeadPair> next = session.nextPair();
            if (next.isEmpty()) {
                break;
            }
            LeadPair p = next.get();
            listener.step("measuring " + p);
            ResistanceReading r = rig.resistance(leads.indexOf(p.a()) + 1, leads.indexOf(p.b()) + 1);
            OptionalDouble ohms = r.open() ? OptionalDouble.empty() : OptionalDouble.of(r.resistanceOhm());
            session.record(p, ohms);
            taken++;
            listener.measured(p, ohms);
            listener.advanced(taken, all);
        }
        return new Result(info, info.capability("motor_serial", null), leads, session.result(), taken, all);
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
