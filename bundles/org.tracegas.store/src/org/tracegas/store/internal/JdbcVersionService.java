package org.tracegas.store.internal;

import java.nio.charset.StandardCharsets;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Role;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.FrozenVersionException;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.Session;
import org.tracegas.store.VersionDiff;
import org.tracegas.store.VersionService;

final class JdbcVersionService implements VersionService {

    private static final String SELECT_VERSIONS = "SELECT v.id, i.kind, v.item_id, i.name, v.number, v.parent_id,"
            + " v.author_id, v.reason, v.created_at, v.content_hash, v.frozen, v.row_version"
            + " FROM content_version v JOIN versioned_item i ON i.id = v.item_id";

    private static final Role[] EDITORS = {Role.ANALYST, Role.QUALITY_MANAGER};

    private final Transactions transactions;
    /**
     * The kind of each version this store has read frozen. A frozen version never changes again ({@link
     * #updateDraft} refuses it, nothing unfreezes or deletes a version), so the results stored after it need not
     * read its row again: over a long batch that read was a fifth of each block's storing, its row long gone
     * from the database's cache.
     */
    private final Map<String, VersionKind> frozen = new ConcurrentHashMap<>();

    JdbcVersionService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public ContentVersion create(Session actor, VersionKind kind, String name, String content, String reason) {
        if (kind == null) {
            throw new IllegalArgumentException("kind must not be null");
        }
        JdbcUserService.requireText("name", name);
        requireContent(content, reason);
        return transactions.run("creating " + kind + " " + name, tx -> {
            Guard.requireRole(tx, actor, "create a " + kind.name().toLowerCase(), EDITORS);
            String itemId = UUID.randomUUID().toString();
            tx.update("INSERT INTO versioned_item (id, kind, name) VALUES (?, ?, ?)", itemId, kind, name);
            tx.wrote(DataKind.VERSIONED_ITEM, itemId);
            return insertVersion(tx, actor, itemId, 1, null, content, reason);
        });
    }

    @Override
    public ContentVersion revise(Session actor, String parentVersionId, String content, String reason) {
        requireContent(content, reason);
        return transactions.run("revising version " + parentVersionId, tx -> {
            ContentVersion parent = load(tx, parentVersionId);
            Guard.requireRole(tx, actor, "revise a " + parent.getKind().name().toLowerCase(), EDITORS);
            int number = tx.queryOne("SELECT MAX(number) FROM content_version WHERE item_id = ?", rs -> rs.getInt(1),
                    parent.getItemId()).orElseThrow() + 1;
            return insertVersion(tx, actor, parent.getItemId(), number, parent.getId(), content, reason);
        });
    }

