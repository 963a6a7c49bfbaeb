-- Outcomes of QA checks, stored with the campaign; never changed once written.
CREATE TABLE qa_check (
  id                VARCHAR(36) PRIMARY KEY,
  project_id        VARCHAR(36) NOT NULL REFERENCES project (id),
  method_version_id VARCHAR(36) NOT NULL REFERENCES content_version (id),
  seq               INTEGER NOT NULL,
  check_name        VARCHAR(400) NOT NULL,
  passed            BOOLEAN NOT NULL,
  measured          DOUBLE PRECISION NOT NULL,
  unit              VARCHAR(40) NOT NULL,
  lower_limit       DOUBLE PRECISION NOT NULL,
  upper_limit       DOUBLE PRECISION NOT NULL,
  rule              VARCHAR(4000) NOT NULL,
  source            VARCHAR(2000) NOT NULL,
  recorded_by       VARCHAR(36) NOT NULL REFERENCES app_user (id),
  recorded_at       TIMESTAMP WITH TIME ZONE NOT NULL
);

CREATE INDEX qa_check_project ON qa_check (project_id, recorded_at, seq);
