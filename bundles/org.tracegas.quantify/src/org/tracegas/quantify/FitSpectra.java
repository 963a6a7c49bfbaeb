package org.tracegas.quantify;

import org.tracegas.spectrum.Spectrum;

/**
 * Spectra of a fit for plots, on the sample axis; points outside the analyte's windows are NaN.
 *
 * @param contribution fitted absorbance of the analyte alone
 * @param model        fitted absorbance of all compounds and baselines together
 * @param residual     sample minus model
 */
public record FitSpectra(Spectrum contribution, Spectrum model, Spectrum residual) {
}
