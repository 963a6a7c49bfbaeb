package org.tracegas.audit;

import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;

/** Builds a realistic chain: creations, changes with and without reasons, deletions and signatures. */
final class ChainFixture {

    private ChainFixture() {
    }

    /** Appends {@code n} records in the caller's transaction (not committed). */
    static void build(Connection c, int n, Random rnd) throws SQLException, SignatureRefusedException {
        SignatureService signatures = new SignatureService((user, password) -> new String(password).equals(user + "-pw"));
        for (int i = 1; i <= n; i++) {
            String id = "r" + (i % 7);
            if (i % 10 == 0) {
                String signer = "reviewer" + (i % 3);
                signatures.sign(c, new SignatureRequest(signer, signer, (signer + "-pw").toCharArray(), "Reviewer " + i,
                        SignatureMeaning.REVIEWED, "result", id, i, ("content " + i).getBytes(StandardCharsets.UTF_8),
                        "analyst", null));
                continue;
            }
            Map<String, Object> oldValues = new TreeMap<>();
            oldValues.put("ppm", rnd.nextInt(1000) / 10.0);
            oldValues.put("component", "CO");
            Map<String, Object> newValues = new TreeMap<>(oldValues);
            newValues.put("ppm", rnd.nextInt(1000) / 10.0);
            AuditAction action = i % 7 == 1 ? AuditAction.CREATE : i % 13 == 0 ? AuditAction.DELETE : AuditAction.CHANGE;
            boolean approved = i % 4 == 0;
            AuditTrail.append(c, AuditEntry.builder("analyst" + (i % 2), action, "result", id).version(i)
                    .oldValue(action == AuditAction.CREATE ? null : AuditValues.canonical(oldValues))
                    .newValue(action == AuditAction.DELETE ? null : AuditValues.canonical(newValues))
                    .touchesApprovedData(approved).reason(approved ? "transcription error, line " + i : null).build());
        }
    }
}
