-- A batch that quantifies with a method version names it, so that the store can refuse a second unfinished
-- batch of the same project and method version (both would store the same samples' results). Batches of
-- other work leave it NULL. Written for H2 2.x and PostgreSQL 14+ alike, as V1.
ALTER TABLE work_batch ADD COLUMN method_version_id VARCHAR(36);
ALTER TABLE work_batch ADD CONSTRAINT work_batch_method_version
  FOREIGN KEY (method_version_id) REFERENCES content_version (id);
CREATE INDEX work_batch_project_method ON work_batch (project_id, method_version_id);
