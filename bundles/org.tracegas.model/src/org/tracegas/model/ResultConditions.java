package org.tracegas.model;

/**
 * What a result was corrected with and how its uncertainty was widened, each value with where it came from: the
 * correction of a concentration fitted at the references' cell conditions to the sample cell (EPA FTIR Protocol
 * section 11.2, C_corr = (L_r/L_s)(T_s/T_r)(p_r/p_s) C_calc, whose factor is {@link #correctionFactor()}), and
 * the noise-correlation factor F of the transform that made the spectrum (the standard uncertainty is the
 * least-squares one times sqrt(F)).
 *
 * @param cellTemperatureK      T_s, the sample cell's temperature in K
 * @param temperatureOrigin     where T_s came from, e.g. "file-label", "instrument-channel", "method-stated"
 * @param cellPressureKPa       p_s, the sample cell's pressure in kPa
 * @param pressureOrigin        where p_s came from, as for the temperature
 * @param pathM                 L_s, the sample cell's path in m
 * @param pathOrigin            where L_s came from, e.g. "nominal", "cts-derived"
 * @param referenceTemperatureK T_r, the references' cell temperature in K
 * @param referencePressureKPa  p_r, the references' cell pressure in kPa
 * @param fitPathM              L_r, the path in m at which the fit turned ppm·m into ppm
 * @param correctionFactor      C_corr / C_calc, by which concentration, uncertainty and detection limit were scaled
 * @param noiseFactor           F, the transform's noise variance factor
 * @param noiseFactorOrigin     where F came from, e.g. the transform settings, or that none was known
 */
public record ResultConditions(double cellTemperatureK, String temperatureOrigin, double cellPressureKPa,
        String pressureOrigin, double pathM, String pathOrigin, double referenceTemperatureK,
        double referencePressureKPa, double fitPathM, double correctionFactor, double noiseFactor,
        String noiseFactorOrigin) {

    /** @throws IllegalArgumentException naming the value that is not positive and finite or the blank origin */
    public ResultConditions {
        positive("cellTemperatureK", cellTemperatureK);
        positive("cellPressureKPa", cellPressureKPa);
        positive("pathM", pathM);
        positive("referenceTemperatureK", referenceTemperatureK);
        positive("referencePressureKPa", referencePressureKPa);
        positive("fitPathM", fitPathM);
        positive("correctionFactor", correctionFactor);
        positive("noiseFactor", noiseFactor);
        text("temperatureOrigin", temperatureOrigin);
        text("pressureOrigin", pressureOrigin);
        text("pathOrigin", pathOrigin);
        text("noiseFactorOrigin", noiseFactorOrigin);
    }

    private static void positive(String field, double value) {
        if (!(value > 0 && Double.isFinite(value))) {
            throw new IllegalArgumentException(field + " must be positive and finite, was " + value);
        }
    }

    private static void text(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + " must not be blank");
        }
    }
}
