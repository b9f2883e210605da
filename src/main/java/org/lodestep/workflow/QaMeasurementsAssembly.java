package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.lodestep.qa.CaptureRef;
import org.lodestep.qa.Hashes;
import org.lodestep.qa.Measurements;
import org.lodestep.qa.MeterLog;
import org.lodestep.wiring.InsulationReading;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.sample.InputFormatException;

/**
 * Assembles one motor's {@link Measurements} from its {@link QaReadingSources}: the rig, the resistance CSV, the
 * motor captures, the meter log and the values typed in, each at most once per quantity, all converted to SI here
 * (the only place that converts a meter's units). The meter log is read once for a whole lot.
 */
final class QaMeasurementsAssembly {

    /** Ω per MΩ: insulation testers and meter logs read megohms. */
    static final double OHM_PER_MEGOHM = 1e6;
    /** H per mH: LCR meters and meter logs read millihenries. */
    static final double HENRY_PER_MILLIHENRY = 1e-3;
    /** Test voltage assumed for a meter-log insulation reading when neither the log nor the spec gives one, V. */
    private static final double DEFAULT_TEST_VOLTAGE_V = 500;

    private final QaReadingSources src;
    private final QaCheck.InsulationConfirmation confirmation;
    private MeterLog meterLog;

    QaMeasurementsAssembly(QaReadingSources sources, QaCheck.InsulationConfirmation confirmation) {
        this.src = sources;
        this.confirmation = confirmation;
    }

    /** Reads what every motor of a run shares (the meter log) now, so an unreadable one stops the run at once. */
    void readSharedInputs() throws IOException, InputFormatException {
        if (src.meterLogFile() != null && meterLog == null) {
            meterLog = MeterLog.read(src.meterLogFile());
        }
    }

    /** The readings of one motor; {@code serial} fills the patterns in lot mode and picks the meter-log row. */
    Measurements measure(String serial, double ambientC, double specTestVoltageV, Progress progress)
            throws IOException, InputFormatException, RigException {
        List<CaptureRef> captures = new ArrayList<>();
        List<Double> phases = new ArrayList<>(src.phaseOhm());
        List<InsulationReading> ins = new ArrayList<>();
        if (src.rigAddress() != null) {
            rig(specTestVoltageV, phases, ins, captures, progress);
        }
        double temperature = src.windingC() != null ? src.windingC() : Double.NaN;
        Path file = src.resistanceFile();
        if (src.resistancePattern() != null && serial != null) {
            file = patternFile("resistance pattern", src.resistancePattern(), serial);
        }
        if (file != null) {
            if (!phases.isEmpty()) {
                throw new SettingsException("give phase resistances either in a resistance file or typed in, not both");
            }
            progress.step("reading " + file);
            QaResistancePhases.Phases p = QaResistancePhases.read(file);
            phases.addAll(p.resistancesOhm());
            if (Double.isNaN(temperature)) {
                temperature = p.temperatureC();
            }
            captures.add(new CaptureRef(file.toString(), "resistance", Hashes.sha256(file)));
        }
        List<Double> inductances = new ArrayList<>(src.inductanceMh().stream().map(v -> v * HENRY_PER_MILLIHENRY)
                .toList());
        double ke = src.keVsPerRad() == null ? Double.NaN : src.keVsPerRad();
        double step = src.stepAngleDeg() == null ? Double.NaN : src.stepAngleDeg();
        List<Path> steps = new ArrayList<>(src.stepResponses());
        if (src.stepResponsePattern() != null && serial != null) {
            steps.addAll(patternFiles("step-response pattern", src.stepResponsePattern(), serial));
        }
        Path emf = src.backEmfFile();
        if (src.backEmfPattern() != null && serial != null) {
            emf = patternFiles("back-EMF pattern", src.backEmfPattern(), serial).get(0);
        }
        if (!steps.isEmpty() || emf != null) {
            progress.step("fitting the motor captures");
            QaMotorCaptures.Result r = QaMotorCaptures.read(steps, src.stepSupplyV(), src.seriesOhm(), emf,
                    src.revolutions(), progress);
            if (!r.inductancesH().isEmpty()) {
                if (!inductances.isEmpty()) {
                    throw new SettingsException("give phase inductances either as step responses or typed in, "
                            + "not both");
                }
                inductances.addAll(r.inductancesH());
            }
            if (!Double.isNaN(r.keVsPerRad())) {
                if (!Double.isNaN(ke)) {
                    throw new SettingsException("give the back-EMF constant either as a capture or typed in, not both");
                }
                ke = r.keVsPerRad();
            }
            if (!Double.isNaN(r.stepAngleDeg()) && Double.isNaN(step)) {
                // a typed step angle (from the nameplate or a count) stands; the capture's fills the gap
                step = r.stepAngleDeg();
            }
            captures.addAll(r.captures());
        }
        if (src.meterLogFile() != null) {
            readSharedInputs();
            MeterLog.Row row = meterLog.row(serial).orElse(null);
            if (row != null) {
                captures.add(new CaptureRef(src.meterLogFile() + " line " + row.line(), "meter_log", row.sha256()));
                fromLog(row, "phase_a_ohm", "phase_b_ohm", 1.0, phases, "phase resistance");
                fromLog(row, "inductance_a_mh", "inductance_b_mh", HENRY_PER_MILLIHENRY, inductances, "inductance");
                double volts = Double.isNaN(row.get("insulation_test_v")) ? specTestVoltageV : row.get("insulation_test_v");
                for (var e : row.insulationMohm().entrySet()) {
                    try {
                        ins.add(new InsulationReading(e.getKey().replace('_', '-'), e.getValue() * OHM_PER_MEGOHM,
                                Double.isNaN(volts) ? DEFAULT_TEST_VOLTAGE_V : volts));
                    } catch (IllegalArgumentException bad) {
                        throw new InputFormatException(src.meterLogFile().toString(), row.line(),
                                "insulation_" + e.getKey() + "_mohm", Double.toString(e.getValue()),
                                "expected 0 or more megohms (and a positive insulation_test_v)");
                    }
                }
                ke = pick(ke, row.get("ke_v_s_per_rad"), "back-EMF constant");
                step = pick(step, row.get("step_angle_deg"), "step angle");
                if (Double.isNaN(temperature) && !Double.isNaN(row.get("winding_c"))) {
                    temperature = row.get("winding_c");
                }
            }
        }
        for (QaReadingSources.TypedInsulation t : src.insulation()) {
            double volts = Double.isNaN(t.testVoltageV()) ? specTestVoltageV : t.testVoltageV();
            if (Double.isNaN(volts)) {
                throw new SettingsException("insulation " + t.label() + ": the spec has no insulation test voltage; "
                        + "give the voltage the reading was taken at");
            }
            ins.add(new InsulationReading(t.label(), t.megohm() * OHM_PER_MEGOHM, volts));
        }
        if (Double.isNaN(temperature)) {
            temperature = ambientC;
        }
        try {
            return new Measurements(phases, temperature, inductances, ins, ke, step, captures);
        } catch (IllegalArgumentException e) {
            throw new SettingsException(e.getMessage());
        }
    }

