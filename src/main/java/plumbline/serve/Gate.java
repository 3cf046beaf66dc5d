package plumbline.serve;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.Locale;

/**
 * Who may ask the workbench for what. The server listens on the loopback address only, but a
 * web page from anywhere can still make the checker's browser send requests to it; so a
 * request is answered only when its Host names this server (a page that rebinds its own DNS
 * name to 127.0.0.1 sends its own name), its Origin, when sent, is this server's (a form on
 * another site sends that site's), and, for the API, it carries the key printed in the
 * workbench's address (which another site cannot read).
 */
final class Gate {

    /** Largest request body accepted: a model or claims file of some thousand lines is far smaller. */
    static final int MAX_BODY_BYTES = 4 * 1024 * 1024;

    /** Why a request is refused: the HTTP status and a sentence for the page. */
    record Refusal(int status, String message) {
    }

    private final int port;
    private final byte[] key;

    Gate(int port, String key) {
        this.port = port;
        this.key = key.getBytes(StandardCharsets.US_ASCII);
    }

    /**
     * @param host         the Host header (null when absent)
     * @param origin       the Origin header (null when absent)
     * @param offeredKey   the key in the X-Plumbline-Key header or the k= query parameter (null when absent)
     * @param needsKey     whether the path is guarded by the key (the API and the page; not the page's static code)
     * @param contentBytes the declared body length, -1 when not declared
     * @return null when the request may be answered, else why not
     */
    Refusal check(String method, String host, String origin, String offeredKey, boolean needsKey, long contentBytes) {
        if (!method.equals("GET") && !method.equals("POST") && !method.equals("PUT") && !method.equals("HEAD")) {
            return new Refusal(405, "method " + method + " is not used by the workbench");
        }
        if (host == null || !ownHost(host)) {
            return new Refusal(403, "the Host header '" + host + "' is not this workbench's (127.0.0.1:" + port
                    + " or localhost:" + port + ")");
        }
        if (origin != null && !ownOrigin(origin)) {
            return new Refusal(403, "requests from the page at '" + origin + "' are refused; only the workbench's own page may ask");
        }
        if (needsKey && (offeredKey == null || !MessageDigest.isEqual(key, offeredKey.getBytes(StandardCharsets.US_ASCII)))) {
            return new Refusal(403, "the access key is missing or wrong; open the address the serve command printed");
        }
        if (contentBytes > MAX_BODY_BYTES) {
            return new Refusal(413, "the request holds " + contentBytes + " bytes; at most " + MAX_BODY_BYTES + " are read");
        }
        return null;
    }

    boolean ownHost(String host) {
        String h = host.trim().toLowerCase(Locale.ROOT);
        return h.equals("127.0.0.1:" + port) || h.equals("localhost:" + port);
    }

    boolean ownOrigin(String origin) {
        String o = origin.trim().toLowerCase(Locale.ROOT);
        return o.equals("http://127.0.0.1:" + port) || o.equals("http://localhost:" + port);
    }
}
