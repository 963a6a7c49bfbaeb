package org.tracegas.audit.internal;

import java.util.List;

/**
 * DDL of the audit tables per database, in Java so that it travels with the classes wherever they are
 * packed. Every statement can be re-run without effect (IF NOT EXISTS, OR REPLACE).
 *
 * <p>Only sequential keys are indexed besides the object and time indexes for review: an index on the
 * random record ids or hashes would make every append touch random index pages (on H2's copy-on-write
 * store a page rewrite each). Record ids are random UUIDs; the verifier locates hashes by streaming.
 */
final class SchemaDdl {

    /** PostgreSQL 14 or later (CREATE OR REPLACE TRIGGER). */
    static final List<String> POSTGRESQL = List.of(
            """
            CREATE TABLE IF NOT EXISTS audit_record (
              seq            BIGINT PRIMARY KEY,
              record_id      VARCHAR(36) NOT NULL,
              recorded_at    TIMESTAMP(6) WITH TIME ZONE NOT NULL,
              user_id        VARCHAR(200) NOT NULL,
              action         VARCHAR(32) NOT NULL,
              object_type    VARCHAR(200) NOT NULL,
              object_id      VARCHAR(400) NOT NULL,
              object_version BIGINT NOT NULL,
              old_value      TEXT,
              new_value      TEXT,
              reason         TEXT,
              signer_name    VARCHAR(400),
              meaning        VARCHAR(32),
              content_sha256 CHAR(64),
              prev_hash      CHAR(64) NOT NULL,
              hash           CHAR(64) NOT NULL
            )
            """,
            """
            CREATE INDEX IF NOT EXISTS audit_record_object ON audit_record (object_type, object_id)
            """,
            """
            CREATE INDEX IF NOT EXISTS audit_record_time ON audit_record (recorded_at)
            """,
            """
            CREATE TABLE IF NOT EXISTS audit_chain_head (
              id             INT PRIMARY KEY CHECK (id = 1),
              last_seq       BIGINT NOT NULL,
              last_hash      CHAR(64) NOT NULL,
              last_record_id VARCHAR(36)
            )
            """,
            """
            INSERT INTO audit_chain_head (id, last_seq, last_hash)
            SELECT 1, 0, '0000000000000000000000000000000000000000000000000000000000000000'
            WHERE NOT EXISTS (SELECT 1 FROM audit_chain_head)
            """,
            """
            CREATE OR REPLACE FUNCTION audit_refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
            BEGIN
              RAISE EXCEPTION 'audit records are append-only: % on %.% refused', TG_OP, TG_TABLE_SCHEMA, TG_TABLE_NAME
                USING ERRCODE = 'insufficient_privilege';
            END
            $$
            """,
            """
            CREATE OR REPLACE FUNCTION audit_guard_head() RETURNS trigger LANGUAGE plpgsql AS $$
            DECLARE
              found_record BOOLEAN;
            BEGIN
              IF TG_OP <> 'UPDATE' THEN
                RAISE EXCEPTION 'audit chain head: % refused', TG_OP USING ERRCODE = 'insufficient_privilege';
              END IF;
              IF NEW.id <> OLD.id OR NEW.last_seq <= OLD.last_seq THEN
                RAISE EXCEPTION 'audit chain head: may only advance (from % to %)', OLD.last_seq, NEW.last_seq
                  USING ERRCODE = 'insufficient_privilege';
              END IF;
              EXECUTE format('SELECT EXISTS (SELECT 1 FROM %I.audit_record WHERE seq = $1 AND hash = $2)', TG_TABLE_SCHEMA)
                INTO found_record USING NEW.last_seq, NEW.last_hash;
              IF NOT found_record THEN
                RAISE EXCEPTION 'audit chain head: no stored record % with the given hash', NEW.last_seq
                  USING ERRCODE = 'insufficient_privilege';
              END IF;
              RETURN NEW;
            END
            $$
            """,
            """
            CREATE OR REPLACE TRIGGER audit_record_append_only BEFORE UPDATE OR DELETE ON audit_record
              FOR EACH ROW EXECUTE FUNCTION audit_refuse_change()
            """,
            """
            CREATE OR REPLACE TRIGGER audit_record_no_truncate BEFORE TRUNCATE ON audit_record
              FOR EACH STATEMENT EXECUTE FUNCTION audit_refuse_change()
            """,
            """
            CREATE OR REPLACE TRIGGER audit_chain_head_guard BEFORE UPDATE OR DELETE ON audit_chain_head
              FOR EACH ROW EXECUTE FUNCTION audit_guard_head()
            """,
            """
            CREATE OR REPLACE TRIGGER audit_chain_head_no_truncate BEFORE TRUNCATE ON audit_chain_head
              FOR EACH STATEMENT EXECUTE FUNCTION audit_refuse_change()
            """);

    /** H2 2.x; the triggers are Java classes of this package. */
    static final List<String> H2 = List.of(
            """
            CREATE TABLE IF NOT EXISTS audit_record (
              seq            BIGINT PRIMARY KEY,
              record_id      VARCHAR(36) NOT NULL,
              recorded_at    TIMESTAMP(6) WITH TIME ZONE NOT NULL,
              user_id        VARCHAR(200) NOT NULL,
              action         VARCHAR(32) NOT NULL,
              object_type    VARCHAR(200) NOT NULL,
              object_id      VARCHAR(400) NOT NULL,
              object_version BIGINT NOT NULL,
              old_value      VARCHAR,
              new_value      VARCHAR,
              reason         VARCHAR,
              signer_name    VARCHAR(400),
              meaning        VARCHAR(32),
              content_sha256 CHAR(64),
              prev_hash      CHAR(64) NOT NULL,
              hash           CHAR(64) NOT NULL
            )
            """,
            """
            CREATE INDEX IF NOT EXISTS audit_record_object ON audit_record (object_type, object_id)
            """,
            """
            CREATE INDEX IF NOT EXISTS audit_record_time ON audit_record (recorded_at)
            """,
            """
            CREATE TABLE IF NOT EXISTS audit_chain_head (
              id             INT PRIMARY KEY CHECK (id = 1),
              last_seq       BIGINT NOT NULL,
              last_hash      CHAR(64) NOT NULL,
              last_record_id VARCHAR(36)
            )
            """,
            """
            INSERT INTO audit_chain_head (id, last_seq, last_hash)
            SELECT 1, 0, '0000000000000000000000000000000000000000000000000000000000000000'
            WHERE NOT EXISTS (SELECT 1 FROM audit_chain_head)
            """,
            // H2 fires no trigger on TRUNCATE, but refuses to truncate a table that a foreign key references:
            // this always-empty table holds such keys.
            """
            CREATE TABLE IF NOT EXISTS audit_truncate_guard (
              record_seq BIGINT REFERENCES audit_record (seq),
              head_id    INT REFERENCES audit_chain_head (id)
            )
            """,
            """
            CREATE TRIGGER IF NOT EXISTS audit_record_append_only BEFORE UPDATE, DELETE ON audit_record
              FOR EACH ROW CALL 'org.tracegas.audit.internal.H2AppendOnlyTrigger'
            """,
            """
            CREATE TRIGGER IF NOT EXISTS audit_chain_head_guard BEFORE UPDATE, DELETE ON audit_chain_head
              FOR EACH ROW CALL 'org.tracegas.audit.internal.H2ChainHeadTrigger'
            """);

    private SchemaDdl() {
    }
}