    private void rig(double specTestVoltageV, List<Double> phases, List<InsulationReading> ins,
                     List<CaptureRef> captures, Progress progress) throws RigException {
        if (!Double.isNaN(specTestVoltageV) && !confirmation.confirmed(specTestVoltageV)) {
            throw new SettingsException("the insulation test at " + Math.round(specTestVoltageV)
                    + " V DC was not confirmed: nothing was energised");
        }
        if (!phases.isEmpty() || src.resistanceFile() != null || src.resistancePattern() != null) {
            throw new SettingsException("the rig measures phase resistance itself: give no typed phase resistances or resistance file");
        }
        RigClient c;
        try {
            c = RigClient.open(src.rigAddress());
        } catch (IllegalArgumentException e) {
            throw new SettingsException(e.getMessage());
        }
        try (c) {
            QaRigReadings.Readings r = QaRigReadings.measure(c, src.rigAddress(), specTestVoltageV, progress);
            phases.addAll(r.phaseResistancesOhm());
            ins.addAll(r.insulation());
            captures.add(r.capture());
        }
    }

    private static void fromLog(MeterLog.Row row, String a, String b, double scale, List<Double> into, String what) {
        double va = row.get(a);
        double vb = row.get(b);
        if (Double.isNaN(va) && Double.isNaN(vb)) {
            return;
        }
        if (!into.isEmpty()) {
            throw new SettingsException(what + " of " + row.serial() + " given twice (meter log line " + row.line()
                    + " and another source)");
        }
        if (Double.isNaN(va) || Double.isNaN(vb)) {
            throw new SettingsException("meter log line " + row.line() + ": " + what + " needs both " + a + " and " + b);
        }
        into.add(va * scale);
        into.add(vb * scale);
    }

    private static double pick(double option, double logged, String what) {
        if (!Double.isNaN(option) && !Double.isNaN(logged)) {
            throw new SettingsException(what + " given both typed in and in the meter log");
        }
        return Double.isNaN(option) ? logged : option;
    }

    /**
     * The capture file of one serial number; refuses serials that would leave the pattern's folder.
     *
     * @param what the pattern's name in messages ("resistance pattern")
     */
    static Path patternFile(String what, String pattern, String serial) {
        if (!pattern.contains("{serial}")) {
            throw new SettingsException(what + " '" + pattern + "' lacks {serial}");
        }
        if (serial.contains("/") || serial.contains("\\") || serial.contains("..")
                || serial.chars().anyMatch(Character::isISOControl)) {
            throw new SettingsException("serial '" + serial.replaceAll("\\p{Cntrl}", "?")
                    + "' cannot be used in a file name (path separators, '..' or control characters)");
        }
        return Path.of(pattern.replace("{serial}", serial));
    }

    /**
     * The files of one serial number: {@code {serial}} replaced, then {@code *} and {@code ?} in the file name matched
     * as a glob, sorted by name (so {@code -step-a} comes before {@code -step-b}). No match is an error.
     */
    static List<Path> patternFiles(String what, String pattern, String serial) throws IOException {
        Path p = patternFile(what, pattern, serial);
        String name = p.getFileName().toString();
        if (!name.contains("*") && !name.contains("?")) {
            return List.of(p);
        }
        if (serial.matches(".*[*?\\[\\]{}\\\\].*")) {
            throw new SettingsException(what + ": serial '" + serial + "' holds glob characters (* ? [ ] { } \\); "
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
            throw new NoSuchFileException(p.toString());
        }
        out.sort(null);
        return out;
    }
}
