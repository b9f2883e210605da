package org.lodestep.workflow;

import java.io.IOException;
import java.util.Objects;

import org.lodestep.qa.Inspection;
import org.lodestep.qa.Measurements;
import org.lodestep.qa.PartSpec;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.SpecChangedException;
import org.lodestep.qa.StoreException;
import org.lodestep.qa.Submission;
import org.lodestep.qa.Timestamps;
import org.lodestep.rig.RigException;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.InputLimits;

/**
 * Incoming-QA check of one motor: assemble its readings ({@link QaReadingSources}), judge them against the part
 * spec, record the verdict in the store (append-only) and return the record. A lot is a front-end loop that calls
 * {@link #check} once per scanned serial number on the same instance (the meter log is read once).
 *
 * <p>A rig insulation test applies hundreds of volts: before the rig is armed the workflow asks the front end's
 * {@link InsulationConfirmation}; it never reads a terminal itself.
 */
public final class QaCheck {

    /** Asked before the rig applies the insulation test voltage; true only after the inspector confirmed the caution. */
    @FunctionalInterface
    public interface InsulationConfirmation {
        /** Confirmation that is never given: a front end without a way to ask. */
        InsulationConfirmation REFUSE = testVoltageV -> false;

        boolean confirmed(double testVoltageV);
    }

    /**
     * What is the same for every motor of a run.
     *
     * @param spec         the part spec
     * @param lot          delivery lot, or "" for none
     * @param readings     where each motor's readings come from
     * @param ambientC     ambient temperature at the bench, °C, or NaN
     * @param operator     who tests
     * @param station      test station
     * @param toolVersion  the version recorded with each record
     * @param confirmation the inspector's confirmation of the insulation caution
     */
    public record Settings(PartSpec spec, String lot, QaReadingSources readings, double ambientC, String operator,
                           String station, String toolVersion, InsulationConfirmation confirmation) {
        public Settings {
            Objects.requireNonNull(spec, "spec");
            lot = lot == null ? "" : lot;
            readings = readings == null ? QaReadingSources.none() : readings;
            operator = operator == null ? "" : operator;
            station = station == null ? "" : station;
            toolVersion = toolVersion == null ? "" : toolVersion;
            confirmation = confirmation == null ? InsulationConfirmation.REFUSE : confirmation;
            longest("lot", lot, InputLimits.MAX_SERIAL_CHARS);
            longest("operator", operator, InputLimits.MAX_NAME_CHARS);
            longest("station", station, InputLimits.MAX_NAME_CHARS);
        }

        /** True when the spec includes an insulation test: the front end shows its caution before the run. */
        public boolean insulationTest() {
            return !Double.isNaN(spec.insulationTestVoltageV());
        }
    }

    /** A text longer than its limit is a pasted paragraph or a stuck scanner, never a name: refused, not stored. */
    private static void longest(String what, String text, int maxChars) {
        if (text.length() > maxChars) {
            throw new SettingsException("the " + what + " is " + text.length() + " characters long: expected at most "
                    + maxChars);
        }
    }

    private final Settings settings;
    private final RecordStore store;
    private final QaMeasurementsAssembly assembly;

    /**
     * A check run writing to {@code store} (opened and closed by the caller). The inputs every motor shares (the
     * meter log) are read here, so an unreadable one is refused before the first motor, not reported per motor.
     *
     * @throws InputFormatException the meter log is unreadable
     */
    public QaCheck(Settings settings, RecordStore store) throws IOException, InputFormatException {
        this.settings = Objects.requireNonNull(settings, "settings");
        this.store = Objects.requireNonNull(store, "store");
        this.assembly = new QaMeasurementsAssembly(settings.readings(), settings.confirmation());
        assembly.readSharedInputs();
    }

    /**
     * Measures, judges and records one motor.
     *
     * @return the record and whether it was written now ({@code false}: the same captures were recorded before)
     * @throws InputFormatException a capture, CSV or meter log is unreadable
     * @throws SettingsException    the sources conflict for this motor
     * @throws RigException         the rig failed
     * @throws StoreException       the store failed
     */
    public RecordStore.Appended check(String serial, Progress progress)
            throws IOException, InputFormatException, RigException, StoreException {
        Objects.requireNonNull(serial, "serial");
        if (serial.isEmpty()) {
            throw new SettingsException("the serial number is empty");
        }
        longest("serial number", serial, InputLimits.MAX_SERIAL_CHARS);
        String started = Timestamps.now();
        PartSpec spec = settings.spec();
        Measurements m = assembly.measure(serial, settings.ambientC(), spec.insulationTestVoltageV(), progress);
        progress.step("judging " + serial);
        Inspection.Judgement j = Inspection.judge(spec, m);
        Submission s;
        try {
            s = Submission.of(serial, settings.lot(), spec, j, m, settings.ambientC(), settings.operator(),
                    settings.station(), started, Timestamps.now(), settings.toolVersion());
        } catch (IllegalArgumentException e) {
            throw new SettingsException(e.getMessage());
        }
        progress.step("recording " + serial);
        try {
            return store.append(s);
        } catch (SpecChangedException e) {
            throw e.in(spec.source(), spec.specVersionLine()); // the spec file is at fault: say where
        }
    }
}
