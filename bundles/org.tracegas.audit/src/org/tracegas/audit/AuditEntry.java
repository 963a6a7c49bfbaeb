package org.tracegas.audit;

import java.util.Objects;

/**
 * What the caller asks to be recorded: who did what to which version of which object, with the prior
 * and new values (21 CFR 11.10(e): prior values are not obscured) and the reason for the change.
 * Time, sequence number and hashes are added by {@link AuditTrail#append}.
 *
 * <p>A reason is required when the change touches reviewed or approved data (EU GMP Annex 11 section 9:
 * "reason recorded"); the caller states this through {@code touchesApprovedData}.
 *
 * @param userId              the acting user's id, not blank
 * @param action              what was done
 * @param objectType          kind of object, e.g. "result", not blank
 * @param objectId            id of the object, not blank
 * @param objectVersion       version of the object after the action (0 when it has none), not negative
 * @param oldValue            prior values (e.g. {@link AuditValues#canonical} text), or null
 * @param newValue            new values, or null
 * @param reason              why the change was made; required when {@code touchesApprovedData}
 * @param touchesApprovedData whether the object was already reviewed or approved
 */
public record AuditEntry(String userId, AuditAction action, String objectType, String objectId,
        long objectVersion, String oldValue, String newValue, String reason, boolean touchesApprovedData) {

    /** Longest accepted user id, object type (characters). */
    public static final int MAX_NAME_LENGTH = 200;
    /** Longest accepted object id (characters). */
    public static final int MAX_OBJECT_ID_LENGTH = 400;

    /**
     * @throws IllegalArgumentException naming the field that is blank, too long or missing
     */
    public AuditEntry {
        requireText("userId", userId, MAX_NAME_LENGTH);
        Objects.requireNonNull(action, "action");
        requireText("objectType", objectType, MAX_NAME_LENGTH);
        requireText("objectId", objectId, MAX_OBJECT_ID_LENGTH);
        if (objectVersion < 0) {
            throw new IllegalArgumentException("objectVersion: must not be negative, was " + objectVersion);
        }
        if (touchesApprovedData && (reason == null || reason.isBlank())) {
            throw new IllegalArgumentException("reason: required because " + objectType + " " + objectId
                    + " was already reviewed or approved (EU GMP Annex 11 section 9)");
        }
    }

    /** Starts an entry; version 0, no values, no reason, not touching approved data. */
    public static Builder builder(String userId, AuditAction action, String objectType, String objectId) {
        return new Builder(userId, action, objectType, objectId);
    }

    static void requireText(String field, String value, int maxLength) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + ": must not be blank");
        }
        if (value.length() > maxLength) {
            throw new IllegalArgumentException(field + ": longer than " + maxLength + " characters");
        }
    }

    /** Mutable helper that assembles an {@link AuditEntry}; not thread-safe. */
    public static final class Builder {
        private final String userId;
        private final AuditAction action;
        private final String objectType;
        private final String objectId;
        private long objectVersion;
        private String oldValue;
        private String newValue;
        private String reason;
        private boolean touchesApprovedData;

        private Builder(String userId, AuditAction action, String objectType, String objectId) {
            this.userId = userId;
            this.action = action;
            this.objectType = objectType;
            this.objectId = objectId;
        }

        public Builder version(long version) {
            this.objectVersion = version;
            return this;
        }

        public Builder oldValue(String value) {
            this.oldValue = value;
            return this;
        }

        public Builder newValue(String value) {
            this.newValue = value;
            return this;
        }

        public Builder reason(String why) {
            this.reason = why;
            return this;
        }

        /** Marks the change as touching reviewed or approved data, which makes a reason mandatory. */
        public Builder touchesApprovedData(boolean touches) {
            this.touchesApprovedData = touches;
            return this;
        }

        /** @throws IllegalArgumentException as {@link AuditEntry#AuditEntry} */
        public AuditEntry build() {
            return new AuditEntry(userId, action, objectType, objectId, objectVersion, oldValue, newValue,
                    reason, touchesApprovedData);
        }
    }
}
