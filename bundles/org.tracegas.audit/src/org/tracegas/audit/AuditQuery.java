package org.tracegas.audit;

import java.time.Instant;
import java.util.EnumSet;
import java.util.Set;

/**
 * Filter for reviewing the audit trail (EU GMP Annex 11 section 9: the trail is regularly reviewed).
 * Null or empty criteria match everything. Immutable.
 *
 * @param userId     acting user, or null
 * @param objectType object kind, or null
 * @param objectId   object id (only with objectType), or null
 * @param from       earliest record time, inclusive, or null
 * @param to         latest record time, exclusive, or null
 * @param actions    actions to include; empty for all
 */
public record AuditQuery(String userId, String objectType, String objectId, Instant from, Instant to,
        Set<AuditAction> actions) {

    /** @throws IllegalArgumentException when objectId is given without objectType, or from is not before to */
    public AuditQuery {
        if (objectId != null && objectType == null) {
            throw new IllegalArgumentException("objectType: required when objectId is given");
        }
        if (from != null && to != null && !from.isBefore(to)) {
            throw new IllegalArgumentException("from: " + from + " is not before to: " + to);
        }
        actions = actions == null || actions.isEmpty() ? Set.of() : Set.copyOf(actions);
    }

    /** A builder matching every record until narrowed. */
    public static Builder all() {
        return new Builder();
    }

    /** Mutable helper assembling a query; not thread-safe. */
    public static final class Builder {
        private String userId;
        private String objectType;
        private String objectId;
        private Instant from;
        private Instant to;
        private final Set<AuditAction> actions = EnumSet.noneOf(AuditAction.class);

        private Builder() {
        }

        public Builder user(String id) {
            this.userId = id;
            return this;
        }

        public Builder objectType(String type) {
            this.objectType = type;
            return this;
        }

        public Builder object(String type, String id) {
            this.objectType = type;
            this.objectId = id;
            return this;
        }

        /** Records with {@code from <= time < to}; either bound may be null. */
        public Builder between(Instant from, Instant to) {
            this.from = from;
            this.to = to;
            return this;
        }

        public Builder actions(AuditAction... wanted) {
            actions.addAll(Set.of(wanted));
            return this;
        }

        public AuditQuery build() {
            return new AuditQuery(userId, objectType, objectId, from, to, actions);
        }
    }
}
