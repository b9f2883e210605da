package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The layering DEVELOPERS.md states, checked on the sources: workflows never print, parse options or render;
 * {@code report.html} uses nothing of ours (so {@code report} and {@code report.html} do not depend on each other
 * both ways).
 */
class WorkflowDependenciesTest {

    private static final Path MAIN = Path.of("src", "main", "java", "org", "lodestep");

    private static List<String> offending(String pkg, List<String> forbidden) throws IOException {
        List<String> out = new ArrayList<>();
        try (Stream<Path> files = Files.list(MAIN.resolve(pkg.replace('.', '/')))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).sorted().toList()) {
                for (String line : Files.readAllLines(f)) {
                    String l = line.strip();
                    for (String bad : forbidden) {
                        if (l.contains(bad)) {
                            out.add(f.getFileName() + ": " + l);
                        }
                    }
                }
            }
        }
        return out;
    }

    @Test
    void workflowsUseNoCommandLineRenderingOrConsole() throws IOException {
        assertEquals(List.of(), offending("workflow", List.of("import picocli", "org.lodestep.cli",
                "org.lodestep.report", "System.out", "System.err", "System.in", "PrintWriter")));
    }

    @Test
    void htmlReportsUseNothingOfOurs() throws IOException {
        assertEquals(List.of(), offending("report.html", List.of("import org.lodestep.", "org.lodestep.report.Qa",
                "org.lodestep.report.OutputFile", "org.lodestep.qa")));
    }

    @Test
    void rigDoesNotDependOnTheInspectionThatJudgesItsReadings() throws IOException {
        assertEquals(List.of(), offending("rig", List.of("org.lodestep.qa", "org.lodestep.workflow")));
    }
}
