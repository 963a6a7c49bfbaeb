-- Where and with what a campaign measures: a client's sites (plants), each with its emission sources (stacks,
-- ducts, sampling ports), and the lab's instruments with the optical figures a result depends on. A project may
-- name the source it measures and a measurement the instrument that made it; both links are tables of their own,
-- so that projects and measurements stored before keep their rows (and their audit bindings) unchanged and
-- simply have none. Written for H2 2.x and PostgreSQL 14+ alike, as V1.
CREATE TABLE site (
  id          VARCHAR(36) PRIMARY KEY,
  client_id   VARCHAR(36) NOT NULL REFERENCES client (id),
  name        VARCHAR(200) NOT NULL,
  description VARCHAR(2000) NOT NULL,
  row_version BIGINT NOT NULL,
  UNIQUE (client_id, name)
);

CREATE TABLE emission_source (
  id          VARCHAR(36) PRIMARY KEY,
  site_id     VARCHAR(36) NOT NULL REFERENCES site (id),
  name        VARCHAR(200) NOT NULL,
  description VARCHAR(2000) NOT NULL,
  row_version BIGINT NOT NULL,
  UNIQUE (site_id, name)
);

-- laser_wavenumber in cm-1, max_path_difference in cm, field_of_view (half-angle, NULL when not known) in mrad,
-- cell_path_length in m
CREATE TABLE instrument (
  id                  VARCHAR(36) PRIMARY KEY,
  name                VARCHAR(200) NOT NULL,
  serial_number       VARCHAR(100) NOT NULL,
  laser_wavenumber    DOUBLE PRECISION NOT NULL,
  max_path_difference DOUBLE PRECISION NOT NULL,
  field_of_view       DOUBLE PRECISION,
  cell_path_length    DOUBLE PRECISION NOT NULL,
  row_version         BIGINT NOT NULL,
  UNIQUE (name, serial_number)
);

CREATE TABLE project_source (
  project_id VARCHAR(36) PRIMARY KEY REFERENCES project (id),
  source_id  VARCHAR(36) NOT NULL REFERENCES emission_source (id)
);

CREATE TABLE measurement_instrument (
  measurement_id VARCHAR(36) PRIMARY KEY REFERENCES measurement (id),
  instrument_id  VARCHAR(36) NOT NULL REFERENCES instrument (id)
);
CREATE INDEX measurement_instrument_by_instrument ON measurement_instrument (instrument_id);
