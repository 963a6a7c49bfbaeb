-- The reports issued from a project: each issue of a report is kept, with who issued it and when, the file it
-- was written to, the method and library versions it was made with and the SHA-256 of its canonical content,
-- which the review and approval signatures given on its report id are stored with. Written for H2 2.x and
-- PostgreSQL 14+ alike, as V1.
CREATE TABLE report (
  id                 VARCHAR(36) PRIMARY KEY,
  project_id         VARCHAR(36) NOT NULL REFERENCES project (id),
  report_id          VARCHAR(200) NOT NULL,
  title              VARCHAR(1000) NOT NULL,
  issued_at          TIMESTAMP WITH TIME ZONE NOT NULL,
  issued_by          VARCHAR(36) NOT NULL REFERENCES app_user (id),
  content_sha256     CHAR(64) NOT NULL,
  file_name          VARCHAR(1000) NOT NULL,
  page_count         INTEGER,
  method_version_id  VARCHAR(36) NOT NULL REFERENCES content_version (id),
  library_version_id VARCHAR(36) NOT NULL REFERENCES content_version (id)
);
CREATE INDEX report_project ON report (project_id, issued_at);
