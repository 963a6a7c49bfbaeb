-- The lab's own files: each imported file is kept whole, addressed by the SHA-256 of its bytes, so that the
-- same file imported twice is recognised; each record of it becomes a measurement that names the file, its
-- title and its labels. A result made from a processed measurement names the processing recipe that ran, by
-- the SHA-256 of the recipe's canonical text, kept once. Written for H2 2.x and PostgreSQL 14+ alike, as V1.
CREATE TABLE raw_file (
  project_id  VARCHAR(36) NOT NULL REFERENCES project (id),
  sha256      CHAR(64) NOT NULL,
  file_name   VARCHAR(1000) NOT NULL,
  format      VARCHAR(100) NOT NULL,
  byte_count  BIGINT NOT NULL,
  content     BYTEA NOT NULL,
  imported_by VARCHAR(36) NOT NULL REFERENCES app_user (id),
  imported_at TIMESTAMP WITH TIME ZONE NOT NULL,
  PRIMARY KEY (project_id, sha256)
);

CREATE TABLE imported_measurement (
  measurement_id VARCHAR(36) PRIMARY KEY REFERENCES measurement (id),
  project_id     VARCHAR(36) NOT NULL,
  raw_sha256     CHAR(64) NOT NULL,
  record_index   INTEGER NOT NULL,
  title          VARCHAR(1000) NOT NULL,
  content        VARCHAR(20) NOT NULL,
  spectrum_id    VARCHAR(36) NOT NULL REFERENCES spectral_data (id),
  labels         VARCHAR NOT NULL,
  FOREIGN KEY (project_id, raw_sha256) REFERENCES raw_file (project_id, sha256),
  UNIQUE (project_id, raw_sha256, record_index)
);

CREATE TABLE processing_recipe (
  sha256 CHAR(64) PRIMARY KEY,
  text   VARCHAR NOT NULL
);

ALTER TABLE analysis_result ADD COLUMN recipe_sha256 CHAR(64);
ALTER TABLE analysis_result ADD CONSTRAINT analysis_result_recipe
  FOREIGN KEY (recipe_sha256) REFERENCES processing_recipe (sha256);
CREATE INDEX analysis_result_method ON analysis_result (project_id, method_version_id, measurement_id);
