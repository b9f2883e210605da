package org.lodestep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The dependency rules of DEVELOPERS.md, read from the main sources: which of our packages may use which, where
 * the libraries for a user interface, SQL, the serial port and charts may appear, no package cycle, and one
 * definition per domain type name.
 */
class ArchitectureTest {
    private static final Path MAIN = Path.of("src/main/java");
    private static final String ROOT = "org.lodestep.";
    private static final Pattern PACKAGE = Pattern.compile("^package\\s+([\\w.]+)\\s*;", Pattern.MULTILINE);
    private static final Pattern OUR_REFERENCE = Pattern.compile("\\borg\\.lodestep\\.([a-z][a-z0-9]*(?:\\.[a-z][a-z0-9]*)*)");
    private static final Pattern IMPORT = Pattern.compile("^import\\s+(?:static\\s+)?([\\w.]+)", Pattern.MULTILINE);
    /** A public top-level type: a domain type other packages see (package-private helpers may share a name). */
    private static final Pattern PUBLIC_TYPE = Pattern.compile(
            "^public\\s+(?:abstract\\s+|final\\s+|sealed\\s+|non-sealed\\s+)*(?:class|interface|record|enum|@interface)\\s+(\\w+)",
            Pattern.MULTILINE);

    /** Our packages each package may use (besides itself); a package not listed here fails the test. */
    private static final Map<String, Set<String>> ALLOWED = Map.ofEntries(
            Map.entry("sample", Set.of()),
            Map.entry("signal", Set.of("sample")),
            Map.entry("wiring", Set.of("sample", "signal")),
            Map.entry("motor", Set.of("sample", "signal", "wiring")),
            Map.entry("resonance", Set.of("sample", "signal", "motor")),
            Map.entry("drive", Set.of("sample", "signal", "wiring", "motor", "resonance")),
            Map.entry("qa", Set.of("sample", "signal", "wiring", "motor", "resonance")),
            Map.entry("capture", Set.of("sample", "wiring", "motor", "resonance", "drive")),
            Map.entry("rig", Set.of("sample", "signal", "wiring", "motor", "drive")),
            Map.entry("workflow", Set.of("sample", "signal", "wiring", "motor", "resonance", "drive", "qa",
                    "capture", "rig")),
            Map.entry("safety", Set.of()),
            Map.entry("report.html", Set.of("safety")),
            Map.entry("report", Set.of("sample", "signal", "wiring", "motor", "resonance", "drive", "qa", "rig",
                    "workflow", "report.html", "safety")),
            Map.entry("station", Set.of("sample", "signal", "wiring", "motor", "resonance", "drive", "qa", "capture",
                    "rig", "workflow", "report", "report.html", "safety")),
            Map.entry("cli", Set.of("sample", "signal", "wiring", "motor", "resonance", "drive", "qa", "capture",
                    "rig", "workflow", "report", "report.html", "station", "safety")),
            Map.entry("bench", Set.of("sample", "signal", "capture", "resonance", "rig", "workflow")));

    /** Library packages and the one package of ours that may use each. */
    private static final Map<String, Set<String>> LIBRARY_HOMES = Map.of(
            "picocli", Set.of("cli"),
            "java.sql", Set.of("qa"),
            "org.flywaydb", Set.of("qa"),
            "com.fazecast", Set.of("rig"),
            "org.jfree", Set.of("report.html"),
            "io.javalin", Set.of("station"),
            "me.tongfei", Set.of("cli"));

    private static Map<String, List<Path>> filesByPackage;

    @BeforeAll
    static void readSources() throws IOException {
        filesByPackage = new TreeMap<>();
        try (Stream<Path> files = Files.walk(MAIN)) {
            files.filter(p -> p.toString().endsWith(".java")).forEach(p -> {
                String pkg = packageOf(read(p));
                filesByPackage.computeIfAbsent(pkg, k -> new ArrayList<>()).add(p);
            });
        }
        assertTrue(filesByPackage.size() > 5, "found the main sources under " + MAIN.toAbsolutePath());
    }

    @Test
    void everyPackageUsesOnlyThePackagesItMayUse() {
        List<String> broken = new ArrayList<>();
        for (Map.Entry<String, List<Path>> e : filesByPackage.entrySet()) {
            String pkg = e.getKey();
            Set<String> allowed = ALLOWED.get(pkg);
            if (allowed == null) {
                broken.add(pkg + ": a new package; add its rule to DEVELOPERS.md and to this test");
                continue;
            }
            for (Path file : e.getValue()) {
                for (String used : ourPackagesUsedBy(read(file))) {
                    if (!used.equals(pkg) && !allowed.contains(used)) {
                        broken.add(file.getFileName() + " (" + pkg + ") uses " + used);
                    }
                }
            }
        }
        assertEquals(List.of(), broken, "dependencies that break the rules");
    }

