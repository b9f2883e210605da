package org.lodestep.station;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The station's endpoints in-process: pages, a QA run, a sweep, uploads, the token and cross-site refusal. */
class StationServerTest {
    @TempDir
    static Path dir;
    static Station station;
    static Station guarded;
    static Station dead;
    static final String TOKEN = "0123456789abcdef0123";
    static {
        System.setProperty("jdk.httpclient.allowRestrictedHeaders", "host");
    }
    static final HttpClient HTTP = HttpClient.newHttpClient();
    static final Path QA = Path.of("sample-captures", "qa").toAbsolutePath();

    @BeforeAll
    static void start() {
        station = Station.start(new Station.Settings("127.0.0.1", 0, null, dir.resolve("qa.sqlite").toString(),
                "sim:bench-4", QA, QA, dir.resolve("out"), "test"));
        guarded = Station.start(new Station.Settings("127.0.0.1", 0, TOKEN, dir.resolve("qa2.sqlite").toString(),
                "sim:bench-4", QA, QA, dir.resolve("out2"), "test"));
        // a rig address where nothing answers; stopped with the others, never in the middle of the class
        dead = Station.start(new Station.Settings("127.0.0.1", 0, null, dir.resolve("qa3.sqlite").toString(),
                "tcp:127.0.0.1:9", QA, QA, dir.resolve("out3"), "test"));
    }

    @AfterAll
    static void stop() {
        station.close();
        guarded.close();
        dead.close();
    }

    static String base(Station s) {
        return "http://127.0.0.1:" + s.port();
    }

