package plumbline.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The workbench's refusal rules, one by one (common practice for local web tools: loopback
 * only, Host and Origin checked against DNS rebinding and cross-site requests, a secret in
 * the address, bounded requests).
 */
class GateTest {

    static final int PORT = 47123;
    final Gate gate = new Gate(PORT, "secret-key-123");

    @Test
    void ownRequestWithTheKeyPasses() {
        assertNull(gate.check("GET", "127.0.0.1:" + PORT, null, "secret-key-123", true, -1));
        assertNull(gate.check("POST", "localhost:" + PORT, "http://localhost:" + PORT, "secret-key-123", true, 100));
        assertNull(gate.check("POST", "LOCALHOST:" + PORT, "http://127.0.0.1:" + PORT, "secret-key-123", true, 100));
    }

    @Test
    void aForeignHostIsRefused() {
        // a rebound DNS name reaches 127.0.0.1 but sends its own name as Host
        assertEquals(403, gate.check("GET", "attacker.example:" + PORT, null, "secret-key-123", true, -1).status());
        assertEquals(403, gate.check("GET", "127.0.0.1:" + (PORT + 1), null, "secret-key-123", true, -1).status());
        assertEquals(403, gate.check("GET", "127.0.0.1", null, "secret-key-123", true, -1).status());
        assertEquals(403, gate.check("GET", null, null, "secret-key-123", true, -1).status());
        // the static page code is refused too under a foreign Host
        assertEquals(403, gate.check("GET", "attacker.example:" + PORT, null, null, false, -1).status());
    }

    @Test
    void aForeignOriginIsRefused() {
        Gate.Refusal r = gate.check("POST", "127.0.0.1:" + PORT, "https://attacker.example", "secret-key-123", true, 10);
        assertEquals(403, r.status());
        assertTrue(r.message().contains("attacker.example"), r.message());
        assertEquals(403, gate.check("POST", "127.0.0.1:" + PORT, "null", "secret-key-123", true, 10).status());
        assertEquals(403, gate.check("POST", "127.0.0.1:" + PORT, "http://127.0.0.1:" + (PORT + 1), "secret-key-123", true, 10).status());
    }

    @Test
    void theKeyGuardsTheApi() {
        assertEquals(403, gate.check("GET", "127.0.0.1:" + PORT, null, null, true, -1).status());
        assertEquals(403, gate.check("GET", "127.0.0.1:" + PORT, null, "secret-key-124", true, -1).status());
        assertEquals(403, gate.check("GET", "127.0.0.1:" + PORT, null, "secret-key-12", true, -1).status());
        assertNull(gate.check("GET", "127.0.0.1:" + PORT, null, null, false, -1), "the page's own code needs no key");
    }

    @Test
    void oversizedBodiesAndOtherMethodsAreRefused() {
        assertNull(gate.check("POST", "127.0.0.1:" + PORT, null, "secret-key-123", true, Gate.MAX_BODY_BYTES));
        assertEquals(413, gate.check("POST", "127.0.0.1:" + PORT, null, "secret-key-123", true, Gate.MAX_BODY_BYTES + 1L).status());
        assertEquals(405, gate.check("DELETE", "127.0.0.1:" + PORT, null, "secret-key-123", true, -1).status());
        assertEquals(405, gate.check("TRACE", "127.0.0.1:" + PORT, null, "secret-key-123", true, -1).status());
    }
}
