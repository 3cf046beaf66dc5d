package plumbline.serve;

import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.URI;
import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import plumbline.io.OutputFiles;

/**
 * The workbench's HTTP server: the page and its code from inside the jar, and the API of
 * {@link Api} as JSON. Listens on 127.0.0.1 only; every request passes the {@link Gate}
 * first. Answers carry a content security policy that lets the page load only its own
 * code, and no answer is cached or sends the address (with its key) on as a referrer.
 */
public final class Workbench implements AutoCloseable {

    /** The page's files, inside the jar, with their content types. */
    static final Map<String, String> ASSETS = Map.of(
            "/", "text/html; charset=utf-8",
            "/workbench.js", "text/javascript; charset=utf-8",
            "/workbench.css", "text/css; charset=utf-8");

    static final String KEY_HEADER = "X-Plumbline-Key";

    private final HttpServer server;
    private final ExecutorService pool;
    private final Gate gate;
    private final Api api;
    private final String key;

    private Workbench(HttpServer server, ExecutorService pool, Folder folder, String key) {
        this.server = server;
        this.pool = pool;
        this.key = key;
        this.gate = new Gate(server.getAddress().getPort(), key);
        this.api = new Api(folder);
    }

    /**
     * Starts a workbench on the loopback address.
     *
     * @param folder the folder whose files may be opened and saved
     * @param port   the port, 0 for a free one
     */
    public static Workbench start(Path folder, int port) throws IOException {
        byte[] random = new byte[24];
        new SecureRandom().nextBytes(random);
        String key = Base64.getUrlEncoder().withoutPadding().encodeToString(random);
        HttpServer server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), port), 16);
        ExecutorService pool = Executors.newFixedThreadPool(4, r -> {
            Thread t = new Thread(r, "workbench");
            t.setDaemon(true);
            return t;
        });
        server.setExecutor(pool);
        Workbench w = new Workbench(server, pool, new Folder(folder), key);
        server.createContext("/", w::handle);
        server.start();
        return w;
    }

    /** The address to open, with the access key. */
    public URI address() {
        return URI.create("http://127.0.0.1:" + port() + "/?k=" + key);
    }

    public int port() {
        return server.getAddress().getPort();
    }

    /** Stops answering, lets requests under way finish (up to a second), and frees the port. */
    @Override
    public void close() {
        server.stop(1);
        pool.shutdown();
        try {
            pool.awaitTermination(2, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private void handle(HttpExchange ex) throws IOException {
        try (ex) {
            String path = ex.getRequestURI().getRawPath();
            Map<String, String> query = query(ex.getRequestURI().getRawQuery());
            String offered = ex.getRequestHeaders().getFirst(KEY_HEADER);
            if (offered == null) offered = query.get("k");
            boolean guarded = !ASSETS.containsKey(path) || path.equals("/");
            long length = -1;
            String declared = ex.getRequestHeaders().getFirst("Content-Length");
            if (declared != null) {
                try {
                    length = Long.parseLong(declared.trim());
                } catch (NumberFormatException e) {
                    length = Long.MAX_VALUE;
                }
            }
            Gate.Refusal no = gate.check(ex.getRequestMethod(), ex.getRequestHeaders().getFirst("Host"),
                    ex.getRequestHeaders().getFirst("Origin"), offered, guarded, length);
            if (no != null) {
                error(ex, no.status(), no.message());
                return;
            }
            try {
                route(ex, path, query);
            } catch (Refused e) {
                error(ex, e.status, e.getMessage());
            } catch (TooLarge e) {
                error(ex, 413, e.getMessage());
            } catch (RuntimeException e) {
                error(ex, 500, "internal error: " + e + "; please report this with the model and claims");
            }
        }
    }

    private static final class TooLarge extends Exception {
        TooLarge(String message) {
            super(message);
        }
    }

    private void route(HttpExchange ex, String path, Map<String, String> q) throws IOException, Refused, TooLarge {
        String method = ex.getRequestMethod();
        if (method.equals("GET") && ASSETS.containsKey(path)) {
            String file = path.equals("/") ? "/index.html" : path;
            try (InputStream in = Workbench.class.getResourceAsStream("/plumbline/serve" + file)) {
                if (in == null) throw new Refused(500, "the page's file " + file + " is missing from the jar");
                send(ex, 200, ASSETS.get(path), in.readAllBytes(), null);
            }
            return;
        }
        if (!path.startsWith("/api/")) throw new Refused(404, "no page " + path);
        String[] parts = path.substring(5).split("/");
        switch (method + " " + parts[0]) {
            case "GET files" -> json(ex, api.files());
            case "GET file" -> json(ex, api.open(q.get("name")));
            case "PUT file" -> {
                Map<String, Object> body = body(ex);
                json(ex, api.save(q.get("name"), text(body, "text"), "1".equals(q.get("replace"))));
            }
            case "POST model" -> {
                Map<String, Object> body = body(ex);
                json(ex, api.model(text(body, "name"), text(body, "text")));
            }
            case "POST template" -> {
                Map<String, Object> body = body(ex);
                json(ex, api.template(text(body, "name"), text(body, "text")));
            }
            case "POST check" -> {
                Map<String, Object> body = body(ex);
                Object listed = body.get("claims");
                if (listed != null && !(listed instanceof List<?>)) throw new Refused(400, "'claims' is a list of {name, text}");
                List<?> claims = listed == null ? List.of() : (List<?>) listed;
                Object tol = body.get("tolerance");
                json(ex, api.check(text(body, "name"), text(body, "text"), claims, tol == null ? "" : String.valueOf(tol)));
            }
            case "GET run" -> runFile(ex, parts, q);
            default -> throw new Refused(404, "no API " + method + " " + path);
        }
    }

    /** /api/run/ID/results.json, /api/run/ID/report.pdf, /api/run/ID/figures?set=S, /api/run/ID/figure/FILE?set=S */
    private void runFile(HttpExchange ex, String[] parts, Map<String, String> q) throws IOException, Refused {
        if (parts.length < 3) throw new Refused(404, "no such check file");
        Api.CheckRun r = api.run(parts[1]);
        boolean download = "1".equals(q.get("download"));
        switch (parts[2]) {
            case "results.json" -> send(ex, 200, "application/json; charset=utf-8", r.json,
                    download ? r.stem + "-results.json" : null);
            case "report.pdf" -> send(ex, 200, "application/pdf", r.pdf(), download ? r.stem + "-report.pdf" : null);
            case "figures" -> json(ex, ModelView.map("files", List.copyOf(r.figures(q.getOrDefault("set", "")).keySet())));
            case "figure" -> {
                byte[] png = parts.length > 3 ? r.figures(q.getOrDefault("set", "")).get(parts[3]) : null;
                if (png == null) throw new Refused(404, "no such figure");
                send(ex, 200, "image/png", png, null);
            }
            default -> throw new Refused(404, "no such check file");
        }
    }

    private static String text(Map<String, Object> body, String key) throws Refused {
        Object v = body.get(key);
        if (!(v instanceof String s)) throw new Refused(400, "the request lacks '" + key + "'");
        return s;
    }

    private static Map<String, Object> body(HttpExchange ex) throws IOException, Refused, TooLarge {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        try (InputStream in = ex.getRequestBody()) {
            byte[] buf = new byte[65536];
            for (int n; (n = in.read(buf)) > 0; ) {
                b.write(buf, 0, n);
                // a body sent without its length is read only up to the limit
                if (b.size() > Gate.MAX_BODY_BYTES) throw new TooLarge("the request is over " + Gate.MAX_BODY_BYTES + " bytes");
            }
        }
        try {
            return OutputFiles.parseJson(b.toString(StandardCharsets.UTF_8));
        } catch (IOException | RuntimeException e) {
            throw new Refused(400, "the request is not a JSON object");
        }
    }

    private static void json(HttpExchange ex, Map<String, Object> body) throws IOException {
        send(ex, 200, "application/json; charset=utf-8", OutputFiles.json(body, false), null);
    }

    private static void error(HttpExchange ex, int status, String message) throws IOException {
        send(ex, status, "application/json; charset=utf-8", OutputFiles.json(ModelView.map("error", message), false), null);
    }

    private static void send(HttpExchange ex, int status, String type, byte[] bytes, String attachment) throws IOException {
        var h = ex.getResponseHeaders();
        h.set("Content-Type", type);
        h.set("Cache-Control", "no-store");
        h.set("X-Content-Type-Options", "nosniff");
        h.set("Referrer-Policy", "no-referrer");
        h.set("X-Frame-Options", "DENY");
        h.set("Content-Security-Policy", "default-src 'none'; script-src 'self'; style-src 'self'; img-src 'self' blob:; "
                + "connect-src 'self'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'");
        if (attachment != null) h.set("Content-Disposition", "attachment; filename=\"" + attachment + "\"");
        boolean head = ex.getRequestMethod().equals("HEAD");
        ex.sendResponseHeaders(status, head ? -1 : bytes.length == 0 ? -1 : bytes.length);
        if (!head && bytes.length > 0) {
            try (OutputStream out = ex.getResponseBody()) {
                out.write(bytes);
            }
        }
    }

    static Map<String, String> query(String raw) {
        Map<String, String> out = new HashMap<>();
        if (raw == null) return out;
        for (String pair : raw.split("&")) {
            int eq = pair.indexOf('=');
            if (eq <= 0) continue;
            out.put(URLDecoder.decode(pair.substring(0, eq), StandardCharsets.UTF_8),
                    URLDecoder.decode(pair.substring(eq + 1), StandardCharsets.UTF_8));
        }
        return out;
    }
}
