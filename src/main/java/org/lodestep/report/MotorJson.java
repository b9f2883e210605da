package org.lodestep.report;

import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.lodestep.motor.EmfCoil;
import org.lodestep.motor.HalfWinding;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.PhaseCard;

/**
 * The JSON view of a {@link MotorCard}: {@link Json}'s conventions, except that back-EMF constants are spelled
 * {@code ke_v_s_per_rad} (volt-seconds per radian) where plain snake_case would run the unit letters together.
 */
public final class MotorJson {
    private static final ObjectMapper MAPPER = Json.mapper()
            .addMixIn(HalfWinding.class, KeMixIn.class)
            .addMixIn(PhaseCard.class, KeMixIn.class)
            .addMixIn(MotorCard.class, KeMixIn.class)
            .addMixIn(EmfCoil.class, EmfCoilMixIn.class);

    private MotorJson() {
    }

    /** The card as indented JSON text. */
    public static String write(MotorCard card) {
        try {
            return MAPPER.writeValueAsString(card);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot serialise the motor card: " + e.getMessage(), e);
        }
    }

    private abstract static class KeMixIn {
        @JsonProperty("ke_v_s_per_rad")
        abstract Double keVsPerRad();
    }

    private abstract static class EmfCoilMixIn extends KeMixIn {
        @JsonProperty("ke_v_s_per_electrical_rad")
        abstract double keVsPerElectricalRad();
    }
}
