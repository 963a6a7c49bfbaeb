-- Batches of work shared by several runner processes: each unit is claimed under a lease and completed
-- together with the measurements it produced. Written for H2 2.x and PostgreSQL 14+ alike, as V1.
CREATE TABLE work_batch (
  id          VARCHAR(36) PRIMARY KEY,
  project_id  VARCHAR(36) NOT NULL REFERENCES project (id),
  description VARCHAR(4000) NOT NULL,
  unit_count  INTEGER NOT NULL,
  created_by  VARCHAR(36) NOT NULL REFERENCES app_user (id),
  created_at  TIMESTAMP WITH TIME ZONE NOT NULL
);

-- attempt counts the claims; a claim is identified by (claimed_by, attempt)
CREATE TABLE work_unit (
  batch_id    VARCHAR(36) NOT NULL REFERENCES work_batch (id),
  seq         INTEGER NOT NULL,
  payload     VARCHAR(4000) NOT NULL,
  state       VARCHAR(10) NOT NULL CHECK (state IN ('OPEN', 'CLAIMED', 'DONE')),
  claimed_by  VARCHAR(200),
  lease_until TIMESTAMP WITH TIME ZONE,
  done_at     TIMESTAMP WITH TIME ZONE,
  attempt     INTEGER NOT NULL,
  PRIMARY KEY (batch_id, seq)
);
CREATE INDEX work_unit_claimable ON work_unit (batch_id, state, seq);

-- a measurement is produced by at most one unit
CREATE TABLE work_unit_measurement (
  measurement_id VARCHAR(36) PRIMARY KEY REFERENCES measurement (id),
  batch_id       VARCHAR(36) NOT NULL,
  seq            INTEGER NOT NULL,
  FOREIGN KEY (batch_id, seq) REFERENCES work_unit (batch_id, seq)
);
CREATE INDEX work_unit_measurement_unit ON work_unit_measurement (batch_id, seq);
