package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

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
        // One wiring diagram plus one chart per step response.
        assertEquals(1 + steps.size(), ReportCli.count(d, ReportCli.SVG, "svg"));
        List<String> svgText = ReportCli.texts(d, ReportCli.SVG, "text");
        assertTrue(svgText.containsAll(List.of("A+", "A\u2212", "B+", "B\u2212", "Driver")), svgText.toString());
        assertEquals(steps.size(), svgText.stream().filter(t -> t.startsWith("fit: \u03C4 ")).count());
        // The text card and the HTML card agree on the step angle (the sample motor is a 1.8° motor).
        String text = ReportCli.run(args.subList(0, args.size() - 2).toArray(String[]::new)).out();
        assertTrue(text.contains("1.8"), text);
        assertTrue(String.join("|", ReportCli.texts(d, ReportCli.XHTML, "dd")).contains("1.8\u00B0"));
    }
}
