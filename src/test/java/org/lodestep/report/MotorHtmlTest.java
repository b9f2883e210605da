package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

import com.fasterxml.jackson.databind.JsonNode;

import org.lodestep.motor.BackEmfTrace;
import org.lodestep.motor.NormalisedStep;
import org.lodestep.motor.StepInput;
import org.lodestep.report.html.Chart;
import org.lodestep.workflow.MotorCaptureInputs;
import org.lodestep.workflow.MotorCardSettings;
import org.lodestep.workflow.MotorFromFiles;
import org.lodestep.workflow.Progress;

class MotorHtmlTest {
    private static final Path DIR = Path.of("sample-captures", "motor");

    @Test
    void motorCardShowsTheWiringAndDrawsEachStepFitOverItsData(@TempDir Path tmp) throws Exception {
        List<String> args = new ArrayList<>(List.of("motor", "identify", "--resistance",
                DIR.resolve("resistance.csv").toString()));
        List<Path> steps;
        try (var s = Files.list(DIR)) {
            steps = s.filter(p -> p.getFileName().toString().startsWith("step-")).sorted().toList();
        }
        for (Path p : steps) {
            args.add("--step-response");
            args.add(p.toString());
        }
        args.addAll(List.of("--back-emf", DIR.resolve("back-emf.csv").toString(), "--supply-v", "24",
                "--phase-current-a", "1.2", "--inertia-kgm2", "5.4e-6"));
        Path html = tmp.resolve("motor.html");
        args.addAll(List.of("--report", html.toString()));
        Document d = ReportCli.report(html, 0, args.toArray(String[]::new));
        // One wiring diagram, the back-EMF of both phases, and one overlaid chart of every step response.
        assertEquals(3, ReportCli.count(d, ReportCli.SVG, "svg"));
        List<String> svgText = ReportCli.texts(d, ReportCli.SVG, "text");
        assertTrue(svgText.containsAll(List.of("A+", "A\u2212", "B+", "B\u2212", "Driver")), svgText.toString());
        // every figure's axes titled with their units
        assertTrue(svgText.containsAll(List.of("time from phase A's rising zero crossing (ms)", "back-EMF (V)",
                "time since the step, t/\u03C4 (time constants)", "current rise, i/I\u221E", "residual (of I\u221E)")),
                svgText.toString());
        assertTrue(svgText.stream().anyMatch(t -> t.startsWith("electrical angle (\u00B0 el., at ")), svgText.toString());
        // one legend entry per step response, and one for the curve they share
        for (Path p : steps) {
            String leads = p.getFileName().toString().replaceAll("^step-(\\d)-(\\d).*", "Leads $1\u2013$2");
            assertEquals(1, svgText.stream().filter(t -> t.startsWith(leads)).count(), leads + " in " + svgText);
        }
        assertEquals(1, svgText.stream().filter(t -> t.startsWith("first-order fit, 1 \u2212 e^")).count());
        // the lag the figure states is the card's own back-EMF lag
        JsonNode json = Json.mapper().readTree(ReportCli.run(concat(args.subList(0, args.size() - 2), "--json")).out());
        double lag = json.get("back_emf").get("quadrature_lag_deg").asDouble();
        String captions = String.join("|", ReportCli.texts(d, ReportCli.XHTML, "figcaption"));
        assertTrue(captions.contains(String.format(Locale.ROOT, "Phase B lags phase A by %.1f\u00B0 electrical", lag)),
                lag + " in " + captions);
        // The text card and the HTML card agree on the step angle (the sample motor is a 1.8° motor).
        String text = ReportCli.run(args.subList(0, args.size() - 2).toArray(String[]::new)).out();
        assertTrue(text.contains("1.8"), text);
        assertTrue(String.join("|", ReportCli.texts(d, ReportCli.XHTML, "dd")).contains("1.8\u00B0"));
    }

    @Test
    void backEmfFigureDrawsTheTracesTheWorkflowKeptAndStepFigureTheEngineNormalisation() throws Exception {
        MotorFromFiles.Result r = MotorFromFiles.run(new MotorFromFiles.Settings(null,
                List.of(DIR.resolve("step-1-7.csv")), DIR.resolve("back-emf.csv"), null, null, null, null,
                new MotorCardSettings(null, null, null, null), true), Progress.NONE);
        BackEmfTrace t = r.emf();
        Chart c = MotorFigures.backEmf(t);
        BackEmfTrace.Wave a = t.waves().get(0);
        double[][] drawn = c.series("phase A: coil " + a.coil().first() + " \u2192 " + a.coil().second());
        assertArrayEquals(t.timeMs(), drawn[0], 0);
        assertArrayEquals(a.voltageV(), drawn[1], 0);
        MotorCaptureInputs.StepTrace st = r.traces().get(0);
        StepInput in = r.card().stepResponses().get(0);
        Chart steps = MotorFigures.steps(List.of(in), List.of(new MotorHtml.Trace(st.source(), st.timeS(),
                st.currentA())));
        NormalisedStep ns = NormalisedStep.of(in.fit(), st.timeS(), st.currentA());
        double[][] residual = steps.series(MotorHtml.stepName(in));
        // the first series of that name is the normalised measurement, drawn as the engine normalised it
        assertEquals(ns.measured()[ns.measured().length / 2], valueAt(residual, ns.timeConstants()[ns.measured().length / 2]), 1e-12);
    }

    /** The y drawn at x (the drawn series may be thinned, but keeps the points it draws). */
    private static double valueAt(double[][] xy, double x) {
        for (int i = 0; i < xy[0].length; i++) {
            if (xy[0][i] == x) {
                return xy[1][i];
            }
        }
        return Double.NaN;
    }

    private static String[] concat(List<String> a, String... b) {
        List<String> out = new ArrayList<>(a);
        out.addAll(List.of(b));
        return out.toArray(String[]::new);
    }
}
