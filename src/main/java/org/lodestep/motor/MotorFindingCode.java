package org.lodestep.motor;

import org.lodestep.wiring.Finding;

/** The stable codes of motor-identification findings; scripts may match on {@link #code()}. */
public enum MotorFindingCode implements Finding.Code {
    /** A back-EMF channel is across no coil the resistances found. */
    CHANNEL_UNMATCHED("channel_unmatched"),
    /** A coil the resistances found has no back-EMF channel, so its phase is not known. */
    COIL_NOT_PHASED("coil_not_phased"),
    /** A coil of the lead identification has no usable resistance. */
    COIL_RESISTANCE("coil_resistance"),
    /** The connection asked for cannot be made with these coils. */
    CONNECTION_IMPOSSIBLE("connection_impossible"),
    /** The coupling factor from a series response is implausible. */
    COUPLING("coupling"),
    /** The shaft changed direction during the back-EMF capture. */
    DIRECTION_REVERSED("direction_reversed"),
    /** A lone glitch sample of a capture was bridged by the mean of its neighbours. */
    GLITCH_BRIDGED("glitch_bridged"),
    /** The step response rises in a way that suggests eddy currents. */
    EDDY_CURRENT("eddy_current"),
    /** Which limit, inductance or back-EMF, sets the full-current step rate. */
    FULL_CURRENT_LIMIT("full_current_limit"),
    /** The index channel has too few pulses. */
    INDEX_CHANNEL("index_channel"),
    /** A back-EMF channel shows no voltage: an open coil or two leads that are not one coil. */
    NO_EMF("no_emf"),
    /** The electrical cycles per revolution give no rotor tooth count. */
    NO_TEETH("no_teeth"),
    /** The two phases are not 90 degrees apart. */
    NOT_QUADRATURE("not_quadrature"),
    /** Only one phase was recorded. */
    ONE_PHASE("one_phase"),
    /** The coils could not be paired into two phases. */
    PAIRING_FAILED("pairing_failed"),
    /** The back-EMF phases contradict the resistances. */
    PHASE_MISMATCH("phase_mismatch"),
    /** The stated revolutions disagree with the index channel. */
    REVOLUTIONS_DISAGREE("revolutions_disagree"),
    /** The step response shows magnetic saturation. */
    SATURATION("saturation"),
    /** A series step response was taken with the coils opposing. */
    SERIES_OPPOSING("series_opposing"),
    /** The stated series resistance does not fit the step response. */
    SERIES_RESISTANCE("series_resistance"),
    /** The step-response record is too short for the time constant. */
    SHORT_RECORD("short_record"),
    /** The step response and the resistance matrix disagree on a coil. */
    STEP_RESISTANCE("step_resistance"),
    /** A step response is across no coil and no whole phase. */
    STEP_UNMATCHED("step_unmatched"),
    /** The supply voltage cannot drive the phase current. */
    SUPPLY_TOO_LOW("supply_too_low"),
    /** Several tooth counts fit the back-EMF count; the one common count among them was taken. */
    TEETH_COMMON_COUNT("teeth_common_count"),
    /** Several tooth counts fit the back-EMF count and none is preferred: no step angle is given. */
    TEETH_AMBIGUOUS("teeth_ambiguous"),
    /** The electrical cycles per revolution are not close to a whole number. */
    TEETH_NOT_INTEGER("teeth_not_integer"),
    /** Without the revolutions turned the tooth count stays unknown. */
    TEETH_UNKNOWN("teeth_unknown"),
    /** The shaft never turned steadily enough to measure Ke. */
    TOO_SLOW("too_slow"),
    /** The layout was assumed from the back-EMF channels alone. */
    TOPOLOGY_ASSUMED("topology_assumed"),
    /** The rotor tooth count is unusual for a hybrid motor. */
    UNUSUAL_TEETH("unusual_teeth");

    private final String code;

    MotorFindingCode(String code) {
        this.code = code;
    }

    @Override
    public String code() {
        return code;
    }
}