    @Override
    public ContentVersion updateDraft(Session actor, String versionId, long expectedVersion, String content,
            String reason) {
        requireContent(content, reason);
        return transactions.run("changing draft version " + versionId, tx -> {
            ContentVersion before = load(tx, versionId);
            Guard.requireRole(tx, actor, "change a " + before.getKind().name().toLowerCase(), EDITORS);
            if (before.isFrozen()) {
                throw new FrozenVersionException(versionId, before.getNumber());
            }
            String oldContent = contentOf(tx, versionId);
            RowVersions.update(tx, "content_version", objectType(before.getKind()), versionId, expectedVersion,
                    "content = ?, content_hash = ?, reason = ?, author_id = ?", content, hash(content), reason,
                    actor.userId());
            tx.wrote(DataKind.CONTENT_VERSION, versionId);
            ContentVersion after = load(tx, versionId);
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, objectType(after.getKind()), versionId)
                    .version(after.getRowVersion()).oldValue(oldContent).newValue(content).reason(reason).build());
            return after;
        });
    }

    @Override
    public ContentVersion version(String versionId) {
        return transactions.run("reading version " + versionId, tx -> load(tx, versionId));
    }

    @Override
    public String content(String versionId) {
        return transactions.run("reading version " + versionId, tx -> contentOf(tx, versionId));
    }

    @Override
    public VersionDiff diff(String olderVersionId, String newerVersionId) {
        return transactions.run("comparing versions", tx -> VersionDiff.of(olderVersionId,
                contentOf(tx, olderVersionId), newerVersionId, contentOf(tx, newerVersionId)));
    }

    /**
     * Checks that the version a result names exists and is of the expected kind, and freezes it if it is not
     * frozen yet.
     *
     * @param field the result's field naming the version, for the error message
     * @throws NoSuchObjectException    if there is no such version
     * @throws IllegalArgumentException if the version is of another kind
     */
    void requireUsableAndFreeze(Tx tx, String versionId, VersionKind expected, String field) throws SQLException {
        VersionKind kind = frozen.get(versionId);
        if (kind == null) {
            ContentVersion version = load(tx, versionId);
            kind = version.getKind();
            if (!version.isFrozen()) {
                freeze(tx, versionId);
            } else if (kind == expected) {
                // read frozen, so frozen by a committed transaction (this one freezes each version once, and
                // only after that read): remembering it cannot outlive a rollback
                frozen.put(versionId, kind);
            }
        }
        if (kind != expected) {
            throw new IllegalArgumentException(field + " " + versionId + " is a " + kind + " version, not a "
                    + expected + " version");
        }
    }

    /** Marks a version as used by a result; from then on it cannot change. */
    static void freeze(Tx tx, String versionId) throws SQLException {
        // bumping row_version makes a concurrent draft edit fail instead of changing a used version
        tx.update("UPDATE content_version SET frozen = TRUE, row_version = row_version + 1"
                + " WHERE id = ? AND frozen = FALSE", versionId);
    }

    static ContentVersion load(Tx tx, String versionId) throws SQLException {
        return tx.queryOne(SELECT_VERSIONS + " WHERE v.id = ?", JdbcVersionService::map, versionId)
                .orElseThrow(() -> new NoSuchObjectException("method or library version", versionId));
    }

    private static ContentVersion insertVersion(Tx tx, Session actor, String itemId, int number, String parentId,
            String content, String reason) throws SQLException {
        String id = UUID.randomUUID().toString();
        tx.update("INSERT INTO content_version (id, item_id, number, parent_id, author_id, reason, created_at,"
                + " content, content_hash, frozen, row_version) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, FALSE, 0)", id,
                itemId, number, parentId, actor.userId(), reason, Instant.now().truncatedTo(ChronoUnit.MICROS), content, hash(content));
        tx.wrote(DataKind.CONTENT_VERSION, id);
        ContentVersion created = load(tx, id);
        Map<String, Object> fields = new LinkedHashMap<>();
        fields.put("item", itemId);
        fields.put("number", number);
        fields.put("parent", parentId);
        fields.put("contentHash", created.getContentHash());
        tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, objectType(created.getKind()), id)
                .newValue(AuditValues.canonical(fields) + content).reason(reason).build());
        return created;
    }

    private static String contentOf(Tx tx, String versionId) throws SQLException {
        return tx.queryOne("SELECT content FROM content_version WHERE id = ?", rs -> rs.getString(1), versionId)
                .orElseThrow(() -> new NoSuchObjectException("method or library version", versionId));
    }

    private static ContentVersion map(ResultSet rs) throws SQLException {
        ContentVersion v = WorkspaceFactory.eINSTANCE.createContentVersion();
        v.setId(rs.getString("id"));
        v.setKind(VersionKind.valueOf(rs.getString("kind")));
        v.setItemId(rs.getString("item_id"));
        v.setItemName(rs.getString("name"));
        v.setNumber(rs.getInt("number"));
        v.setParentId(rs.getString("parent_id"));
        v.setAuthorId(rs.getString("author_id"));
        v.setReason(rs.getString("reason"));
        v.setCreated(Tx.instant(rs, "created_at"));
        v.setContentHash(rs.getString("content_hash"));
        v.setFrozen(rs.getBoolean("frozen"));
        v.setRowVersion(rs.getLong("row_version"));
        return v;
    }

    static String objectType(VersionKind kind) {
        return kind == VersionKind.METHOD ? "method-version" : "library-version";
    }

    /** SHA-256 of the canonical content as UTF-8. */
    static String hash(String content) {
        return SpectrumCodec.sha256Hex(content.getBytes(StandardCharsets.UTF_8));
    }

    private static void requireContent(String content, String reason) {
        if (content == null) {
            throw new IllegalArgumentException("content must not be null");
        }
        JdbcUserService.requireText("reason", reason);
    }

    @Override
    public Optional<ContentVersion> latest(VersionKind kind, String name) {
        if (kind == null) {
            throw new IllegalArgumentException("kind must not be null");
        }
        return transactions.run("finding the newest version of " + name, tx -> tx.queryOne(SELECT_VERSIONS
                + " WHERE i.kind = ? AND i.name = ? ORDER BY v.number DESC", JdbcVersionService::map, kind, name));
    }

    @Override
    public List<ContentVersion> latest(VersionKind kind) {
        if (kind == null) {
            throw new IllegalArgumentException("kind must not be null");
        }
        return transactions.run("listing the newest versions of each " + kind, tx -> tx.queryList(SELECT_VERSIONS
                + " WHERE i.kind = ? AND v.number = (SELECT MAX(w.number) FROM content_version w"
                + " WHERE w.item_id = v.item_id) ORDER BY i.name, i.id", JdbcVersionService::map, kind));
    }
}