    @Test
    void librariesStayInTheirOnePackage() {
        List<String> broken = new ArrayList<>();
        for (Map.Entry<String, List<Path>> e : filesByPackage.entrySet()) {
            for (Path file : e.getValue()) {
                Matcher m = IMPORT.matcher(read(file));
                while (m.find()) {
                    String imported = m.group(1);
                    LIBRARY_HOMES.forEach((lib, homes) -> {
                        if ((imported.equals(lib) || imported.startsWith(lib + ".")) && !homes.contains(e.getKey())) {
                            broken.add(file.getFileName() + " (" + e.getKey() + ") imports " + imported);
                        }
                    });
                }
            }
        }
        assertEquals(List.of(), broken, "library imports outside their package");
    }

    @Test
    void noPackageCycle() {
        Map<String, Set<String>> graph = new HashMap<>();
        filesByPackage.forEach((pkg, files) -> {
            Set<String> out = graph.computeIfAbsent(pkg, k -> new TreeSet<>());
            for (Path f : files) {
                for (String used : ourPackagesUsedBy(read(f))) {
                    if (!used.equals(pkg) && filesByPackage.containsKey(used)) {
                        out.add(used);
                    }
                }
            }
        });
        List<String> cycles = new ArrayList<>();
        for (String start : graph.keySet()) {
            if (reaches(graph, start, start, new HashSet<>())) {
                cycles.add(start);
            }
        }
        assertEquals(List.of(), cycles, "packages that depend on themselves through others");
    }

    @Test
    void eachPublicTypeNameIsDefinedOnce() {
        Map<String, Set<String>> packagesByName = new TreeMap<>();
        filesByPackage.forEach((pkg, files) -> {
            for (Path f : files) {
                Matcher m = PUBLIC_TYPE.matcher(stripComments(read(f)));
                while (m.find()) {
                    packagesByName.computeIfAbsent(m.group(1), k -> new TreeSet<>()).add(pkg);
                }
            }
        });
        Map<String, Set<String>> twice = new TreeMap<>();
        packagesByName.forEach((name, pkgs) -> {
            if (pkgs.size() > 1) {
                twice.put(name, pkgs);
            }
        });
        assertEquals(Map.of(), twice, "public type names defined in more than one package");
    }

    @Test
    void workflowsNeitherPrintNorParseOptionsNorRender() {
        List<String> broken = new ArrayList<>();
        for (Path file : filesByPackage.getOrDefault("workflow", List.of())) {
            String code = stripComments(read(file));
            for (String bad : List.of("System.out", "System.err", "System.in", "PrintWriter", "PrintStream")) {
                if (code.contains(bad)) {
                    broken.add(file.getFileName() + " uses " + bad);
                }
            }
        }
        assertEquals(List.of(), broken, "workflows report through Progress and return results; front ends print");
    }

    private static boolean reaches(Map<String, Set<String>> graph, String from, String target, Set<String> seen) {
        for (String next : graph.getOrDefault(from, Set.of())) {
            if (next.equals(target)) {
                return true;
            }
            if (seen.add(next) && reaches(graph, next, target, seen)) {
                return true;
            }
        }
        return false;
    }

    /** Our packages named in code (imports and qualified names), comments and strings left out. */
    private static Set<String> ourPackagesUsedBy(String source) {
        String code = stripComments(source).replaceFirst("(?m)^package\\s+[\\w.]+\\s*;", "");
        Set<String> used = new TreeSet<>();
        Matcher m = OUR_REFERENCE.matcher(code);
        while (m.find()) {
            used.add(ourPackage(m.group(1)));
        }
        return used;
    }

    /** {@code report.html.Chart} is {@code report.html}; {@code motor.MotorCard} is {@code motor}. */
    private static String ourPackage(String qualified) {
        String[] parts = qualified.split("\\.");
        if (parts.length >= 2 && parts[0].equals("report") && parts[1].equals("html")) {
            return "report.html";
        }
        return parts[0];
    }

    private static String packageOf(String source) {
        Matcher m = PACKAGE.matcher(source);
        if (!m.find() || !m.group(1).startsWith(ROOT)) {
            throw new AssertionError("a source outside " + ROOT + ": " + source.lines().findFirst().orElse(""));
        }
        return ourPackage(m.group(1).substring(ROOT.length()));
    }

    private static String stripComments(String s) {
        return s.replaceAll("(?s)/\\*.*?\\*/", " ").replaceAll("//[^\\n]*", " ")
                .replaceAll("\"(?:\\\\.|[^\"\\\\\\n])*\"", "\"\"");
    }

    private static String read(Path p) {
        try {
            return Files.readString(p, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
