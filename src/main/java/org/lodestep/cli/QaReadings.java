package org.lodestep.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.lodestep.workflow.QaCheck;
import org.lodestep.workflow.QaReadingSources;

import picocli.CommandLine.Option;

/**
 * Where one motor's readings come from: capture files (their SHA-256 is recorded) and values typed in from a hand-held
 * meter. Shared by single and lot mode of {@code qa check}.
 */
final class QaReadings {

    private static final Pattern INSULATION = Pattern.compile("([^=]+)=([0-9.eE+]+)(?:@([0-9.eE+]+))?");

    @Option(names = "--resistance", paramLabel = "FILE",
            description = "Lead-pair resistance CSV of the motor (pair list or matrix, as `leads identify` reads it);"
                    + " the windings are identified and their end-to-end resistances become the phase resistances.")
    Path resistanceFile;

    /** {@code p} with the reading files given for one motor (patterns are resolved per serial: the records hash them). */
    org.lodestep.workflow.Provenance provenance(org.lodestep.workflow.Provenance p) {
        if (resistanceFile != null) {
            p = p.withInput("resistance", resistanceFile);
        }
        if (meterLogFile != null) {
            p = p.withInput("meter log", meterLogFile);
        }
        p = p.withInputs("step response", stepResponses);
        return backEmfFile == null ? p : p.withInput("back-EMF", backEmfFile);
    }

    @Option(names = "--resistance-pattern", paramLabel = "PATTERN",
            description = "Lot mode: the resistance CSV of each serial number, {serial} replaced, e.g. "
                    + "'captures/{serial}.csv'.")
    String resistancePattern;

    @Option(names = "--phase-ohm", paramLabel = "OHM", split = ",",
            description = "Phase resistances read on a meter, ohms, phase A first (e.g. 2.03,2.05).")
    List<Double> phaseOhm = new ArrayList<>();

    @Option(names = "--inductance-mh", paramLabel = "MH", split = ",",
            description = "Phase inductances, millihenries, phase A first.")
    List<Double> inductanceMh = new ArrayList<>();

    @Option(names = "--insulation", paramLabel = "LABEL=MOHM[@V]",
            description = "Insulation reading (1-minute value), megohms, at the given DC test voltage (default: the "
                    + "spec's), e.g. A-frame=850@500. Repeat for each pair tested.")
    List<String> insulation = new ArrayList<>();

    @Option(names = "--ke", paramLabel = "V*S/RAD", description = "Back-EMF constant, V·s/rad (peak per phase).")
    Double keVsPerRad;

    @Option(names = "--step-angle-deg", paramLabel = "DEG", description = "Full-step angle, degrees.")
    Double stepAngleDeg;

    @Option(names = "--rig", paramLabel = "ADDR",
            description = "Measure through a bench rig (serial port, tcp:HOST:PORT or sim:SCENARIO): lead-pair "
                    + "resistances until the windings are certain, then each winding to frame at the spec's insulation "
                    + "test voltage (1-minute reading). In lot mode: connect the next motor, then scan its serial number.")
    String rig;

    @Option(names = "--yes-i-have-read-the-caution",
            description = "With --rig and an insulation check: confirm the high-voltage caution (required).")
    boolean cautionConfirmed;

    @Option(names = "--meter-log", paramLabel = "FILE",
            description = "CSV of hand-held meter readings, one row per serial number (columns serial, phase_a_ohm, "
                    + "phase_b_ohm, inductance_a_mh, inductance_b_mh, insulation_<label>_mohm, insulation_test_v, "
                    + "ke_v_s_per_rad, step_angle_deg, winding_c; empty cells = not measured).")
    Path meterLogFile;

    @Option(names = "--step-response", paramLabel = "FILE",
            description = "Current step response of a phase winding or coil (CSV time_s,current_a with '# leads=a,b', "
                    + "'# supply_v=', '# series_ohm=', as `motor identify` reads it); repeat for each. Phase "
                    + "inductance comes from the fits (phased by --back-emf when given, else phase A first).")
    List<Path> stepResponses = new ArrayList<>();

    @Option(names = "--step-response-pattern", paramLabel = "PATTERN",
            description = "Lot mode: the step responses of each serial number, {serial} replaced, * and ? in the file "
                    + "name matched, e.g. 'caps/{serial}-step-*.csv'.")
    String stepResponsePattern;

    @Option(names = "--step-supply-v", paramLabel = "V",
            description = "Voltage of the step responses, volts, for files without '# supply_v='.")
    Double stepSupplyV;

    @Option(names = "--series-ohm", paramLabel = "OHM",
            description = "Resistance in series with the winding during the step responses (sense resistor), ohms, "
                    + "for files without '# series_ohm=' (default 0).")
    Double seriesOhm;

    @Option(names = "--back-emf", paramLabel = "FILE",
            description = "Back-EMF capture with the shaft turned by hand (CSV or WAV, channels emf_<lead>_<lead>_v, "
                    + "volts): gives the back-EMF constant and, from the rotor teeth, the step angle.")
    Path backEmfFile;

    @Option(names = "--back-emf-pattern", paramLabel = "PATTERN",
            description = "Lot mode: the back-EMF capture of each serial number, {serial} replaced, e.g. "
                    + "'caps/{serial}-emf.csv'.")
    String backEmfPattern;

    @Option(names = "--revolutions", paramLabel = "N",
            description = "Mechanical revolutions turned during the back-EMF capture (overrides '# revolutions=').")
    Double revolutions;

    @Option(names = "--winding-c", paramLabel = "CELSIUS",
            description = "Winding temperature during the resistance reading, °C (default: the CSV's temperature_c, "
                    + "else --ambient-c: a motor that has rested at the bench is at ambient).")
    Double windingC;

    /** The sources as the workflow takes them; typed values stay in the meter's units (the workflow converts). */
    QaReadingSources sources() {
        List<QaReadingSources.TypedInsulation> typed = new ArrayList<>();
        for (String spec : insulation) {
            Matcher m = INSULATION.matcher(spec.trim());
            if (!m.matches()) {
                throw new UsageException("--insulation '" + spec + "': expected LABEL=MOHM or LABEL=MOHM@VOLTS, "
                        + "e.g. A-frame=850@500");
            }
            try {
                typed.add(new QaReadingSources.TypedInsulation(m.group(1).trim(), Double.parseDouble(m.group(2)),
                        m.group(3) == null ? Double.NaN : Double.parseDouble(m.group(3))));
            } catch (NumberFormatException e) {
                throw new UsageException("--insulation '" + spec + "': expected LABEL=MOHM or LABEL=MOHM@VOLTS, "
                        + "e.g. A-frame=850@500");
            }
        }
        return new QaReadingSources(resistanceFile, resistancePattern, phaseOhm, inductanceMh, typed, keVsPerRad,
                stepAngleDeg, rig, meterLogFile, stepResponses, stepResponsePattern, stepSupplyV, seriesOhm,
                backEmfFile, backEmfPattern, revolutions, windingC);
    }

    /** The rig's confirmation: the flag, or a usage error naming it (the caution is in the command's help). */
    QaCheck.InsulationConfirmation confirmation() {
        return testVoltageV -> {
            if (!cautionConfirmed) {
                throw new UsageException("--rig runs an insulation test at " + Math.round(testVoltageV)
                        + " V DC: read the caution in `lodestep qa check --help` and add --yes-i-have-read-the-caution");
            }
            return true;
        };
    }
}
