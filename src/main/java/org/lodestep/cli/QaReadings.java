package org.lodestep.cli;

import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.lodestep.workflow.Progress;
import org.lodestep.workflow.QaMotorCaptures;
import org.lodestep.sample.InputFormatException;
import org.lodestep.qa.CaptureRef;
import org.lodestep.qa.Hashes;
import org.lodestep.qa.InsulationReading;
import org.lodestep.qa.Measurements;
import org.lodestep.qa.MeterLog;

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

    private MeterLog meterLog;

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

    /** The readings of one motor; {@code serial} fills the pattern in lot mode; {@code log} shows rig progress. */
    Measurements measure(String serial, double ambientC, double specTestVoltageV, java.io.PrintWriter log)
            throws IOException, InputFormatException, org.lodestep.rig.RigException {
        List<CaptureRef> captures = new ArrayList<>();
        List<Double> phases = new ArrayList<>(phaseOhm);
        List<InsulationReading> ins = new ArrayList<>();
        if (rig != null) {
            if (!Double.isNaN(specTestVoltageV) && !cautionConfirmed) {
                throw new UsageException("--rig runs an insulation test at " + Math.round(specTestVoltageV)
                        + " V DC: read the caution in `lodestep qa check --help` and add --yes-i-have-read-the-caution");
            }
            if (!phases.isEmpty() || resistanceFile != null || resistancePattern != null) {
                throw new UsageException("--rig measures phase resistance itself: give no --phase-ohm or resistance file");
            }
            try (org.lodestep.rig.RigClient c = RigCli.connect(rig)) {
                QaRig.Readings r = QaRig.measure(c, rig, specTestVoltageV, log);
                phases.addAll(r.phaseResistancesOhm());
                ins.addAll(r.insulation());
                captures.add(r.capture());
            }
        }
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
        List<Double> inductances = new ArrayList<>(inductanceMh.stream().map(v -> v / 1000.0).toList());
        double ke = keVsPerRad == null ? Double.NaN : keVsPerRad;
        double step = stepAngleDeg == null ? Double.NaN : stepAngleDeg;
        List<Path> steps = new ArrayList<>(stepResponses);
        if (stepResponsePattern != null && serial != null) {
            steps.addAll(patternFiles("--step-response-pattern", stepResponsePattern, serial));
        }
        Path emf = backEmfFile;
        if (backEmfPattern != null && serial != null) {
            emf = patternFiles("--back-emf-pattern", backEmfPattern, serial).get(0);
        }
        if (!steps.isEmpty() || emf != null) {
            QaMotorCaptures.Result r = QaMotorCaptures.read(steps, stepSupplyV, seriesOhm, emf, revolutions,
                    new Progress() {
                        @Override
                        public void note(String message) {
                            log.println("  " + message);
                            log.flush();
                        }
                    });
            if (!r.inductancesH().isEmpty()) {
                if (!inductances.isEmpty()) {
                    throw new UsageException("give phase inductances either as step responses or with "
                            + "--inductance-mh, not both");
                }
                inductances.addAll(r.inductancesH());
            }
            if (!Double.isNaN(r.keVsPerRad())) {
                if (!Double.isNaN(ke)) {
                    throw new UsageException("give the back-EMF constant either as a capture or with --ke, not both");
                }
                ke = r.keVsPerRad();
            }
            if (!Double.isNaN(r.stepAngleDeg()) && Double.isNaN(step)) {
                // a typed step angle (from the nameplate or a count) stands; the capture's fills the gap
                step = r.stepAngleDeg();
            }
            captures.addAll(r.captures());
        }
        if (meterLogFile != null) {
            if (meterLog == null) {
                meterLog = MeterLog.read(meterLogFile);
            }
            MeterLog.Row row = meterLog.row(serial).orElse(null);
            if (row != null) {
                captures.add(new CaptureRef(meterLogFile + " line " + row.line(), "meter_log", row.sha256()));
                fromLog(row, "phase_a_ohm", "phase_b_ohm", 1.0, phases, "phase resistance");
                fromLog(row, "inductance_a_mh", "inductance_b_mh", 1e-3, inductances, "inductance");
                double volts = Double.isNaN(row.get("insulation_test_v")) ? specTestVoltageV : row.get("insulation_test_v");
                for (var e : row.insulationMohm().entrySet()) {
                    ins.add(new InsulationReading(e.getKey().replace('_', '-'), e.getValue() * 1e6,
                            Double.isNaN(volts) ? 500 : volts));
                }
                ke = pick(ke, row.get("ke_v_s_per_rad"), "back-EMF constant");
                step = pick(step, row.get("step_angle_deg"), "step angle");
                if (Double.isNaN(temperature) && !Double.isNaN(row.get("winding_c"))) {
                    temperature = row.get("winding_c");
                }
            }
        }
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
        if (Double.isNaN(temperature)) {
            temperature = ambientC;
        }
        try {
            return new Measurements(phases, temperature, inductances, ins, ke, step, captures);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private static void fromLog(MeterLog.Row row, String a, String b, double scale, List<Double> into, String what) {
        double va = row.get(a);
        double vb = row.get(b);
        if (Double.isNaN(va) && Double.isNaN(vb)) {
            return;
        }
        if (!into.isEmpty()) {
            throw new UsageException(what + " of " + row.serial() + " given twice (meter log line " + row.line()
                    + " and another option)");
        }
        if (Double.isNaN(va) || Double.isNaN(vb)) {
            throw new UsageException("meter log line " + row.line() + ": " + what + " needs both " + a + " and " + b);
        }
        into.add(va * scale);
        into.add(vb * scale);
    }

    private static double pick(double option, double logged, String what) {
        if (!Double.isNaN(option) && !Double.isNaN(logged)) {
            throw new UsageException(what + " given both as an option and in the meter log");
        }
        return Double.isNaN(option) ? logged : option;
    }

    /** The capture file of one serial number; refuses serials that would leave the pattern's folder. */
    static Path patternFile(String pattern, String serial) {
        return patternFile(pattern, serial, "--resistance-pattern");
    }

    /** As {@link #patternFile(String, String)}, naming {@code option} in errors. */
    static Path patternFile(String pattern, String serial, String option) {
        if (!pattern.contains("{serial}")) {
            throw new UsageException(option + " '" + pattern + "' lacks {serial}");
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
                || !insulation.isEmpty() || keVsPerRad != null || stepAngleDeg != null || meterLogFile != null || rig != null
                || !stepResponses.isEmpty() || stepResponsePattern != null || backEmfFile != null
                || backEmfPattern != null;
    }


    /**
     * The files of one serial number: {@code {serial}} replaced, then {@code *} and {@code ?} in the file name matched
     * as a glob, sorted by name (so {@code -step-a} comes before {@code -step-b}). No match is an error.
     */
    static List<Path> patternFiles(String option, String pattern, String serial) throws IOException {
        Path p = patternFile(pattern, serial, option);
        String name = p.getFileName().toString();
        if (!name.contains("*") && !name.contains("?")) {
            return List.of(p);
        }
        if (serial.matches(".*[*?\\[\\]{}\\\\].*")) {
            throw new UsageException(option + ": serial '" + serial + "' holds glob characters (* ? [ ] { } \\); "
                    + "name the file without wildcards");
        }
        Path dir = p.getParent() == null ? Path.of(".") : p.getParent();
        List<Path> out = new ArrayList<>();
        if (Files.isDirectory(dir)) {
            try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, name)) {
                ds.forEach(out::add);
            }
        }
        if (out.isEmpty()) {
            throw new java.nio.file.NoSuchFileException(p.toString());
        }
        out.sort(null);
        return out;
    }
}
