package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

import com.fasterxml.jackson.databind.JsonNode;

class DriveHtmlTest {
    /** The demo's salvaged motor on a 24 V chopper, 450 mm/s wanted: short of the 30 % margin asked. */
    private static final List<String> CURVE = List.of("drive", "curve", "--phase-resistance-ohm", "2.43",
            "--phase-inductance-h", "8.2e-3", "--kt-nm-per-a", "0.18", "--rotor-inertia-kgm2", "5.4e-6",
            "--current-a", "1.2", "--microsteps", "16", "--travel-mm-per-rev", "40", "--load-mass-kg", "2.0",
            "--friction-torque-nm", "0.11", "--supply-v", "24", "--target-mm-per-s", "450");

    @Test
    void torqueCurveShowsSpeedInRpmTheMarginAtTheTargetAndWhereTheBindingLimitChanges(@TempDir Path tmp)
            throws Exception {
        Path html = tmp.resolve("curve.html");
        Document d = ReportCli.report(html, 3, with("--report", html.toString()));
        JsonNode json = Json.mapper().readTree(ReportCli.run(with("--json")).out());
        List<String> svgText = ReportCli.texts(d, ReportCli.SVG, "text");
        assertTrue(svgText.containsAll(List.of("step rate (full steps/s)", "shaft speed (rpm)", "torque (N\u00B7m)",
                "load at constant speed", "operating point", "target", "current limit | voltage limit")),
                svgText.toString());
        // the margin drawn at the target is the answer's
        double margin = json.get("answer").get("margin_at_target").asDouble();
        String drawn = "margin at the target: " + DriveText.pct(margin);
        assertTrue(svgText.contains(drawn), drawn + " in " + svgText);
        assertTrue(String.join("|", ReportCli.texts(d, ReportCli.XHTML, "dd")).contains(DriveText.pct(margin)));
    }

    private static String[] with(String... more) {
        List<String> a = new ArrayList<>(CURVE);
        a.addAll(List.of(more));
        return a.toArray(String[]::new);
    }
}
