package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class AuditEntryTest {

    @Test
    void reasonIsRequiredForApprovedData() {
        // EU GMP Annex 11 section 9: the reason for a change of GMP-relevant data is recorded
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> AuditEntry
                .builder("alice", AuditAction.CHANGE, "result", "r1").touchesApprovedData(true).reason("  ").build());
        assertTrue(e.getMessage().startsWith("reason:"), e.getMessage());
        AuditEntry ok = AuditEntry.builder("alice", AuditAction.CHANGE, "result", "r1").touchesApprovedData(true)
                .reason("wrong cell temperature entered").version(4).build();
        assertEquals(4, ok.objectVersion());
        assertEquals("wrong cell temperature entered", ok.reason());
    }

    @Test
    void namesTheWrongField() {
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> AuditEntry.builder(" ", AuditAction.CREATE, "result", "r1").build()).getMessage().startsWith("userId:"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> AuditEntry.builder("a", AuditAction.CREATE, "", "r1").build()).getMessage().startsWith("objectType:"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> AuditEntry.builder("a", AuditAction.CREATE, "result", "x".repeat(401)).build()).getMessage()
                        .startsWith("objectId:"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> AuditEntry.builder("a", AuditAction.CREATE, "result", "r").version(-1).build()).getMessage()
                        .startsWith("objectVersion:"));
        assertThrows(NullPointerException.class, () -> AuditEntry.builder("a", null, "result", "r").build());
    }
}
