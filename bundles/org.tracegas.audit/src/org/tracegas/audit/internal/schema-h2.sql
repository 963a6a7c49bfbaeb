-- Audit trail tables for H2 2.x. Statements are separated by lines holding only "/".
-- Re-running the script changes nothing (IF NOT EXISTS).
CREATE TABLE IF NOT EXISTS audit_record (
  seq            BIGINT PRIMARY KEY,
  record_id      VARCHAR(36) NOT NULL UNIQUE,
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
  hash           CHAR(64) NOT NULL UNIQUE
)
/
CREATE INDEX IF NOT EXISTS audit_record_object ON audit_record (object_type, object_id)
/
CREATE INDEX IF NOT EXISTS audit_record_time ON audit_record (recorded_at)
/
CREATE TABLE IF NOT EXISTS audit_chain_head (
  id             INT PRIMARY KEY CHECK (id = 1),
  last_seq       BIGINT NOT NULL,
  last_hash      CHAR(64) NOT NULL,
  last_record_id VARCHAR(36)
)
/
INSERT INTO audit_chain_head (id, last_seq, last_hash)
SELECT 1, 0, '0000000000000000000000000000000000000000000000000000000000000000'
WHERE NOT EXISTS (SELECT 1 FROM audit_chain_head)
/
-- H2 fires no trigger on TRUNCATE, but refuses to truncate a table that a foreign key references:
-- this always-empty table holds such keys.
CREATE TABLE IF NOT EXISTS audit_truncate_guard (
  record_seq BIGINT REFERENCES audit_record (seq),
  head_id    INT REFERENCES audit_chain_head (id)
)
/
CREATE TRIGGER IF NOT EXISTS audit_record_append_only BEFORE UPDATE, DELETE ON audit_record
  FOR EACH ROW CALL 'org.tracegas.audit.internal.H2AppendOnlyTrigger'
/
CREATE TRIGGER IF NOT EXISTS audit_chain_head_guard BEFORE UPDATE, DELETE ON audit_chain_head
  FOR EACH ROW CALL 'org.tracegas.audit.internal.H2ChainHeadTrigger'
