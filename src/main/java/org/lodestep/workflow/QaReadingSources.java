package org.lodestep.workflow;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

import org.lodestep.qa.PlausibleReadings;

/**
 * Where one motor's readings come from, as the inspector gives them: capture files and patterns, values typed from a
 * hand-held meter in the meter's units (the workflow converts them to SI, once), a bench rig's address. Every field
 * may be null or empty where that source is not used.
 *
 * @param resistanceFile       lead-pair resistance CSV of the motor (single mode)
 * @param resistancePattern    lot mode: that CSV per serial, {@code {serial}} replaced
 * @param phaseOhm             phase resistances read on a meter, Ω, phase A first
 * @param inductanceMh         phase inductances read on a meter, mH, phase A first
 * @param insulation           insulation readings typed in, in megohms
 * @param keVsPerRad           back-EMF constant typed in, V·s/rad (peak per phase)
 * @param stepAngleDeg         full-step angle typed in, degrees
 * @param rigAddress           bench rig that measures resistance and insulation (serial port, tcp:, sim:)
 * @param meterLogFile         CSV of meter readings, one row per serial number
 * @param stepResponses        current step responses of the motor (single mode)
 * @param stepResponsePattern  lot mode: the step responses per serial, {@code *} and {@code ?} in the file name
 * @param stepSupplyV          step voltage for files without {@code # supply_v=}, V
 * @param seriesOhm            series resistance during the steps for files without {@code # series_ohm=}, Ω
 * @param backEmfFile          back-EMF capture of the motor (single mode)
 * @param backEmfPattern       lot mode: the back-EMF capture per serial
 * @param revolutions          mechanical revolutions of the back-EMF capture, overriding the file's
 * @param windingC             winding temperature during the resistance reading, °C
 */
public record QaReadingSources(Path resistanceFile, String resistancePattern, List<Double> phaseOhm,
                               List<Double> inductanceMh, List<TypedInsulation> insulation, Double keVsPerRad,
                               Double stepAngleDeg, String rigAddress, Path meterLogFile, List<Path> stepResponses,
                               String stepResponsePattern, Double stepSupplyV, Double seriesOhm, Path backEmfFile,
                               String backEmfPattern, Double revolutions, Double windingC) {

    /**
     * One insulation reading as typed from a hand-held tester.
     *
     * @param label        between what: {@code A-frame}, {@code A-B}
     * @param megohm       the 1-minute reading, MΩ, 0 or more, {@code +Infinity} above the tester's range
     * @param testVoltageV the DC test voltage, V, or NaN for the spec's
     */
    public record TypedInsulation(String label, double megohm, double testVoltageV) {
        public TypedInsulation {
            Objects.requireNonNull(label, "label");
            if (Double.isNaN(megohm) || megohm < 0) {
                throw new SettingsException("insulation " + label + ": " + megohm + " Mohm is not a reading (0 or more)");
            }
            if (!Double.isNaN(testVoltageV) && !(testVoltageV > 0 && Double.isFinite(testVoltageV))) {
                throw new SettingsException("insulation " + label + ": test voltage " + testVoltageV
                        + " V must be positive");
            }
        }
    }

    public QaReadingSources {
        phaseOhm = phaseOhm == null ? List.of() : List.copyOf(phaseOhm);
        inductanceMh = inductanceMh == null ? List.of() : List.copyOf(inductanceMh);
        insulation = insulation == null ? List.of() : List.copyOf(insulation);
        stepResponses = stepResponses == null ? List.of() : List.copyOf(stepResponses);
        phaseCount(phaseOhm, "phase resistances", "--phase-ohm 2.03,2.05");
        phaseCount(inductanceMh, "phase inductances", "--inductance-mh 2.82,2.83");
        for (double v : phaseOhm) {
            plausible("phase_a_ohm", v, "phase resistance " + v + " Ω");
        }
        for (double v : inductanceMh) {
            plausible("inductance_a_mh", v, "phase inductance " + v + " mH");
        }
        for (TypedInsulation t : insulation) {
            plausible("insulation_x_mohm", t.megohm(), "insulation " + t.label() + " " + t.megohm() + " MΩ");
            if (!Double.isNaN(t.testVoltageV())) {
                plausible("insulation_test_v", t.testVoltageV(), "insulation test voltage " + t.testVoltageV() + " V");
            }
        }
        if (keVsPerRad != null) {
            plausible("ke_v_s_per_rad", keVsPerRad, "back-EMF constant " + keVsPerRad + " V·s/rad");
        }
        if (stepAngleDeg != null) {
            plausible("step_angle_deg", stepAngleDeg, "step angle " + stepAngleDeg + "°");
        }
        if (windingC != null) {
            plausible("winding_c", windingC, "winding temperature " + windingC + " °C");
        }
        positive(stepSupplyV, "step supply voltage", "V");
        positive(revolutions, "revolutions", "");
        if (seriesOhm != null && !(seriesOhm >= 0 && Double.isFinite(seriesOhm))) {
            throw new SettingsException("series resistance must be 0 Ω or more, got " + seriesOhm + " Ω");
        }
    }

    /** No source at all: the motor is judged incomplete on every check. */
    public static QaReadingSources none() {
        return new QaReadingSources(null, null, null, null, null, null, null, null, null, null, null, null, null, null,
                null, null, null);
    }

    /** True when a source needs a serial number to find its file (lot mode). */
    public boolean hasPatterns() {
        return resistancePattern != null || stepResponsePattern != null || backEmfPattern != null;
    }

    /** True when a source names one motor's file (single mode). */
    public boolean hasSingleFiles() {
        return resistanceFile != null || !stepResponses.isEmpty() || backEmfFile != null;
    }

    /**
     * A two-phase motor has phases A and B: one value, or three, cannot be judged and must not become a recorded FAIL
     * ("phase B not found"), so the input is refused before anything is measured.
     */
    private static void phaseCount(List<Double> values, String what, String example) {
        if (!values.isEmpty() && values.size() != 2) {
            throw new SettingsException(values.size() + " " + (values.size() == 1 ? what.replaceAll("s$", "") : what)
                    + " given: expected two, phase A then phase B"
                    + " (e.g. " + example + ")");
        }
    }

    private static void plausible(String column, double value, String what) {
        String refusal = PlausibleReadings.refusal(column, value);
        if (refusal != null) {
            throw new SettingsException(what + " is not a plausible reading: " + refusal);
        }
    }

    private static void positive(Double v, String what, String unit) {
        if (v != null && !(v > 0 && Double.isFinite(v))) {
            throw new SettingsException(what + " must be a positive number, got " + v + (unit.isEmpty() ? "" : " " + unit));
        }
    }
}
