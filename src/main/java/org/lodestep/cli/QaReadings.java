package org.lodestep.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.lodestep.capture.InputFormatException;
import org.lodestep.qa.CaptureRef;
import org.lodestep.qa.Hashes;
import org.lodestep.qa.InsulationReading;
import org.lodestep.qa.Measurements;

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

    @Option(names = "--winding-c", paramLabel = "°C",
            description = "Winding temperature during the resistance reading, °C (default: the CSV's temperature_c, "
                    + "else --ambient-c: a motor that has rested at the bench is at ambient).")
    Double windingC;

    /** The readings of one motor; {@code serial} fills the pattern in lot mode. */
    Measurements measure(String serial, double ambientC, double specTestVoltageV)
            throws IOException, InputFormatException {
        List<CaptureRef> captures = new ArrayList<>();
        List<Double> phases = new ArrayList<>(phaseOhm);
        double temperature = windingC != null ? windingC : Double.NaN;
        Path file = resistanceFile;
        if (resistancePattern != null && serial != null) {
            file = patternFile(resistancePattern, serial);
        }
        if (file != null) {
            if (!phases.isEmpty()) {
                throw new UsageException("give phase resistances either in a file or with --phase-ohm, not both");
            }
            QaResistance.Phases p = QaResistance.read(file);
            phases.addAll(p.resistancesOhm());
            if (Double.isNaN(temperature)) {
                temperature = p.temperatureC();
            }
            captures.add(new CaptureRef(file.toString(), "resistance", Hashes.sha256(file)));
        }
        if (Double.isNaN(temperature)) {
            temperature = ambientC;
        }
        List<Double> inductances = inductanceMh.stream().map(v -> v / 1000.0).toList();
        List<InsulationReading> ins = new ArrayList<>();
        for (String spec : insulation) {
            Matcher m = INSULATION.matcher(spec.trim());
            if (!m.matches()) {
                throw new UsageException("--insulation '" + spec + "': expected LABEL=MOHM or LABEL=MOHM@VOLTS, "
                        + "e.g. A-frame=850@500");
            }
            double volts = m.group(3) == null ? specTestVoltageV : Double.parseDouble(m.group(3));
            if (Double.isNaN(volts)) {
                throw new UsageException("--insulation '" + spec + "': the spec has no insulation test voltage; "
                        + "give it as LABEL=MOHM@VOLTS");
            }
            ins.add(new InsulationReading(m.group(1).trim(), Double.parseDouble(m.group(2)) * 1e6, volts));
        }
        try {
            return new Measurements(phases, temperature, inductances, ins,
                    keVsPerRad == null ? Double.NaN : keVsPerRad,
                    stepAngleDeg == null ? Double.NaN : stepAngleDeg, captures);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

    /** The capture file of one serial number; refuses serials that would leave the pattern's folder. */
    static Path patternFile(String pattern, String serial) {
        if (!pattern.contains("{serial}")) {
            throw new UsageException("--resistance-pattern '" + pattern + "' lacks {serial}");
        }
        if (serial.contains("/") || serial.contains("\\") || serial.contains("..")
                || serial.chars().anyMatch(Character::isISOControl)) {
            throw new UsageException("serial '" + serial.replaceAll("\\p{Cntrl}", "?")
                    + "' cannot be used in a file name (path separators, '..' or control characters)");
        }
        return Path.of(pattern.replace("{serial}", serial));
    }

    /** True when any reading source was given. */
    boolean any() {
        return resistanceFile != null || resistancePattern != null || !phaseOhm.isEmpty() || !inductanceMh.isEmpty()
                || !insulation.isEmpty() || keVsPerRad != null || stepAngleDeg != null;
    }

}
