package org.tracegas.quantify;

import java.util.List;

import org.tracegas.quantify.internal.Sha256;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/**
 * Quantifies sample spectra with a prepared method. Stateless apart from its settings, so one instance serves
 * any number of threads; each spectrum is fitted on its own, which makes the numbers independent of how work is
 * spread over threads.
 */
public final class Quantifier {

    private final PreparedMethod prepared;
    private final String libraryHash;
    private final String softwareVersion;
    private final boolean keepSpectra;
    private final Sha256.SpectrumHasher hasher;

    /**
     * @param prepared        the prepared method
     * @param libraryHash     identity of the reference library version, recorded with each result
     * @param softwareVersion software version, recorded with each result
     * @param keepSpectra     whether results carry the fitted spectra and residuals for plots
     */
    public Quantifier(PreparedMethod prepared, String libraryHash, String softwareVersion, boolean keepSpectra) {
        if (prepared == null) {
            throw new IllegalArgumentException("prepared must not be null");
        }
        if (libraryHash == null || libraryHash.isBlank()) {
            throw new IllegalArgumentException("libraryHash must not be blank");
        }
        if (softwareVersion == null || softwareVersion.isBlank()) {
            throw new IllegalArgumentException("softwareVersion must not be blank");
        }
        this.prepared = prepared;
        this.libraryHash = libraryHash;
        this.softwareVersion = softwareVersion;
        this.keepSpectra = keepSpectra;
        this.hasher = new Sha256.SpectrumHasher(prepared.axis());
    }

    public PreparedMethod prepared() {
        return prepared;
    }

    /**
     * Fits a sample and records what the result was computed from.
     *
     * @throws IllegalArgumentException if the spectrum is not absorbance or not on the prepared axis, or if the
     *                                  method's algorithm cannot fit a point that is not finite (the message names
     *                                  the index)
     */
    public SpectrumResult quantify(Sample sample) {
        List<CompoundResult> results = fit(sample);
        ReprocessingRecord record = new ReprocessingRecord(prepared.method().contentHash(), libraryHash,
                softwareVersion, hasher.hash(sample.absorbance()));
        return new SpectrumResult(results, record);
    }

    /**
     * Fits a sample: one result per analyte in the method's order, without the reprocessing record.
     *
     * @throws IllegalArgumentException as {@link #quantify(Sample)}
     */
    public List<CompoundResult> fit(Sample sample) {
        if (sample == null) {
            throw new IllegalArgumentException("sample must not be null");
        }
        Spectrum spectrum = sample.absorbance();
        if (spectrum.ordinate() != Ordinate.ABSORBANCE) {
            throw new IllegalArgumentException("sample ordinate must be ABSORBANCE, was " + spectrum.ordinate());
        }
        if (!spectrum.axis().equals(prepared.axis())) {
            throw new IllegalArgumentException("sample axis " + spectrum.axis() + " differs from the prepared axis "
                    + prepared.axis());
        }
        List<CompoundResult> results = prepared.fit().fit(sample, keepSpectra);
        List<Analyte> analytes = prepared.method().analytes();
        for (int a = 0; a < analytes.size(); a++) {
            // a contributed algorithm is held to the contract: results are matched to analytes by position
            if (results.size() != analytes.size() || !results.get(a).compound().equals(analytes.get(a).compound())) {
                throw new IllegalStateException("algorithm " + prepared.method().algorithm().name()
                        + " returned results for " + results.stream().map(CompoundResult::compound).toList()
                        + ", not one per analyte of " + analytes.stream().map(Analyte::compound).toList());
            }
        }
        return results;
    }
}
