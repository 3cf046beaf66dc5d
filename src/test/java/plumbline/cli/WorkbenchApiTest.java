package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import plumbline.io.OutputFiles;
import plumbline.serve.Workbench;

/**
 * The workbench's HTTP API and its safeguards, over real HTTP on 127.0.0.1. The check it
 * serves is compared with the command line's: the results JSON byte for byte, the PDF page
 * by page as text, for the same files under the same names.
 */
class WorkbenchApiTest {

    static Workbench wb;
    static String key;
    static HttpClient http = HttpClient.newHttpClient();

    @TempDir
    static Path folder;

    @BeforeAll
    static void start() throws IOException {
        Files.copy(Path.of("samples/portal-frame.yaml"), folder.resolve("portal-frame.yaml"));
        wb = Workbench.start(folder, 0);
        key = wb.address().getQuery().substring(2);
    }

    @AfterAll
    static void stop() {
        wb.close();
    }

    static String base() {
        return "http://127.0.0.1:" + wb.port();
    }

    static HttpResponse<byte[]> send(String method, String path, String json, Map<String, String> headers) throws Exception {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(base() + path))
                .method(method, json == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofString(json));
        headers.forEach(b::header);
        return http.send(b.build(), HttpResponse.BodyHandlers.ofByteArray());
    }

    static HttpResponse<byte[]> api(String method, String path, Map<String, Object> body) throws Exception {
        return send(method, path, body == null ? null : new String(OutputFiles.json(body, false), StandardCharsets.UTF_8),
                Map.of("X-Plumbline-Key", key, "Content-Type", "application/json"));
    }

    static Map<String, Object> json(HttpResponse<byte[]> r) throws IOException {
        return OutputFiles.parseJson(new String(r.body(), StandardCharsets.UTF_8));
    }

    /** A request written by hand, so that the Host header can be anything. */
    static String raw(String request) throws IOException {
        try (Socket s = new Socket("127.0.0.1", wb.port())) {
            OutputStream out = s.getOutputStream();
            out.write(request.getBytes(StandardCharsets.ISO_8859_1));
            out.flush();
            s.shutdownOutput(); // nothing more is coming: a refused body is not waited for
            s.setSoTimeout(10_000);
            InputStream in = s.getInputStream();
            return new String(in.readAllBytes(), StandardCharsets.ISO_8859_1);
        }
    }

    @Test
    void listensOnLoopbackOnly() {
        assertEquals("127.0.0.1", wb.address().getHost());
        assertTrue(wb.port() > 0);
    }

    @Test
    void thePageNeedsTheKeyAndLoadsOnlyItsOwnCode() throws Exception {
        assertEquals(403, send("GET", "/", null, Map.of()).statusCode());
        HttpResponse<byte[]> page = send("GET", "/?k=" + key, null, Map.of());
        assertEquals(200, page.statusCode());
        String csp = page.headers().firstValue("Content-Security-Policy").orElse("");
        assertTrue(csp.contains("default-src 'none'") && csp.contains("script-src 'self'"), csp);
        assertEquals("no-referrer", page.headers().firstValue("Referrer-Policy").orElse(""));
        // the SVG namespace is a name, not an address that is fetched
        String html = new String(page.body(), StandardCharsets.UTF_8).replace("http://www.w3.org/2000/svg", "");
        assertFalse(html.contains("http://") || html.contains("https://"), "the page fetches nothing from elsewhere");
        assertTrue(html.contains("does not replace the engineer of record"), "the caution is on the page");
        String js = new String(send("GET", "/workbench.js", null, Map.of()).body(), StandardCharsets.UTF_8)
                .replace("http://www.w3.org/2000/svg", "");
        assertFalse(js.contains("http://") || js.contains("https://"), "the page's code fetches nothing from elsewhere");
    }

    @Test
    void aForeignHostOrOriginIsRefused() throws Exception {
        String rebound = raw("GET /api/files?k=" + key + " HTTP/1.1\r\nHost: attacker.example:" + wb.port() + "\r\nConnection: close\r\n\r\n");
        assertTrue(rebound.startsWith("HTTP/1.1 403"), rebound);
        String own = raw("GET /api/files?k=" + key + " HTTP/1.1\r\nHost: localhost:" + wb.port() + "\r\nConnection: close\r\n\r\n");
        assertTrue(own.startsWith("HTTP/1.1 200"), own);
        HttpResponse<byte[]> cross = send("POST", "/api/model", "{\"name\":\"m.yaml\",\"text\":\"x\"}",
                Map.of("X-Plumbline-Key", key, "Origin", "https://attacker.example"));
        assertEquals(403, cross.statusCode());
        assertEquals(403, send("GET", "/api/files", null, Map.of("X-Plumbline-Key", key + "x")).statusCode());
    }

    @Test
    void anOversizedRequestIsRefusedUnread() throws Exception {
        // refused on its declared length, before a byte of the body is read
        String r = raw("POST /api/model HTTP/1.1\r\nHost: 127.0.0.1:" + wb.port() + "\r\nX-Plumbline-Key: " + key
                + "\r\nContent-Length: " + (5 * 1024 * 1024) + "\r\nConnection: close\r\n\r\n");
        assertTrue(r.startsWith("HTTP/1.1 413"), r);
        assertTrue(r.contains("at most 4194304 are read"), r);
    }

    @Test
    void theModelsProblemsComeWithTheirLines() throws Exception {
        String text = "format: plumbline/1\nunits: {force: kN, length: m}\nnodes:\n  A: [0, 0]\n  B: [6, 0]\nmembers:\n"
                + "  M1: {from: A, to: C, section: X}\n";
        Map<String, Object> a = json(api("POST", "/api/model", Map.of("name", "m.yaml", "text", text)));
        List<?> problems = (List<?>) a.get("problems");
        assertFalse(problems.isEmpty());
        Map<?, ?> first = (Map<?, ?>) problems.get(0);
        assertEquals(7, ((Number) first.get("line")).intValue(), first.toString());
        assertNotNull(a.get("outline"), "the tables still get the text's outline");
        assertEquals(null, a.get("view"));
        Map<String, Object> ok = json(api("POST", "/api/model", Map.of("name", "portal-frame.yaml",
                "text", Files.readString(Path.of("samples/portal-frame.yaml")))));
        assertEquals(List.of(), ok.get("problems"));
        Map<?, ?> view = (Map<?, ?>) ok.get("view");
        assertEquals(4, ((List<?>) view.get("nodes")).size());
        // the leeward column runs from E (8, 0) up to C (8, 4.5), as written
        Map<?, ?> c2 = (Map<?, ?>) ((List<?>) view.get("members")).get(2);
        assertEquals("E", c2.get("from"));
        assertEquals("4.500 m", c2.get("length"));
        Map<?, ?> g = (Map<?, ?>) ((List<?>) view.get("cases")).get(0);
        Map<?, ?> w = (Map<?, ?>) ((List<?>) g.get("loads")).get(0);
        assertEquals("-4.000 kN/m (y)", w.get("label"));
        assertEquals(List.of(0.0, 1.0), w.get("dir"));
    }

    @Test
    void settlementsAndTemperaturesAreLabelledWithTheirValues() throws Exception {
        // check cases 14 and 15: B settles 10 mm, written in mm in a file in metres; M1 warms 25 degC with a 10 degC gradient
        for (String[] c : new String[][]{{"checks/14-fixed-beam-settlement.yaml", "settlement uy -0.01000 m"},
                {"checks/15-fixed-beam-temperature.yaml", "temperature: uniform 25.00 degC, gradient 10.00 degC"}}) {
            Map<String, Object> a = json(api("POST", "/api/model", Map.of("name", "c.yaml", "text", Files.readString(Path.of(c[0])))));
            String loads = ((Map<?, ?>) ((List<?>) ((Map<?, ?>) a.get("view")).get("cases")).get(0)).get("loads").toString();
            assertTrue(loads.contains(c[1]), loads);
        }
    }

    @Test
    void theCheckServesWhatTheCommandLineWrites(@TempDir Path out) throws Exception {
        String model = "samples/portal-frame.yaml", claims = "samples/portal-frame-claims.yaml";
        Map<String, Object> a = json(api("POST", "/api/check", Map.of("name", model, "text", Files.readString(Path.of(model)),
                "claims", List.of(Map.of("name", claims, "text", Files.readString(Path.of(claims)))), "tolerance", "")));
        assertEquals("checked", a.get("status"));
        assertEquals(1, ((Number) a.get("exit")).intValue(), "a mismatch: exit 1 as check gives");
        String run = (String) a.get("run");
        CliRunner cli = CliRunner.run("check", model, "--claims", claims, "--json", out.resolve("r.json").toString(),
                "--pdf", out.resolve("r.pdf").toString());
        assertEquals(1, cli.code());
        HttpResponse<byte[]> results = send("GET", "/api/run/" + run + "/results.json?download=1&k=" + key, null, Map.of());
        assertEquals("attachment; filename=\"portal-frame-results.json\"", results.headers().firstValue("Content-Disposition").orElse(""));
        assertArrayEquals(Files.readAllBytes(out.resolve("r.json")), results.body(), "the results JSON is the command line's, byte for byte");
        HttpResponse<byte[]> pdf = send("GET", "/api/run/" + run + "/report.pdf?k=" + key, null, Map.of());
        Files.write(out.resolve("w.pdf"), pdf.body());
        assertEquals(ReportPagesTest.pages(out.resolve("r.pdf")), ReportPagesTest.pages(out.resolve("w.pdf")),
                "the PDF report reads the same on every page");
        Map<String, Object> figs = json(send("GET", "/api/run/" + run + "/figures?set=ULS-W&k=" + key, null, Map.of()));
        List<?> files = (List<?>) figs.get("files");
        assertFalse(files.isEmpty());
        byte[] png = send("GET", "/api/run/" + run + "/figure/" + files.get(0) + "?set=ULS-W&k=" + key, null, Map.of()).body();
        assertEquals((byte) 0x89, png[0]);
        assertEquals('P', png[1]);
        assertEquals(404, send("GET", "/api/run/r999/results.json?k=" + key, null, Map.of()).statusCode());
        // the page prints the claims as the report does: E's Fx to two decimals against -10.02 kN (statics of the
        // sample, README), its difference relative
        Map<?, ?> e = ((List<?>) a.get("claims")).stream().map(x -> (Map<?, ?>) x).filter(x -> x.get("id").equals("R-E-ULS-W-Fx"))
                .findFirst().orElseThrow();
        assertEquals("mismatch", e.get("status"));
        assertEquals("10.00 kN", e.get("claimed"));
        assertEquals("-10.02 kN", e.get("stiffness"));
        assertEquals("3%", e.get("tolerance"));
    }

    @Test
    void aClaimedZeroAgainstRoundingIsShownAgainstTheFloor() throws Exception {
        // the footbridge truss's claimed Fx = 0 at its pinned support: the computed value is rounding (about 1e-13 kN),
        // so its relative difference is 100 % in the JSON; the page, as the report, gives it in units against the floor
        String model = "samples/footbridge-truss.yaml", claims = "samples/footbridge-truss-claims.yaml";
        Map<String, Object> a = json(api("POST", "/api/check", Map.of("name", model, "text", Files.readString(Path.of(model)),
                "claims", List.of(Map.of("name", claims, "text", Files.readString(Path.of(claims)))))));
        Map<?, ?> fx = ((List<?>) a.get("claims")).stream().map(x -> (Map<?, ?>) x).filter(x -> x.get("quantity").toString().startsWith("Fx"))
                .findFirst().orElseThrow();
        assertEquals("ok", fx.get("status"));
        assertEquals("0 kN", fx.get("difference"));
        assertTrue(fx.get("tolerance").toString().endsWith("kN (floor)"), fx.toString());
    }

    @Test
    void badClaimsGiveInputProblemsNotAnalysis() throws Exception {
        Map<String, Object> a = json(api("POST", "/api/check", Map.of("name", "portal-frame.yaml",
                "text", Files.readString(Path.of("samples/portal-frame.yaml")),
                "claims", List.of(Map.of("name", "claims.csv", "text", "item,combo,name,quantity,value\nreaction,ULS-W,Q,Fy,3\n")))));
        assertEquals("input", a.get("status"));
        String problem = ((Map<?, ?>) ((List<?>) a.get("problems")).get(0)).get("text").toString();
        assertTrue(problem.startsWith("claims.csv:2:"), problem);
        assertEquals(400, api("POST", "/api/check", Map.of("name", "portal-frame.yaml", "text", "x", "tolerance", "150%")).statusCode());
        // a malformed request is refused with a sentence, not answered as an internal error
        for (Object claims : List.of("a.csv", List.of("a.csv"), List.of(Map.of("text", "x")), List.of(Map.of("name", "a.csv", "text", 3)))) {
            HttpResponse<byte[]> r = api("POST", "/api/check", Map.of("name", "portal-frame.yaml", "text", "x", "claims", claims));
            assertEquals(400, r.statusCode(), claims.toString());
        }
        assertEquals(400, send("POST", "/api/check", "not json", Map.of("X-Plumbline-Key", key)).statusCode());
        assertEquals(400, api("POST", "/api/model", Map.of("name", "m.yaml")).statusCode());
    }

    @Test
    void filesOpenAndSaveInsideTheFolderOnly() throws Exception {
        Map<String, Object> list = json(api("GET", "/api/files", null));
        assertTrue(list.get("files").toString().contains("portal-frame.yaml"), list.toString());
        Map<String, Object> opened = json(api("GET", "/api/file?name=portal-frame.yaml", null));
        assertEquals(Files.readString(Path.of("samples/portal-frame.yaml")), opened.get("text"));
        assertEquals(200, api("PUT", "/api/file?name=new-claims.csv", Map.of("text", "item,combo,name,quantity,value\n")).statusCode());
        assertEquals("item,combo,name,quantity,value\n", Files.readString(folder.resolve("new-claims.csv")));
        assertEquals(409, api("PUT", "/api/file?name=new-claims.csv", Map.of("text", "changed")).statusCode());
        assertEquals(200, api("PUT", "/api/file?replace=1&name=new-claims.csv", Map.of("text", "changed")).statusCode());
        assertEquals("changed", Files.readString(folder.resolve("new-claims.csv")));
        assertEquals(403, api("PUT", "/api/file?name=..%2Fescape.yaml", Map.of("text", "x")).statusCode());
        assertFalse(Files.exists(folder.getParent().resolve("escape.yaml")));
        assertEquals(403, api("GET", "/api/file?name=%2Fetc%2Fhostname.yaml", null).statusCode());
    }

    @Test
    void templateRowsCoverEverySupportAndMember() throws Exception {
        Map<String, Object> a = json(api("POST", "/api/template", Map.of("name", "portal-frame.yaml",
                "text", Files.readString(Path.of("samples/portal-frame.yaml")))));
        String rows = a.get("rows").toString();
        for (String name : List.of("name=A", "name=E", "name=C1", "name=R1", "name=C2")) assertTrue(rows.contains(name), name);
    }
}
