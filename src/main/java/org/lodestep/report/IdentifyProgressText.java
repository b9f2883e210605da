package org.lodestep.report;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.lodestep.motor.OrientedLeads;
import org.lodestep.motor.WindingInput;
import org.lodestep.rig.RigInfo;
import org.lodestep.wiring.LeadPair;

/** The progress lines of the leads and motor identifications on a rig and of the guided probe, one line each. */
public final class IdentifyProgressText {
    private IdentifyProgressText() {
    }

    /** The rig answered a leads session. */
    public static String leadsConnected(String address, RigInfo info, int leads, int allPairs) {
        return String.format(Locale.ROOT, "Measuring through %s (%s, id %s): %d leads, up to %d pairs.", address,
                info.rig(), info.id(), leads, allPairs);
    }

    /** One pair read by the rig; empty for open. */
    public static String leadsMeasured(LeadPair p, OptionalDouble ohms) {
        return String.format(Locale.ROOT, "  %-8s - %-8s %s", p.a(), p.b(), ohms.isEmpty() ? "open"
                : RigText.ohm(ohms.getAsDouble()));
    }

    /** How many pairs a leads session on a rig took. */
    public static String leadsDone(int readings, int allPairs) {
        return String.format(Locale.ROOT, "%d of %d pairs measured.", readings, allPairs);
    }

    /** How many readings a guided probe took, and whether it stopped before the answer was certain. */
    public static String probeDone(int readings, int allPairs, int leads, boolean stoppedEarly) {
        return String.format(Locale.ROOT, "Took %d readings of %d (N(N-1)/2 for %d leads)%s.", readings, allPairs,
                leads, stoppedEarly ? ", stopped early" : "");
    }

    /** The rig answered a motor identification. */
    public static String motorConnected(RigInfo info, List<String> leads) {
        return String.format(Locale.ROOT, "rig %s (%s), %d leads: %s", info.rig(), info.address(), leads.size(),
                String.join(" ", leads));
    }

    /** Stage 1 of 3. */
    public static String motorResistances(int pairs) {
        return String.format(Locale.ROOT, "[1/3] resistance of %d lead pairs ...", pairs);
    }

    /** What stage 1 found. */
    public static String motorWindings(WindingInput windings) {
        return String.format(Locale.ROOT, "      %s, %d coils", windings.topology().label(), windings.coils().size());
    }

    /** Stage 2 of 3, one coil. */
    public static String motorStep(int k, int n, double volts, OrientedLeads coil) {
        return String.format(Locale.ROOT, "[2/3] step response %d/%d: %.2f V across %s ...", k, n, volts, coil);
    }

    /** Stage 3 of 3: the person at the bench turns the shaft. */
    public static String motorTurnTheShaft(int coils, double seconds) {
        return String.format(Locale.ROOT, "[3/3] back-EMF of %d coils for %.1f s: turn the shaft by hand, one way, a "
                + "whole number of turns ...", coils, seconds);
    }

    /** Every measurement done. */
    public static String motorOutputsOff() {
        return "      done; outputs switched off";
    }
}
