package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.BiFunction;
import java.util.stream.Stream;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * A malformed-input corpus generated here from the sample captures (seeded, so every run is the same corpus; no file
 * is committed): truncations, bad cells, NUL and non-UTF-8 bytes, extra fields, mixed delimiters, huge lines, lying
 * headers, empty and blank files, for every reader the command line uses. Each case runs the real command line
 * in-process and must end in exit 2 with exactly one line on stderr naming the file, no stack trace, no output file
 * left behind, and within a generous hang guard (not a performance assertion).
 */
class MalformedInputCorpusTest {

    private static final Path SAMPLES = Path.of("sample-captures");
    private static final Duration HANG_GUARD = Duration.ofSeconds(10);
    private static Path dir;
    private static final Map<String, Integer> OUTCOMES = new TreeMap<>();

    /** One generated input: the file's bytes and the command line that reads it. */
    record Case(String name, String fileName, byte[] content, BiFunction<Path, Path, List<String>> args) {
    }

    @BeforeAll
    static void folder() throws IOException {
        dir = Files.createTempDirectory("lodestep-corpus");
    }

    @AfterAll
    static void summary() throws IOException {
        System.out.println("malformed-input corpus outcomes: " + OUTCOMES);
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    @Test
    void theCorpusHasAtLeastThreeHundredCases() throws IOException {
        assertTrue(corpus().size() >= 300, "cases: " + corpus().size());
    }

    @Test
    void everyBaseFileIsReadCleanlyBeforeItIsDamaged() throws IOException {
        // the mutations, not the base files, must be what is refused
        for (Family f : families()) {
            Path file = dir.resolve("base-" + f.fileName);
            Files.write(file, f.base);
            Path out = dir.resolve("base-" + f.fileName + ".html");
            CliRun r = CliRun.of(f.args.apply(file, out).toArray(String[]::new));
            assertTrue(r.code() == 0 || r.code() == 3, f.fileName + ": " + r.code() + " " + r.err());
        }
    }

    @TestFactory
    Stream<DynamicTest> everyMalformedInputIsRefusedInOneLineNamingTheFile() throws IOException {
        List<Case> cases = corpus();
        return java.util.stream.IntStream.range(0, cases.size()).mapToObj(i -> DynamicTest.dynamicTest(
                i + " " + cases.get(i).name, () -> check(i, cases.get(i))));
    }

    private static void check(int index, Case c) throws IOException {
        Path caseDir = Files.createDirectories(dir.resolve("case-" + index));
        Path file = caseDir.resolve(c.fileName);
        Files.write(file, c.content);
        Path out = caseDir.resolve("out.html");
        List<String> args = c.args.apply(file, out);
        CliRun r = assertTimeoutPreemptively(HANG_GUARD, () -> CliRun.of(args.toArray(String[]::new)), c.name);
        synchronized (OUTCOMES) {
            OUTCOMES.merge("exit " + r.code(), 1, Integer::sum);
        }
        String err = r.err().strip();
        assertEquals(2, r.code(), c.name + ": " + r.err());
        assertEquals(1, err.lines().count(), c.name + ": " + r.err());
        assertTrue(err.contains(file.toString()), c.name + ": the message names the file: " + err);
        assertFalse(err.contains("Exception") || err.contains("\tat ") || err.contains("internal error"),
                c.name + ": " + err);
        assertFalse(Files.exists(out), c.name + ": no output written");
        try (Stream<Path> s = Files.list(caseDir)) {
            assertEquals(List.of(file), s.filter(p -> p.getFileName().toString().endsWith(".tmp")
                    || p.equals(file) || p.equals(out)).toList(), c.name + ": no temporary file left");
        }
    }

    // ---- the corpus ----

    /** A reader's base file, its command line, its delimiter and the cells that reader must refuse. */
    record Family(String tag, String fileName, byte[] base, BiFunction<Path, Path, List<String>> args,
                  String delimiter, List<String> badCells, int firstValueColumn, int lastDataLine, long seed,
                  int randomCases) {
    }

    private static byte[] sample(String name) {
        try {
            return Files.readAllBytes(SAMPLES.resolve(name));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Path qaSpec() {
        return SAMPLES.resolve("qa/kv-4218-m.toml");
    }

    private static List<String> qaSingle(Path spec, Path out) {
        return List.of("qa", "check", "--spec", spec.toString(), "--serial", "KV24-00117", "--phase-ohm", "1.9,1.9",
                "--ambient-c", "20", "--db", out.resolveSibling("qa.sqlite").toString(), "--report", out.toString());
    }

    private static List<String> qaLot(Path meterLog, Path serials, Path out) {
        return List.of("qa", "check", "--spec", qaSpec().toString(), "--lot", "L-2607", "--serials",
                serials.toString(), "--meter-log", meterLog.toString(), "--ambient-c", "20", "--db",
                out.resolveSibling("qa.sqlite").toString(), "--report", out.toString());
    }

    private static final List<String> NUMBER_CELLS = List.of("NaN", "Infinity", "-Infinity", "1e308", "-1e308",
            "1e400", "abc", "0x1F", "", "1.2.3", "--5", "\"unterminated", "1e16", "5 V");

    static List<Family> families() {
        List<Family> f = new ArrayList<>();
        f.add(new Family("sweep-csv", "sweep.csv", sample("resonance/belt-axis-sweep.csv"),
                (file, out) -> List.of("resonance", "sweep", file.toString(), "--report", out.toString()), ",",
                NUMBER_CELLS, 1, 3000, 101, 40));
        f.add(new Family("ringdown-csv", "ringdown.csv", sample("resonance/belt-axis-ringdown.csv"),
                (file, out) -> List.of("resonance", "ringdown", file.toString(), "--report", out.toString()), ",",
                NUMBER_CELLS, 1, 3000, 202, 40));
        f.add(new Family("step-csv", "step.csv", sample("motor/step-1-7.csv"),
                (file, out) -> List.of("motor", "identify", "--step-response", file.toString(), "--report",
                        out.toString()), ",", NUMBER_CELLS, 1, 600, 303, 40));
        f.add(new Family("back-emf-csv", "emf.csv", sample("motor/back-emf.csv"),
                (file, out) -> List.of("motor", "identify", "--back-emf", file.toString(), "--report", out.toString()),
                ",", NUMBER_CELLS, 0, 4000, 404, 40));
        f.add(new Family("leads-csv", "leads.csv", sample("leads/kl-01-shaker-4lead.csv"),
                (file, out) -> List.of("leads", "identify", file.toString(), "--report", out.toString()), ",",
                List.of("abc", "1e308", "-5", "NaN", "1.2.3", "0x1F", "1e-9", "2 3", "\"unterminated"), 2, 100, 505,
                30));
        f.add(new Family("meter-log", "meter-log.csv", sample("qa/lot-L2607-meter-log.csv"),
                (file, out) -> qaLot(file, SAMPLES.resolve("qa/lot-L2607-serials.txt"), out), ",",
                List.of("abc", "1e308", "-5", "NaN", "Infinity", "1.2.3", "\"unterminated", "1e400"), 1, 100, 606,
                30));
        return f;
    }

    static List<Case> corpus() throws IOException {
        List<Case> cases = new ArrayList<>();
        for (Family f : families()) {
            cases.addAll(textCases(f));
        }
        cases.addAll(sampleRateLies());
        cases.addAll(wavCases());
        cases.addAll(specCases());
        cases.addAll(serialsCases());
        return cases;
    }

    /** Seeded damage to a text capture, each kind certain to make it unreadable, plus the whole-file cases. */
    private static List<Case> textCases(Family f) {
        List<Case> cases = new ArrayList<>();
        String text = new String(f.base, StandardCharsets.UTF_8);
        List<String> lines = new ArrayList<>(text.lines().toList());
        int header = 0;
        while (lines.get(header).startsWith("#") || lines.get(header).isBlank()) {
            header++;
        }
        int first = header + 1;
        int last = Math.min(lines.size() - 1, header + f.lastDataLine);
        java.util.Random rnd = new java.util.Random(f.seed);
        String[] kinds = {"cut", "cell", "nul", "utf8", "extra", "mixed", "huge"};
        for (int i = 0; i < f.randomCases; i++) {
            String kind = kinds[i % kinds.length];
            int row = first + rnd.nextInt(last - first + 1);
            List<String> l = new ArrayList<>(lines);
            byte[] bytes;
            String line = l.get(row);
            switch (kind) {
                case "cut" -> {
                    int d = line.indexOf(f.delimiter);
                    List<String> kept = new ArrayList<>(l.subList(0, row));
                    kept.add(line.substring(0, d + 1));
                    bytes = String.join("\n", kept).getBytes(StandardCharsets.UTF_8);
                }
                case "cell" -> {
                    String[] cells = line.split(f.delimiter, -1);
                    int col = f.firstValueColumn + rnd.nextInt(cells.length - f.firstValueColumn);
                    cells[col] = f.badCells.get(rnd.nextInt(f.badCells.size()));
                    l.set(row, String.join(f.delimiter, cells));
                    bytes = join(l);
                }
                case "nul" -> {
                    l.set(row, line.substring(0, 1) + "\0" + line.substring(1));
                    bytes = join(l);
                }
                case "utf8" -> {
                    byte[] before = join(l.subList(0, row));
                    byte[] bad = (line.substring(0, 1)).getBytes(StandardCharsets.UTF_8);
                    byte[] after = join(l.subList(row, l.size()));
                    bytes = concat(before, "\n".getBytes(StandardCharsets.UTF_8), bad,
                            new byte[] {(byte) 0xC3, (byte) 0x28, (byte) 0xFF}, after);
                }
                case "extra" -> {
                    l.set(row, line + f.delimiter + "1" + f.delimiter + "2");
                    bytes = join(l);
                }
                case "mixed" -> {
                    l.set(row, line.replace(f.delimiter, "|"));
                    bytes = join(l);
                }
                default -> {
                    l.set(row, "9".repeat(1 << 20));
                    bytes = join(l);
                }
            }
            cases.add(new Case(f.tag + " " + kind + " line " + (row + 1) + " #" + i, f.fileName, bytes, f.args));
        }
        String headerLine = lines.get(header);
        List<String> comments = lines.subList(0, header);
        cases.add(new Case(f.tag + " empty", f.fileName, new byte[0], f.args));
        cases.add(new Case(f.tag + " blank", f.fileName, " \n\n  \n".getBytes(StandardCharsets.UTF_8), f.args));
        cases.add(new Case(f.tag + " byte-order mark only", f.fileName, new byte[] {(byte) 0xEF, (byte) 0xBB,
            (byte) 0xBF}, f.args));
        cases.add(new Case(f.tag + " comments only", f.fileName, join(List.of("# nothing but a note", "# another")),
                f.args));
        List<String> headerOnly = new ArrayList<>(comments);
        headerOnly.add(headerLine);
        cases.add(new Case(f.tag + " header only", f.fileName, join(headerOnly), f.args));
        String[] names = headerLine.split(f.delimiter, -1);
        if (names.length >= 2) {
            List<String> dup = new ArrayList<>(lines);
            names[names.length - 1] = names[0];
            dup.set(header, String.join(f.delimiter, names));
            cases.add(new Case(f.tag + " duplicated column", f.fileName, join(dup), f.args));
        }
        cases.add(new Case(f.tag + " binary noise", f.fileName, noise(new java.util.Random(f.seed + 1), 4096),
                f.args));
        return cases;
    }

    /** Sample-rate headers that lie: absurd, zero, negative, not a number. */
    private static List<Case> sampleRateLies() {
        List<Case> cases = new ArrayList<>();
        String sweep = new String(sample("resonance/belt-axis-sweep.csv"), StandardCharsets.UTF_8);
        String emf = new String(sample("motor/back-emf.csv"), StandardCharsets.UTF_8);
        List<String> lies = List.of("1e308", "0", "-3000", "NaN", "Infinity", "1e-300", "4294967295", "3e7",
                "3000 Hz", "");
        for (String lie : lies) {
            cases.add(new Case("sweep-csv sample_rate_hz=" + lie, "sweep.csv",
                    sweep.replace("# sample_rate_hz=3000", "# sample_rate_hz=" + lie).getBytes(StandardCharsets.UTF_8),
                    (file, out) -> List.of("resonance", "sweep", file.toString(), "--report", out.toString())));
            cases.add(new Case("back-emf-csv sample_rate_hz=" + lie, "emf.csv",
                    emf.replace("# sample_rate_hz=2000", "# sample_rate_hz=" + lie).getBytes(StandardCharsets.UTF_8),
                    (file, out) -> List.of("motor", "identify", "--back-emf", file.toString(), "--report",
                            out.toString())));
        }
        String step = new String(sample("motor/step-1-7.csv"), StandardCharsets.UTF_8);
        for (String lie : List.of("1e308", "0", "-2.4", "NaN", "abc", "1e6")) {
            cases.add(new Case("step-csv supply_v=" + lie, "step.csv",
                    step.replace("# supply_v=2.40", "# supply_v=" + lie).getBytes(StandardCharsets.UTF_8),
                    (file, out) -> List.of("motor", "identify", "--step-response", file.toString(), "--report",
                            out.toString())));
        }
        // time stamps 1e-300 s apart: a sample rate of 1e300 Hz implied by the clock itself
        StringBuilder tiny = new StringBuilder("time_s,accel_g\n");
        for (int i = 0; i < 100; i++) {
            tiny.append(i).append("e-300,0.").append(i % 7).append('\n');
        }
        cases.add(new Case("sweep-csv clock of 1e300 Hz", "sweep.csv", tiny.toString().getBytes(StandardCharsets.UTF_8),
                (file, out) -> List.of("resonance", "sweep", file.toString(), "--sweep", "linear", "--start", "30",
                        "--end", "400", "--report", out.toString())));
        StringBuilder wide = new StringBuilder("# sample_rate_hz=1000\n");
        for (int c = 0; c < 100; c++) {
            wide.append(c == 0 ? "" : ",").append("ch").append(c).append("_g");
        }
        wide.append('\n');
        for (int r = 0; r < 10; r++) {
            for (int c = 0; c < 100; c++) {
                wide.append(c == 0 ? "" : ",").append("0.1");
            }
            wide.append('\n');
        }
        cases.add(new Case("sweep-csv 100 channels", "sweep.csv", wide.toString().getBytes(StandardCharsets.UTF_8),
                (file, out) -> List.of("resonance", "sweep", file.toString(), "--sweep", "linear", "--start", "30",
                        "--end", "400", "--report", out.toString())));
        return cases;
    }

    /** WAV headers that lie, truncations inside the header and the data, and broken chunk layouts. */
    private static List<Case> wavCases() {
        List<Case> cases = new ArrayList<>();
        byte[] wav = sample("resonance/belt-axis-phone.wav");
        BiFunction<Path, Path, List<String>> args = (file, out) -> List.of("resonance", "sweep", file.toString(),
                "--sweep", "log", "--start", "40", "--end", "600", "--duration", "24", "--report", out.toString());
        int fmt = indexOf(wav, "fmt ");
        int data = indexOf(wav, "data");
        int body = fmt + 8;
        // field offsets inside the fmt chunk body: format 0, channels 2, rate 4, byte rate 8, block align 12, bits 14
        Object[][] lies = {
            {"channels 0", 2, 2, 0L}, {"channels 65535", 2, 2, 65535L}, {"channels 65", 2, 2, 65L},
            {"rate 0", 4, 4, 0L}, {"rate 4294967295", 4, 4, 4294967295L}, {"rate 20000001", 4, 4, 20_000_001L},
            {"bits 0", 14, 2, 0L}, {"bits 7", 14, 2, 7L}, {"bits 12", 14, 2, 12L}, {"bits 48", 14, 2, 48L},
            {"bits 65535", 14, 2, 65535L}, {"format 2", 0, 2, 2L}, {"format 0", 0, 2, 0L},
            {"format 65535", 0, 2, 65535L}, {"block align 0", 12, 2, 0L}, {"block align 7", 12, 2, 7L},
            {"block align 65535", 12, 2, 65535L},
        };
        for (Object[] lie : lies) {
            byte[] b = wav.clone();
            put(b, body + (int) lie[1], (int) lie[2], (long) lie[3]);
            cases.add(new Case("wav " + lie[0], "sweep.wav", b, args));
        }
        Object[][] sizes = {
            {"fmt size 0", fmt + 4, 0L}, {"fmt size 15", fmt + 4, 15L}, {"fmt size 4294967294", fmt + 4, 4294967294L},
            {"data size beyond the file", data + 4, (long) wav.length * 2}, {"data size odd", data + 4, 12345L},
        };
        for (Object[] s : sizes) {
            byte[] b = wav.clone();
            put(b, (int) s[1], 4, (long) s[2]);
            cases.add(new Case("wav " + s[0], "sweep.wav", b, args));
        }
        java.util.Random rnd = new java.util.Random(707);
        for (int i = 0; i < 12; i++) {
            int cut = 1 + rnd.nextInt(data + 7);
            cases.add(new Case("wav cut in the header at byte " + cut, "sweep.wav", java.util.Arrays.copyOf(wav, cut),
                    args));
        }
        for (int i = 0; i < 8; i++) {
            int cut = data + 8 + 1 + rnd.nextInt(wav.length - data - 10);
            cases.add(new Case("wav cut in the data at byte " + cut, "sweep.wav", java.util.Arrays.copyOf(wav, cut),
                    args));
        }
        byte[] magic = wav.clone();
        magic[0] = 'X';
        cases.add(new Case("wav magic RIFX", "sweep.wav", magic, args));
        byte[] wave = wav.clone();
        wave[8] = 'A';
        cases.add(new Case("wav form AAVE", "sweep.wav", wave, args));
        byte[] noFmt = wav.clone();
        noFmt[fmt] = 'x';
        cases.add(new Case("wav without a fmt chunk", "sweep.wav", noFmt, args));
        cases.add(new Case("wav empty", "sweep.wav", new byte[0], args));
        cases.add(new Case("wav noise", "sweep.wav", noise(new java.util.Random(708), 4096), args));
        return cases;
    }

    /** Part specs: typos, wrong types, out-of-range values, broken TOML, bytes that are not text. */
    private static List<Case> specCases() throws IOException {
        List<Case> cases = new ArrayList<>();
        String spec = Files.readString(qaSpec());
        BiFunction<Path, Path, List<String>> args = MalformedInputCorpusTest::qaSingle;
        String[][] edits = {
            {"tolerance_pct = 10", "tolerence_pct = 10"}, {"[resistance]", "[resistence]"},
            {"spec_version = 3", "spec_version = 3.5"}, {"spec_version = 3", "spec_version = \"3\""},
            {"spec_version = 3", "spec_version = 0"}, {"spec_version = 3", "spec_version = 1e400"},
            {"tolerance_pct = 10", "tolerance_pct = 100"}, {"tolerance_pct = 10", "tolerance_pct = -1"},
            {"tolerance_pct = 10", "tolerance_pct = nan"}, {"tolerance_pct = 10", "tolerance_pct = inf"},
            {"phase_nominal_ohm = 1.90", "phase_nominal_ohm = \"1.90\""},
            {"phase_nominal_ohm = 1.90", "phase_nominal_ohm = 1e308"}, {"number = \"KV-4218-M\"", "number = \"KV-42"},
            {"number = \"KV-4218-M\"", "number = 4218"}, {"number = \"KV-4218-M\"", "number = \"\""},
            {"number = \"KV-4218-M\"", "number = \"" + "N".repeat(5000) + "\""},
            {"revision = \"C\"", "revision = \"C\"\nrevision = \"D\""}, {"[part]", "[part"},
            {"[part]", "[part]\n[part]"}, {"minimum_mohm = 100", "minimum_mohm = [100]"},
            {"minimum_mohm = 100", "minimum_mohm = { v = 100 }"}, {"rated_voltage_v = 24", "rated_voltage_v = 24\ntest_voltage_v = 500"},
            {"nominal_deg = 1.8", "nominal_deg = 91"}, {"reference_c = 20", "reference_c = 300"},
            {"[part]", "[[part]]"}, {"spec_version = 3", "spec_version = 99999999999999999999999"},
        };
        for (String[] e : edits) {
            assertTrue(spec.contains(e[0]), e[0]);
            String shown = e[1].lines().findFirst().orElse("");
            cases.add(new Case("spec " + shown.substring(0, Math.min(40, shown.length())), "spec.toml", spec.replaceFirst(java.util.regex.Pattern.quote(e[0]),
                    java.util.regex.Matcher.quoteReplacement(e[1])).getBytes(StandardCharsets.UTF_8), args));
        }
        byte[] utf = spec.getBytes(StandardCharsets.UTF_8);
        int at = indexOf(utf, "KV-4218-M");
        byte[] badUtf = utf.clone();
        badUtf[at] = (byte) 0xFF;
        cases.add(new Case("spec with a byte that is not UTF-8", "spec.toml", badUtf, args));
        byte[] nul = utf.clone();
        nul[at] = 0;
        cases.add(new Case("spec with a NUL", "spec.toml", nul, args));
        cases.add(new Case("spec empty", "spec.toml", new byte[0], args));
        cases.add(new Case("spec comments only", "spec.toml", "# nothing\n".getBytes(StandardCharsets.UTF_8), args));
        cases.add(new Case("spec without [part]", "spec.toml", spec.replace("[part]", "[inductance_x]")
                .getBytes(StandardCharsets.UTF_8), args));
        cases.add(new Case("spec noise", "spec.toml", noise(new java.util.Random(809), 2048), args));
        cases.add(new Case("spec deep nesting", "spec.toml", ("[part]\nnumber = " + "[".repeat(20000))
                .getBytes(StandardCharsets.UTF_8), args));
        return cases;
    }

    /** Serial-number lists: empty, blank, not text, and one serial far too long. */
    private static List<Case> serialsCases() {
        List<Case> cases = new ArrayList<>();
        Path log = SAMPLES.resolve("qa/lot-L2607-meter-log.csv");
        BiFunction<Path, Path, List<String>> args = (file, out) -> qaLot(log, file, out);
        cases.add(new Case("serials empty", "serials.txt", new byte[0], args));
        cases.add(new Case("serials blank", "serials.txt", "\n \n\t\n".getBytes(StandardCharsets.UTF_8), args));
        cases.add(new Case("serials comments only", "serials.txt", "# lot L-2607\n".getBytes(StandardCharsets.UTF_8),
                args));
        cases.add(new Case("serials not UTF-8", "serials.txt", new byte[] {'K', 'V', (byte) 0xFF, '\n'}, args));
        cases.add(new Case("serials with a NUL", "serials.txt", "KV24-00117\nKV\0\n".getBytes(StandardCharsets.UTF_8),
                args));
        cases.add(new Case("serials 10 MB serial", "serials.txt", ("KV24-00117\n" + "S".repeat(10 << 20) + "\n")
                .getBytes(StandardCharsets.UTF_8), args));
        cases.add(new Case("serials 65-character serial", "serials.txt", ("S".repeat(65) + "\n")
                .getBytes(StandardCharsets.UTF_8), args));
        cases.add(new Case("serials noise", "serials.txt", noise(new java.util.Random(910), 1024), args));
        return cases;
    }

    // ---- byte helpers ----

    private static byte[] join(List<String> lines) {
        return (String.join("\n", lines) + "\n").getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] concat(byte[]... parts) {
        java.io.ByteArrayOutputStream b = new java.io.ByteArrayOutputStream();
        for (byte[] p : parts) {
            b.writeBytes(p);
        }
        return b.toByteArray();
    }

    /** Random bytes with a NUL early on, so they can be no text file and no WAV. */
    private static byte[] noise(java.util.Random rnd, int n) {
        byte[] b = new byte[n];
        rnd.nextBytes(b);
        b[3] = 0;
        b[0] = (byte) 0xFE;
        return b;
    }

    private static int indexOf(byte[] b, String ascii) {
        byte[] s = ascii.getBytes(StandardCharsets.ISO_8859_1);
        outer:
        for (int i = 0; i + s.length <= b.length; i++) {
            for (int j = 0; j < s.length; j++) {
                if (b[i + j] != s[j]) {
                    continue outer;
                }
            }
            return i;
        }
        throw new IllegalArgumentException("no " + ascii);
    }

    private static void put(byte[] b, int at, int bytes, long value) {
        for (int i = 0; i < bytes; i++) {
            b[at + i] = (byte) (value >>> (8 * i));
        }
    }
}
