package org.lodestep.report;

import java.io.IOException;
import java.util.List;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;

import org.lodestep.motor.EmfCoil;
import org.lodestep.motor.HalfWinding;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.PhaseCard;
import org.lodestep.wiring.Finding;

/**
 * The JSON view of a {@link MotorCard}: {@link Json}'s conventions, except that back-EMF constants are spelled
 * {@code ke_v_s_per_rad} (volt-seconds per radian) where plain snake_case would run the unit letters together.
 */
public final class MotorJson {
    private static final ObjectMapper MAPPER = Json.mapper()
            .addMixIn(HalfWinding.class, KeMixIn.class)
            .addMixIn(PhaseCard.class, KeMixIn.class)
            .addMixIn(MotorCard.class, KeMixIn.class)
            .addMixIn(EmfCoil.class, EmfCoilMixIn.class)
            .addMixIn(Finding.class, FindingMixIn.class)
            .registerModule(new SimpleModule().addSerializer(Finding.Code.class, new CodeSerializer()));

    private MotorJson() {
    }

    /** The card as indented JSON text. */
    public static String write(MotorCard card) {
        return write(card, MotorPhrasing.PLAIN);
    }

    /** The card as indented JSON text, unknowns and finding messages phrased by {@code phrasing}. */
    public static String write(MotorCard card, MotorPhrasing phrasing) {
        try {
            ObjectNode tree = MAPPER.valueToTree(card);
            ArrayNode unknowns = tree.putArray("unknowns");
            card.unknowns().forEach(u -> unknowns.add(phrasing.unknown(u, card.connection())));
            phrase(tree.withArray("findings"), card.findings(), phrasing);
            if (card.backEmf() != null) {
                phrase((ArrayNode) tree.get("back_emf").get("findings"), card.backEmf().findings(), phrasing);
            }
            for (int k = 0; k < card.stepResponses().size(); k++) {
                phrase((ArrayNode) tree.get("step_responses").get(k).get("fit").get("findings"),
                        card.stepResponses().get(k).fit().findings(), phrasing);
            }
            return MAPPER.writeValueAsString(tree);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot serialise the motor card: " + e.getMessage(), e);
        }
    }

    /** Motor findings keep their documented shape: severity, code, message (their leads are in the message). */
    @JsonPropertyOrder({"severity", "code", "message"})
    @JsonIgnoreProperties("leads")
    private abstract static class FindingMixIn {
    }

    /** A finding code is written as its stable text ({@code saturation}, {@code open-winding}). */
    private static final class CodeSerializer extends StdSerializer<Finding.Code> {
        private static final long serialVersionUID = 1L;

        CodeSerializer() {
            super(Finding.Code.class);
        }

        @Override
        public void serialize(Finding.Code c, JsonGenerator g, SerializerProvider p) throws IOException {
            g.writeString(c.code());
        }
    }

    private static void phrase(ArrayNode json, List<Finding> findings, MotorPhrasing phrasing) {
        for (int k = 0; k < findings.size(); k++) {
            ((ObjectNode) json.get(k)).put("message", phrasing.finding(findings.get(k)));
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
