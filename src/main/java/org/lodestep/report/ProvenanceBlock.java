package org.lodestep.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import org.lodestep.report.html.HtmlReport;
import org.lodestep.workflow.Provenance;

/**
 * Renders a {@link Provenance} the same way in every report: a closing text block, a {@code provenance} object in
 * JSON (first key of the document, or of each element of an array document), and the stamp of an HTML report.
 */
public final class ProvenanceBlock {
    private ProvenanceBlock() {
    }

    /**
     * The mapper, made on first use: a text or HTML report never needs one, and making it (Jackson's classes and
     * their set-up) cost a text report such as {@code leads identify} about 30 ms of its 0.3 s.
     */
    private static final class Mapper {
        static final ObjectMapper MAPPER = Json.mapper();
    }

    /** The one line under a report's title: "Report 3f2a… · 2026-12-02T13:21:40Z · lodestep 0.1.0". */
    public static String summary(Provenance p) {
        return "Report " + p.reportId() + " \u00B7 run " + p.runAtUtc() + " (UTC) \u00B7 " + p.tool();
    }

    /** The text block printed at the end of a text report, ending with a line break. */
    public static String text(Provenance p) {
        StringBuilder sb = new StringBuilder();
        sb.append("Provenance: report ").append(p.reportId()).append(", ").append(p.tool()).append(", run ")
                .append(p.runAtUtc()).append(" (UTC)").append(System.lineSeparator());
        // arguments and paths come from outside: control characters must not reach the terminal
        sb.append("  command  ").append(QaFormat.visible(p.commandText())).append(System.lineSeparator());
        if (p.rig() != null) {
            sb.append("  rig      ").append(QaFormat.visible(p.rig())).append(System.lineSeparator());
        }
        for (Provenance.InputFile f : p.inputs()) {
            sb.append("  ").append(f.sha256() == null ? "(" + f.note() + ")" : "sha256 " + f.sha256()).append("  ")
                    .append(f.role()).append("  ").append(QaFormat.visible(f.path())).append(System.lineSeparator());
        }
        return sb.toString();
    }

    /**
     * {@code json} with a {@code provenance} object added: the first key of an object document; for an array
     * document (several motors) the first key of each object in it.
     */
    public static String json(String json, Provenance p) {
        try {
            JsonNode doc = Mapper.MAPPER.readTree(json);
            JsonNode prov = node(p);
            if (doc instanceof ObjectNode o) {
                return Mapper.MAPPER.writeValueAsString(first(o, prov));
            }
            if (doc instanceof ArrayNode a) {
                ArrayNode out = Mapper.MAPPER.createArrayNode();
                for (JsonNode e : a) {
                    out.add(e instanceof ObjectNode o ? first(o, prov) : e);
                }
                return Mapper.MAPPER.writeValueAsString(out);
            }
            return json;
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("our own JSON did not parse: " + e.getOriginalMessage(), e);
        }
    }

    /** {@code report} stamped with {@code p}: header line, closing section, footer and print margins. */
    public static HtmlReport html(HtmlReport report, Provenance p) {
        Map<String, String> facts = new LinkedHashMap<>();
        facts.put("Report ID", p.reportId());
        facts.put("Tool", p.tool());
        facts.put("Command", p.commandText());
        facts.put("Run (UTC)", p.runAtUtc().toString());
        if (p.rig() != null) {
            facts.put("Rig", p.rig());
        }
        List<String[]> files = new ArrayList<>();
        for (Provenance.InputFile f : p.inputs()) {
            files.add(new String[] {f.role(), f.path(), f.bytes() < 0 ? "\u2014" : Long.toString(f.bytes()),
                f.sha256() == null ? f.note() : f.sha256()});
        }
        return report.stamped(p.reportId(), summary(p), facts, files);
    }

    /** The JSON object: ASCII snake_case keys, the time as ISO-8601 UTC text. */
    private static ObjectNode node(Provenance p) {
        ObjectNode o = Mapper.MAPPER.createObjectNode();
        o.put("report_id", p.reportId());
        o.put("tool", p.tool());
        ArrayNode cmd = o.putArray("command_line");
        p.commandLine().forEach(cmd::add);
        o.put("run_at_utc", p.runAtUtc().toString());
        ArrayNode files = o.putArray("inputs");
        for (Provenance.InputFile f : p.inputs()) {
            ObjectNode n = files.addObject();
            n.put("role", f.role());
            n.put("path", f.path());
            if (f.bytes() < 0) {
                n.putNull("bytes");
            } else {
                n.put("bytes", f.bytes());
            }
            n.put("sha256", f.sha256());
            if (!f.note().isEmpty()) {
                n.put("note", f.note());
            }
        }
        o.put("rig", p.rig());
        return o;
    }

    private static ObjectNode first(ObjectNode o, JsonNode prov) {
        ObjectNode out = Mapper.MAPPER.createObjectNode();
        out.set("provenance", prov);
        o.fields().forEachRemaining(e -> {
            if (!e.getKey().equals("provenance")) {
                out.set(e.getKey(), e.getValue());
            }
        });
        return out;
    }
}
