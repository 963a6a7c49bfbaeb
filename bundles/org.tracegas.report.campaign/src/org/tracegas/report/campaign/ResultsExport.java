package org.tracegas.report.campaign;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestOutputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;

import org.tracegas.store.ResultRow;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Writes a project's stored results as CSV ({@link ResultsCsv}) to a file, whole or not at all, and records the
 * export in the audit trail with the SHA-256 of the bytes written: the runner's {@code results-export} and the
 * workbench's File → Export results both export through here.
 */
public final class ResultsExport {

    /**
     * What an export wrote.
     *
     * @param results how many results
     * @param sha256  SHA-256 of the file's bytes, hex
     */
    public record Written(int results, String sha256) {
    }

    private ResultsExport() {
    }

    /**
     * Writes the project's results to {@code out} and records the export; a file whose export cannot be
     * recorded is removed again, so that no unrecorded copy is left behind.
     *
     * @throws IOException if the file cannot be written (nothing is then left at {@code out} or recorded)
     * @throws org.tracegas.store.AccessDeniedException without read access to the project
     */
    public static Written write(WorkspaceStore store, Session actor, String projectId, Path out) throws IOException {
        List<ResultRow> rows = store.analyses().rows(actor, projectId);
        MessageDigest sha256 = sha256();
        int[] written = new int[1];
        WholeFile.write(out, stream -> {
            Writer w = new OutputStreamWriter(new DigestOutputStream(stream, sha256), StandardCharsets.UTF_8);
            written[0] = ResultsCsv.write(rows, id -> store.versions().version(id), w);
            w.flush();
        });
        String hex = HexFormat.of().formatHex(sha256.digest());
        try {
            store.audit().recordExport(actor, projectId, out.getFileName().toString(), written[0], hex);
        } catch (RuntimeException e) {
            Files.deleteIfExists(out);
            throw e;
        }
        return new Written(written[0], hex);
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
