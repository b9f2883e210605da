package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The JVM options the launcher picks by input size (its dry run, in a copy of it beside a stand-in jar, so no build
 * starts): every set must be one this JVM accepts without a word on standard output, which carries a command's
 * report, and the packages it compiles early must exist. A misspelt option would otherwise stop every command on a
 * file of that size, and a renamed package would quietly lose the setting.
 */
class LauncherOptionsTest {

    @TempDir
    Path dir;

    @Test
    void eachSizeGetsOptionsThisJvmAccepts() throws Exception {
        Path launcher = dir.resolve("lodestep");
        Files.copy(Path.of("lodestep"), launcher, StandardCopyOption.COPY_ATTRIBUTES);
        Files.createDirectories(dir.resolve("target"));
        Files.write(dir.resolve("target/lodestep.jar"), new byte[0]);

        List<String> small = optionsFor(launcher, sized("small.wav", 100_000));
        List<String> mid = optionsFor(launcher, sized("mid.wav", 2L << 20));
        List<String> large = optionsFor(launcher, sized("large.csv", 40L << 20));

        assertTrue(small.contains("-XX:TieredStopAtLevel=1"), small.toString());
        assertFalse(small.stream().anyMatch(o -> o.startsWith("-XX:CompileCommand")), small.toString());
        assertTrue(mid.contains("-XX:TieredStopAtLevel=1"), mid.toString());
        assertTrue(mid.contains("-XX:CompileCommand=quiet"), mid.toString());
        assertFalse(large.contains("-XX:TieredStopAtLevel=1"), large.toString());
        assertFalse(large.stream().anyMatch(o -> o.startsWith("-XX:CompileCommand")), large.toString());

        for (List<String> opts : List.of(small, mid, large)) {
            assertJvmAccepts(opts);
        }
        for (String o : mid) {
            if (o.startsWith("-XX:CompileCommand=CompileThresholdScaling,")) {
                String pattern = o.split(",")[1];   // e.g. org/lodestep/signal/*.*: that folder's classes and below
                String folder = pattern.substring(0, pattern.indexOf('*'));
                assertTrue(LauncherOptionsTest.class.getClassLoader().getResource(folder) != null,
                        "the launcher compiles " + folder + " early, which is no package on the class path");
            }
        }
    }

    private Path sized(String name, long bytes) throws IOException {
        Path f = dir.resolve(name);
        try (RandomAccessFile r = new RandomAccessFile(f.toFile(), "rw")) {
            r.setLength(bytes);
        }
        return f;
    }

    /** The options of the launcher's dry run for {@code resonance sweep FILE}, between "java" and "-cp". */
    private static List<String> optionsFor(Path launcher, Path file) throws Exception {
        ProcessBuilder pb = new ProcessBuilder("bash", launcher.toString(), "resonance", "sweep", file.toString());
        pb.environment().put("LODESTEP_DRY_RUN", "1");
        pb.environment().remove("LODESTEP_JAVA_OPTS");
        pb.redirectErrorStream(true);
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertTrue(p.waitFor(30, TimeUnit.SECONDS), "the launcher's dry run did not finish");
        assertEquals(0, p.exitValue(), out);
        List<String> words = new ArrayList<>();
        for (String w : out.split(" ")) {
            words.add(w.replace("\\", ""));   // printf %q escapes ',' and '*' with a backslash
        }
        assertEquals("java", words.get(0), out);
        return words.subList(1, words.indexOf("-cp"));
    }

    private static void assertJvmAccepts(List<String> opts) throws Exception {
        List<String> cmd = new ArrayList<>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.addAll(opts);
        cmd.add("-version");
        Process p = new ProcessBuilder(cmd).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "java -version did not finish");
        assertEquals(0, p.exitValue(), opts + ": " + err);
        assertEquals("", out, opts + " wrote to standard output");
        assertFalse(err.contains("CompileCommand"), opts + ": " + err);
    }
}