    static HttpResponse<String> get(String url, String... headers) throws IOException, InterruptedException {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(url)).timeout(java.time.Duration.ofSeconds(60)).GET();
        for (int i = 0; i < headers.length; i += 2) {
            b.header(headers[i], headers[i + 1]);
        }
        return HTTP.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    static HttpResponse<String> post(String url, String form, String... headers) throws IOException, InterruptedException {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(url))
                .header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(form));
        for (int i = 0; i < headers.length; i += 2) {
            b.header(headers[i], headers[i + 1]);
        }
        return HTTP.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    static String formKey(Station s, String... headers) throws Exception {
        Matcher m = Pattern.compile("name=\"lodestep-form\" content=\"([0-9a-f]+)\"")
                .matcher(get(base(s) + "/qa", headers).body());
        assertTrue(m.find());
        return m.group(1);
    }

    static HttpResponse<String> multipart(String url, String key, String fileName, byte[] content, String... fields)
            throws Exception {
        return multipart(url, key, "spec_file", fileName, content, fields);
    }

    static HttpResponse<String> multipart(String url, String key, String fieldName, String fileName, byte[] content,
                                          String... fields) throws Exception {
        return multipart(url, key, List.<String[]>of(new String[] {fieldName, fileName}), List.of(content), fields);
    }

    /** A multipart post of several files: each {field, file name} with its content. */
    static HttpResponse<String> multipart(String url, String key, List<String[]> files, List<byte[]> contents,
                                          String... fields) throws Exception {
        String boundary = "----lodestep" + System.nanoTime();
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < fields.length; i += 2) {
            sb.append("--").append(boundary).append("\r\nContent-Disposition: form-data; name=\"").append(fields[i])
                    .append("\"\r\n\r\n").append(fields[i + 1]).append("\r\n");
        }
        java.io.ByteArrayOutputStream body = new java.io.ByteArrayOutputStream();
        body.write(sb.toString().getBytes(StandardCharsets.UTF_8));
        for (int i = 0; i < files.size(); i++) {
            body.write(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"" + files.get(i)[0]
                    + "\"; filename=\"" + files.get(i)[1] + "\"\r\nContent-Type: application/octet-stream\r\n\r\n")
                    .getBytes(StandardCharsets.UTF_8));
            body.write(contents.get(i));
            body.write("\r\n".getBytes(StandardCharsets.UTF_8));
        }
        body.write(("--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        return HTTP.send(HttpRequest.newBuilder(URI.create(url))
                .header("Content-Type", "multipart/form-data; boundary=" + boundary)
                .header(Access.FORM_KEY_HEADER, key)
                .POST(HttpRequest.BodyPublishers.ofByteArray(body.toByteArray())).build(), HttpResponse.BodyHandlers.ofString());
    }

    /** Reads a task's events until it ends; returns them all. */
    static String events(Station s, String task) throws Exception {
        return get(base(s) + "/api/tasks/" + task + "/events", "Accept", "text/event-stream").body();
    }

    static String field(String json, String name) {
        Matcher m = Pattern.compile("\"" + name + "\"\\s*:\\s*\"?([^\",}\\s]*)").matcher(json);
        assertTrue(m.find(), json);
        return m.group(1);
    }

    @Test
    void everyPageAnswersOnLoopbackWithSecurityHeaders() throws Exception {
        for (String path : new String[] {"/", "/qa", "/records", "/sweep", "/assets/station.css", "/assets/station.js",
                "/records/report.html", "/records/export.csv"}) {
            HttpResponse<String> r = get(base(station) + path);
            assertEquals(200, r.statusCode(), path);
            assertTrue(r.headers().firstValue("Content-Security-Policy").orElse("").contains("script-src 'self'"));
            assertEquals("nosniff", r.headers().firstValue("X-Content-Type-Options").orElse(""));
        }
    }

    @Test
    void aForeignHostNameIsRefusedOnLoopback() throws Exception {
        // A page on another site that rebinds its DNS name to 127.0.0.1 still sends its own name as Host.
        assertEquals(403, get(base(station) + "/qa", "Host", "attacker.example").statusCode());
    }

    @Test
    void theTokenIsNeededOnEveryRequestAndBecomesACookie() throws Exception {
        assertEquals(401, get(base(guarded) + "/qa").statusCode());
        assertEquals(401, get(base(guarded) + "/api/tasks/x/events").statusCode());
        assertEquals(401, get(base(guarded) + "/qa?token=wrong-token-value-here").statusCode());
        HttpResponse<String> first = get(base(guarded) + "/qa?token=" + TOKEN);
        assertEquals(303, first.statusCode());
        String cookie = first.headers().firstValue("Set-Cookie").orElseThrow();
        assertTrue(cookie.contains("HttpOnly") && cookie.contains("SameSite=Strict"), cookie);
        String pair = cookie.substring(0, cookie.indexOf(';'));
        assertEquals(200, get(base(guarded) + "/qa", "Cookie", pair).statusCode());
        assertEquals(200, get(base(guarded) + "/records", "Authorization", "Bearer " + TOKEN).statusCode());
        assertTrue(guarded.address().endsWith("?token=" + TOKEN));
    }

    @Test
    void listeningBeyondLoopbackWithoutATokenIsRefused() {
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class, () -> new Station.Settings(
                "0.0.0.0", 0, null, null, null, null, null, dir, null));
    }

    @Test
    void crossSiteAndKeylessPostsAreRefused() throws Exception {
        String key = formKey(station);
        String url = base(station) + "/api/sweep";
        HttpResponse<String> noKey = post(url, "ack=yes");
        assertEquals(403, noKey.statusCode());
        assertTrue(noKey.body().contains("form key"), noKey.body());
        assertEquals(403, post(url, "ack=yes", Access.FORM_KEY_HEADER, key, "Origin", "http://attacker.example")
                .statusCode());
        assertEquals(403, post(url, "ack=yes", Access.FORM_KEY_HEADER, key, "Sec-Fetch-Site", "cross-site")
                .statusCode());
        assertEquals(403, post(url, "ack=yes&" + Access.FORM_KEY_FIELD + "=0000", "Origin", base(station))
                .statusCode());
    }

    @Test
    void aSweepNeedsTheCautionAcknowledgedAndStreamsToItsBands() throws Exception {
        String key = formKey(station);
        HttpResponse<String> refused = post(base(station) + "/api/sweep", "from=40&to=200&seconds=8",
                Access.FORM_KEY_HEADER, key);
        assertEquals(400, refused.statusCode());
        assertTrue(refused.body().contains("acknowledge the moving-axis caution"), refused.body());
        HttpResponse<String> bad = post(base(station) + "/api/sweep", "ack=yes&microsteps=3",
                Access.FORM_KEY_HEADER, key);
        assertEquals(400, bad.statusCode());
        assertTrue(bad.body().contains("microsteps"), bad.body());
        HttpResponse<String> r = post(base(station) + "/api/sweep",
                "ack=yes&rig=sim:gantry-axis&from=40&to=200&seconds=8&microsteps=1", Access.FORM_KEY_HEADER, key);
        assertEquals(200, r.statusCode(), r.body());
        String ev = events(station, field(r.body(), "task"));
        assertTrue(ev.contains("\"type\":\"progress\""), ev);
        assertTrue(ev.contains("\"type\":\"done\""), ev);
        Matcher report = Pattern.compile("\"report\"\\s*:\\s*\"(/sweep/reports/[0-9a-f]+)\"").matcher(ev);
        assertTrue(report.find(), ev);
        assertTrue(get(base(station) + report.group(1)).body().contains("<svg"));
        // the response curve streams while the sweep runs: curve events with points, all before the end
        int firstCurve = ev.indexOf("\"type\":\"curve\"");
        assertTrue(firstCurve > 0 && firstCurve < ev.indexOf("\"type\":\"done\""), ev);
        assertTrue(Pattern.compile("\"type\":\"curve\",\"points\":\\[\\[[0-9.]+,-?[0-9.]+\\]").matcher(ev).find(), ev);
        // then the bands over the final curve
        assertTrue(Pattern.compile("\"band_spans\":\\[\\[[0-9.]+,[0-9.]+,[0-9.]+\\]").matcher(ev).find(), ev);
        assertEquals(400, post(base(station) + "/api/sweep", "ack=yes&rig=tcp:10.0.0.9:7000",
                Access.FORM_KEY_HEADER, key).statusCode());
    }

    @Test
    void aQaRunChecksScannedMotorsAndTalliesThem() throws Exception {
        String key = formKey(station);
        HttpResponse<String> start = post(base(station) + "/qa/runs", "spec=kv-4218-m.toml&lot=L-T1&operator=T&source="
                + "captures&meter_log=lot-L2607-meter-log.csv&" + Access.FORM_KEY_FIELD + "=" + key);
        assertEquals(303, start.statusCode(), start.body());
        String runPath = start.headers().firstValue("Location").orElseThrow();
        String id = runPath.substring(runPath.lastIndexOf('/') + 1);
        for (String sn : new String[] {"KV24-00123", "KV24-00124", "NO-SUCH-SERIAL"}) {
            HttpResponse<String> scan = post(base(station) + "/api/qa/runs/" + id + "/scan", "serial=" + sn,
                    Access.FORM_KEY_HEADER, key);
            assertEquals(200, scan.statusCode(), scan.body());
            events(station, field(scan.body(), "task"));
        }
        String panel = get(base(station) + runPath + "/panel").body();
        assertTrue(panel.contains("NOT RECORDED"), panel);
        assertTrue(panel.contains("KV24-00124") && panel.contains("FAIL"), panel);
        assertTrue(panel.contains("1 PASS, 1 FAIL, 1 INCOMPLETE"), panel);
        HttpResponse<String> cert = get(base(station) + "/qa/certificate?serial=KV24-00123");
        assertEquals(200, cert.statusCode());
        assertTrue(cert.body().contains("CERTIFIED"), cert.body());
        assertTrue(get(base(station) + "/qa/certificate.html?serial=KV24-00123").body().contains("KV24-00123"));
        assertEquals(400, get(base(station) + "/qa/certificate?serial=NOPE").statusCode());
        String records = get(base(station) + "/records?lot=L-T1").body();
        assertTrue(records.contains("First-pass yield"), records);
        assertTrue(get(base(station) + "/records/export.csv?lot=L-T1").body().contains("KV24-00124"));
        assertEquals(400, get(base(station) + "/records?from=yesterday").statusCode());
    }

    @Test
    void userStringsAreEscaped() throws Exception {
        String key = formKey(station);
        HttpResponse<String> start = post(base(station) + "/qa/runs", "spec=kv-4218-m.toml&lot=%3Cscript%3Ex%3C%2Fscript%3E"
                + "&source=captures&" + Access.FORM_KEY_FIELD + "=" + key);
        String runPath = start.headers().firstValue("Location").orElseThrow();
        String id = runPath.substring(runPath.lastIndexOf('/') + 1);
        HttpResponse<String> scan = post(base(station) + "/api/qa/runs/" + id + "/scan",
                "serial=%3Cimg+src%3Dx+onerror%3Dalert(1)%3E", Access.FORM_KEY_HEADER, key);
        events(station, field(scan.body(), "task"));
        String page = get(base(station) + runPath).body();
        assertFalse(page.contains("<script>x"), page);
        assertFalse(page.contains("<img src=x"), page);
        assertTrue(page.contains("&lt;img src=x onerror=alert(1)&gt;"), page);
    }

    @Test
    void aBadSpecUploadGetsTheReadersOneLineError() throws Exception {
        String key = formKey(station);
        HttpResponse<String> r = multipart(base(station) + "/qa/runs", key, "broken.toml",
                "[part]\nnumber = \"X\"\nspec_version = \"three\"\n".getBytes(StandardCharsets.UTF_8),
                "source", "captures");
        assertEquals(400, r.statusCode());
        assertTrue(r.body().contains("broken.toml"), r.body());
        HttpResponse<String> big = multipart(base(station) + "/qa/runs", key, "huge.toml",
                new byte[(int) Station.MAX_UPLOAD_BYTES + 1024], "source", "captures");
        assertTrue(big.statusCode() >= 400, "status " + big.statusCode());
    }

    @Test
    void insulationThroughTheRigFiresOnlyWithThePagesOwnArming() throws Exception {
        String key = formKey(station);
        HttpResponse<String> start = post(base(station) + "/qa/runs", "spec=kv-4218-m.toml&lot=L-ARM&source=rig&"
                + Access.FORM_KEY_FIELD + "=" + key);
        String runPath = start.headers().firstValue("Location").orElseThrow();
        String id = runPath.substring(runPath.lastIndexOf('/') + 1);
        assertTrue(get(base(station) + runPath).body().contains("500 V DC"));
        // a tab that never armed: nothing is energised
        HttpResponse<String> unarmed = post(base(station) + "/api/qa/runs/" + id + "/scan", "serial=KV24-90001",
                Access.FORM_KEY_HEADER, key);
        assertTrue(events(station, field(unarmed.body(), "task")).contains("not confirmed: nothing was energised"));
        String arm = field(post(base(station) + "/api/qa/runs/" + id + "/arm", "", Access.FORM_KEY_HEADER, key).body(),
                "arm");
        HttpResponse<String> armed = post(base(station) + "/api/qa/runs/" + id + "/scan", "serial=KV24-90002&arm=" + arm,
                Access.FORM_KEY_HEADER, key);
        String ev = events(station, field(armed.body(), "task"));
        assertFalse(ev.contains("not confirmed"), ev);
        // the arming was used once: the same key fires nothing a second time
        HttpResponse<String> again = post(base(station) + "/api/qa/runs/" + id + "/scan", "serial=KV24-90003&arm=" + arm,
                Access.FORM_KEY_HEADER, key);
        assertTrue(events(station, field(again.body(), "task")).contains("not confirmed"));
    }

    @Test
    void anUnknownRunOrTaskIsAClearMessage() throws Exception {
        assertEquals(404, get(base(station) + "/qa/runs/nope").statusCode());
        assertTrue(events(station, "nope").contains("no such task"));
    }

    @Test
    void anUploadedSweepIsReadByTheSameReaderWithItsOneLineError() throws Exception {
        String key = formKey(station);
        HttpResponse<String> bad = multipart(base(station) + "/api/sweep/upload", key, "capture", "bench-run.csv",
                "time_s,accel_g\n0.0,zero\n".getBytes(StandardCharsets.UTF_8));
        assertEquals(200, bad.statusCode(), bad.body());
        String ev = events(station, field(bad.body(), "task"));
        assertTrue(ev.contains("\"type\":\"failed\"") && ev.contains("bench-run.csv"), ev);
        assertTrue(ev.contains("\"kind\":\"input\""), ev);
        // a recorded sweep from the sample captures, the one `resonance sweep` reads in the README
        Path sample = Path.of("sample-captures", "resonance", "belt-axis-sweep.csv");
        HttpResponse<String> good = multipart(base(station) + "/api/sweep/upload", key, "capture",
                "belt-axis-sweep.csv", java.nio.file.Files.readAllBytes(sample));
        assertTrue(events(station, field(good.body(), "task")).contains("\"type\":\"done\""));
    }

    @Test
    void aRigThatDoesNotAnswerIsARigFaultWithNothingRecorded() throws Exception {
        String key = formKey(dead);
        HttpResponse<String> r = post(base(dead) + "/api/sweep", "ack=yes&rig=tcp:127.0.0.1:9",
                Access.FORM_KEY_HEADER, key);
        String ev = events(dead, field(r.body(), "task"));
        assertTrue(ev.contains("\"kind\":\"rig\"") && ev.contains("nothing was recorded"), ev);
    }

    @Test
    void aProbeSessionTakesTypedReadingsUndoAndRefusesNonsense() throws Exception {
        String key = formKey(station);
        assertEquals(400, post(base(station) + "/leads/probes", "labels=1&" + Access.FORM_KEY_FIELD + "=" + key)
                .statusCode());
        HttpResponse<String> start = post(base(station) + "/leads/probes", "labels=red,blue,green,black&"
                + Access.FORM_KEY_FIELD + "=" + key);
        assertEquals(303, start.statusCode(), start.body());
        String path = start.headers().firstValue("Location").orElseThrow();
        String id = path.substring(path.lastIndexOf('/') + 1);
        assertTrue(get(base(station) + path).body().contains("class=\"big pair\">red \u2013 blue"));
        String answer = base(station) + "/api/leads/probes/" + id + "/answer";
        HttpResponse<String> nonsense = post(answer, "value=about+two", Access.FORM_KEY_HEADER, key);
        assertEquals(400, nonsense.statusCode());
        assertTrue(nonsense.body().contains("expected ohms"), nonsense.body());
        assertEquals(400, post(answer, "value=-3", Access.FORM_KEY_HEADER, key).statusCode());
        assertTrue(post(answer, "value=OL", Access.FORM_KEY_HEADER, key).body().contains("OL (open)"));
        assertTrue(post(answer, "value=u", Access.FORM_KEY_HEADER, key).body().contains("withdrew red"));
        assertEquals(400, get(base(station) + path + "/report.html").statusCode());
        String stopped = post(answer, "value=stop", Access.FORM_KEY_HEADER, key).body();
        assertTrue(stopped.contains("stopped before the answer was certain"), stopped);
        assertEquals(200, get(base(station) + path + "/report.html").statusCode());
        assertEquals(400, post(answer, "value=2", Access.FORM_KEY_HEADER, key).statusCode());
    }

    @Test
    void uploadedStepResponsesAndBackEmfGiveTheMotorCard() throws Exception {
        String key = formKey(station);
        Path m = Path.of("sample-captures", "motor");
        List<String[]> files = List.of(new String[] {"step_response", "step-1-7.csv"},
                new String[] {"step_response", "step-2-5.csv"}, new String[] {"step_response", "step-3-8.csv"},
                new String[] {"step_response", "step-4-6.csv"}, new String[] {"back_emf", "back-emf.csv"});
        List<byte[]> contents = new java.util.ArrayList<>();
        for (String[] f : files) {
            contents.add(Files.readAllBytes(m.resolve(f[1])));
        }
        HttpResponse<String> r = multipart(base(station) + "/api/motor", key, files, contents, "supply_v", "24",
                "phase_current_a", "1.2");
        assertEquals(200, r.statusCode(), r.body());
        String ev = events(station, field(r.body(), "task"));
        assertTrue(ev.contains("\"type\":\"done\"") && ev.contains("Motor card"), ev);
        HttpResponse<String> bad = multipart(base(station) + "/api/motor", key, List.<String[]>of(new String[] {
                "step_response", "coil-a.csv"}), List.of("time_s,current_a\n0,x\n".getBytes(StandardCharsets.UTF_8)));
        String badEv = events(station, field(bad.body(), "task"));
        assertTrue(badEv.contains("\"kind\":\"input\"") && badEv.contains("coil-a.csv"), badEv);
        HttpResponse<String> none = multipart(base(station) + "/api/motor", key, List.<String[]>of(), List.<byte[]>of());
        assertEquals(400, none.statusCode());
        assertTrue(none.body().contains("nothing to identify"), none.body());
    }

    /** A finished sweep of the gantry axis: the task's events. */
    static String gantrySweep(String key) throws Exception {
        HttpResponse<String> r = post(base(station) + "/api/sweep",
                "ack=yes&rig=sim:gantry-axis&from=40&to=200&seconds=8&microsteps=1", Access.FORM_KEY_HEADER, key);
        assertEquals(200, r.statusCode(), r.body());
        return events(station, field(r.body(), "task"));
    }

    @Test
    void aProfileIsPlannedAcrossTheBandsOfASweep() throws Exception {
        String key = formKey(station);
        String ev = gantrySweep(key);
        String sweep = field(ev.substring(ev.indexOf("\"type\":\"done\"")), "sweep");
        String url = base(station) + "/api/sweep/" + sweep + "/plan";
        // the gantry-axis scenario's motor (scenarios.toml): two 0.6 ohm, 0.7 mH halves in series per phase
        // (coupling 0.97: L = 2 x 0.7 mH x 1.97), Ke 0.3 V s/rad, rotor 8.2e-6 kg m2, load 5.5e-5 kg m2
        String motor = "phase_resistance_ohm=1.2&phase_inductance_h=0.00276&kt_nm_per_a=0.3&rotor_inertia_kgm2=8.2e-6"
                + "&rotor_teeth=50&drive=chopper&supply_v=48&current_a=2.5&plan_microsteps=1&load_inertia_kgm2=5.5e-5"
                + "&friction_torque_nm=0&margin=0.3&shape=trapezoidal&cruise_s=0.2";
        HttpResponse<String> noTarget = post(url, motor, Access.FORM_KEY_HEADER, key);
        assertEquals(400, noTarget.statusCode());
        assertTrue(noTarget.body().contains("target"), noTarget.body());
        assertEquals(400, post(url, motor + "&target_full_steps_per_s=fast", Access.FORM_KEY_HEADER, key).statusCode());
        assertEquals(400, post(url, motor.replace("drive=chopper", "drive=steam") + "&target_full_steps_per_s=300",
                Access.FORM_KEY_HEADER, key).statusCode());
        assertEquals(403, post(url, motor + "&target_full_steps_per_s=300").statusCode());
        assertEquals(403, post(url, motor + "&target_full_steps_per_s=300", Access.FORM_KEY_HEADER, key,
                "Sec-Fetch-Site", "cross-site").statusCode());
        assertEquals(404, post(base(station) + "/api/sweep/nope/plan", motor + "&target_full_steps_per_s=300",
                Access.FORM_KEY_HEADER, key).statusCode());
        HttpResponse<String> r = post(url, motor + "&target_full_steps_per_s=300", Access.FORM_KEY_HEADER, key);
        assertEquals(200, r.statusCode(), r.body());
        String planned = events(station, field(r.body(), "task"));
        assertTrue(planned.contains("\"type\":\"done\""), planned);
        assertTrue(planned.contains("band ") && planned.contains("crossed at"), planned);
        Matcher plan = Pattern.compile("\"plan\"\\s*:\\s*\"(/sweep/plans/[0-9a-f]+)\"").matcher(planned);
        assertTrue(plan.find(), planned);
        String csv = get(base(station) + plan.group(1) + "/table.csv").body();
        assertTrue(csv.lines().count() > 10, csv);
        assertTrue(get(base(station) + plan.group(1)).body().contains("<svg"));
    }

    @Test
    void aProbeSessionShowsTheSchematicAndFindingsAfterEachReading() throws Exception {
        String key = formKey(station);
        HttpResponse<String> start = post(base(station) + "/leads/probes", "labels=6&" + Access.FORM_KEY_FIELD + "="
                + key);
        String path = start.headers().firstValue("Location").orElseThrow();
        String id = path.substring(path.lastIndexOf('/') + 1);
        String panel = get(base(station) + path + "/panel").body();
        assertFalse(panel.contains("So far"), "nothing to show before the first reading");
        Pattern next = Pattern.compile("class=\"big pair\">(\\d+) \u2013 (\\d+)<");
        boolean schematicBeforeTheEnd = false;
        boolean windingBeforeTheEnd = false;
        for (int i = 0; i < 15; i++) {
            Matcher m = next.matcher(panel);
            if (!m.find()) {
                break;
            }
            String reply = post(base(station) + "/api/leads/probes/" + id + "/answer", "value="
                    + sixLead(m.group(1), m.group(2)), Access.FORM_KEY_HEADER, key).body();
            panel = get(base(station) + path + "/panel").body();
            if (panel.contains("class=\"big pair\"")) {
                // still probing: the identification so far is on the page after every reading
                assertTrue(panel.contains("So far"), panel);
                schematicBeforeTheEnd |= panel.contains("<svg");
                windingBeforeTheEnd |= panel.contains("winding 1 \u2013 3, centre tap 2");
            }
            assertTrue(reply.contains("\"html\""), reply);
        }
        assertTrue(windingBeforeTheEnd, "the first winding shows as soon as its three readings are in");
        assertTrue(schematicBeforeTheEnd, "the schematic fills in before the session ends");
        assertTrue(panel.contains("6-lead"), panel);
    }

    /** A six-lead motor: two centre-tapped windings 1-2-3 and 4-5-6, 1.2 ohm per half (invented). */
    static String sixLead(String a, String b) {
        List<String> one = List.of("1", "2", "3");
        List<String> two = List.of("4", "5", "6");
        for (List<String> w : List.of(one, two)) {
            if (w.contains(a) && w.contains(b)) {
                return Math.abs(w.indexOf(a) - w.indexOf(b)) == 2 ? "2.4" : "1.2";
            }
        }
        return "OL";
    }

    @Test
    void typedMeterReadingsAreJudgedAndAFailSaysWhichCheckByHowMuch() throws Exception {
        String key = formKey(station);
        HttpResponse<String> start = post(base(station) + "/qa/runs", "spec=kv-4218-m.toml&lot=L-TYPED&source=typed&"
                + Access.FORM_KEY_FIELD + "=" + key);
        assertEquals(303, start.statusCode(), start.body());
        String runPath = start.headers().firstValue("Location").orElseThrow();
        String id = runPath.substring(runPath.lastIndexOf('/') + 1);
        assertTrue(get(base(station) + runPath).body().contains("id=\"phase_a_ohm\""));
        String scan = base(station) + "/api/qa/runs/" + id + "/scan";
        HttpResponse<String> bad = post(scan, "serial=KV24-T1&phase_a_ohm=two", Access.FORM_KEY_HEADER, key);
        assertEquals(400, bad.statusCode());
        assertTrue(bad.body().contains("phase resistance A 'two' is not a number"), bad.body());
        assertEquals(400, post(scan, "serial=KV24-T1&phase_b_ohm=1.9", Access.FORM_KEY_HEADER, key).statusCode());
        assertEquals(403, post(scan, "serial=KV24-T1&phase_a_ohm=1.9").statusCode());
        // the sample spec kv-4218-m.toml: 1.90 ohm +- 10 % -> upper limit 2.09 ohm; 2.31 ohm is 0.22 ohm beyond it
        String good = "&inductance_a_mh=2.8&inductance_b_mh=2.8&insulation_a_frame_mohm=OL&insulation_b_frame_mohm=900"
                + "&step_angle_deg=1.8";
        events(station, field(post(scan, "serial=KV24-T1&phase_a_ohm=1.90&phase_b_ohm=1.91" + good,
                Access.FORM_KEY_HEADER, key).body(), "task"));
        events(station, field(post(scan, "serial=KV24-T2&phase_a_ohm=2.31&phase_b_ohm=2.30" + good,
                Access.FORM_KEY_HEADER, key).body(), "task"));
        String panel = get(base(station) + runPath + "/panel").body();
        assertTrue(panel.contains("1 PASS, 1 FAIL"), panel);
        assertTrue(panel.contains("phase resistance A: 2.31 \u03A9, above the upper limit 2.09 \u03A9 by 0.22 \u03A9 (10.5 %)"),
                panel);
    }

    static final String TAB_A = "0123456789abcdef0123456789abcdef";
    static final String TAB_B = "fedcba9876543210fedcba9876543210";

    static String arm(Station s, String key, String action, String tab) throws Exception {
        HttpResponse<String> r = post(base(s) + "/api/rig/arm", "action=" + action + "&tab=" + tab,
                Access.FORM_KEY_HEADER, key);
        assertEquals(200, r.statusCode(), r.body());
        return field(r.body(), "arm");
    }

    @Test
    void energisingFromTheBrowserNeedsThisPagesOwnArmingOnce() throws Exception {
        String key = formKey(station);
        String url = base(station) + "/api/leads/rig";
        assertEquals(403, post(base(station) + "/api/rig/arm", "action=leads&tab=" + TAB_A).statusCode());
        assertEquals(400, post(base(station) + "/api/rig/arm", "action=weld&tab=" + TAB_A, Access.FORM_KEY_HEADER,
                key).statusCode());
        HttpResponse<String> unarmed = post(url, "tab=" + TAB_A, Access.FORM_KEY_HEADER, key);
        assertEquals(400, unarmed.statusCode());
        assertTrue(unarmed.body().contains("not armed") && unarmed.body().contains("nothing was energised"),
                unarmed.body());
        String armA = arm(station, key, "leads", TAB_A);
        // another tab holding the key (it never should) still cannot fire what this one armed
        HttpResponse<String> otherTab = post(url, "arm=" + armA + "&tab=" + TAB_B, Access.FORM_KEY_HEADER, key);
        assertEquals(400, otherTab.statusCode());
        assertTrue(otherTab.body().contains("another page"), otherTab.body());
        // nor another action
        assertEquals(400, post(base(station) + "/api/motor/rig", "arm=" + armA + "&tab=" + TAB_A,
                Access.FORM_KEY_HEADER, key).statusCode());
        armA = arm(station, key, "leads", TAB_A);
        assertEquals(403, post(url, "arm=" + armA + "&tab=" + TAB_A, Access.FORM_KEY_HEADER, key, "Sec-Fetch-Site",
                "cross-site").statusCode());
        HttpResponse<String> fired = post(url, "arm=" + armA + "&tab=" + TAB_A, Access.FORM_KEY_HEADER, key);
        assertEquals(200, fired.statusCode(), fired.body());
        String ev = events(station, field(fired.body(), "task"));
        // the bench-4 scenario is a four-lead motor (scenarios.toml): each reading arrives as it is measured
        assertTrue(ev.indexOf("\"type\":\"reading\"") > 0 && ev.indexOf("\"type\":\"reading\"")
                < ev.indexOf("\"type\":\"done\""), ev);
        assertTrue(ev.contains("4-lead"), ev);
        // used once
        HttpResponse<String> again = post(url, "arm=" + armA + "&tab=" + TAB_A, Access.FORM_KEY_HEADER, key);
        assertEquals(400, again.statusCode());
    }

    @Test
    void theMotorIsMeasuredOnTheRigStageByStageWithOutputsOffAtTheEnd() throws Exception {
        String key = formKey(station);
        String armKey = arm(station, key, "motor", TAB_A);
        HttpResponse<String> bad = post(base(station) + "/api/motor/rig", "arm=" + armKey + "&tab=" + TAB_A
                + "&rig_supply_v=lots", Access.FORM_KEY_HEADER, key);
        assertEquals(400, bad.statusCode());
        assertTrue(bad.body().contains("supply voltage 'lots'"), bad.body());
        HttpResponse<String> r = post(base(station) + "/api/motor/rig", "arm=" + armKey + "&tab=" + TAB_A
                + "&rig_supply_v=24&rig_phase_current_a=1.5", Access.FORM_KEY_HEADER, key);
        assertEquals(200, r.statusCode(), r.body());
        String ev = events(station, field(r.body(), "task"));
        assertTrue(ev.contains("[1/3]") && ev.contains("[2/3]") && ev.contains("\"type\":\"attention\""), ev);
        assertTrue(ev.contains("outputs switched off") && ev.contains("\"type\":\"done\""), ev);
    }

    @Test
    void aRigLineThatDropsDuringLeadsSaysNothingWasRecorded() throws Exception {
        String key = formKey(dead);
        String armKey = arm(dead, key, "leads", TAB_A);
        HttpResponse<String> r = post(base(dead) + "/api/leads/rig", "arm=" + armKey + "&tab=" + TAB_A,
                Access.FORM_KEY_HEADER, key);
        String ev = events(dead, field(r.body(), "task"));
        assertTrue(ev.contains("\"kind\":\"rig\"") && ev.contains("nothing was recorded"), ev);
    }
}
