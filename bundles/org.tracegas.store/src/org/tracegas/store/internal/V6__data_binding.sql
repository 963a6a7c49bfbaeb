-- Bindings of stored data rows to the audit records that vouch for them: each audit record that wrote or
-- changed data rows lists them here, in order (ordinal), with the SHA-256 of each row's canonical encoding
-- (org.tracegas.audit.CanonicalRow) as it was committed; the record's content_sha256 holds the digest of its
-- list, so the chain covers the list and the list covers the rows. A row's newest binding is the one with the
-- highest audit_seq. Written for H2 2.x and PostgreSQL 14+ alike, as V1.
CREATE TABLE data_binding (
  audit_seq  BIGINT NOT NULL,
  ordinal    INTEGER NOT NULL,
  kind       VARCHAR(40) NOT NULL,
  row_key    VARCHAR(200) NOT NULL,
  row_sha256 CHAR(64) NOT NULL,
  PRIMARY KEY (audit_seq, ordinal)
);
CREATE INDEX data_binding_row ON data_binding (kind, row_key, audit_seq);
