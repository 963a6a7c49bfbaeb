-- A result corrected to the sample cell's conditions keeps what it was corrected with, each value with where it
-- came from: the cell's temperature, pressure and path, the references' temperature and pressure, the path of the
-- fit, the factor applied, and the transform's noise-correlation factor that widened its uncertainty. Results
-- recorded before, or of a method whose references carry no conditions, have none (NULL). Written for H2 2.x and
-- PostgreSQL 14+ alike, as V1.
ALTER TABLE analysis_result ADD COLUMN cell_temperature DOUBLE PRECISION;
ALTER TABLE analysis_result ADD COLUMN cell_temperature_origin VARCHAR(40);
ALTER TABLE analysis_result ADD COLUMN cell_pressure DOUBLE PRECISION;
ALTER TABLE analysis_result ADD COLUMN cell_pressure_origin VARCHAR(40);
ALTER TABLE analysis_result ADD COLUMN path_length DOUBLE PRECISION;
ALTER TABLE analysis_result ADD COLUMN path_length_origin VARCHAR(40);
ALTER TABLE analysis_result ADD COLUMN reference_temperature DOUBLE PRECISION;
ALTER TABLE analysis_result ADD COLUMN reference_pressure DOUBLE PRECISION;
ALTER TABLE analysis_result ADD COLUMN fit_path_length DOUBLE PRECISION;
ALTER TABLE analysis_result ADD COLUMN correction_factor DOUBLE PRECISION;
ALTER TABLE analysis_result ADD COLUMN noise_factor DOUBLE PRECISION;
ALTER TABLE analysis_result ADD COLUMN noise_factor_origin VARCHAR(200);
