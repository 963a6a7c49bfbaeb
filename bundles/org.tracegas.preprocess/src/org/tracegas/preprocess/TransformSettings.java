package org.tracegas.preprocess;

/**
 * Immutable settings of the interferogram to single-beam transform.
 *
 * @param apodization    apodization over the path difference range
 * @param zeroFillFactor transform length as a multiple of the next power of two above the used points: 1, 2, 4 or 8
 * @param phaseCorrection Mertz or magnitude
 * @param zpdSearch      how the ZPD sample is found
 * @param sidedness      single- or double-sided recording
 * @param phasePoints    points of the double-sided part used for the Mertz phase (even, 16 .. 65536)
 * @param lowWavenumber  lowest wavenumber kept in the single beam, cm-1 (0 for all)
 * @param highWavenumber highest wavenumber kept, cm-1 (positive infinity for all up to the Nyquist wavenumber)
 */
public record TransformSettings(Apodization apodization, int zeroFillFactor, PhaseCorrection phaseCorrection,
        ZpdSearch zpdSearch, Sidedness sidedness, int phasePoints, double lowWavenumber, double highWavenumber) {

    /**
     * @throws IllegalArgumentException naming the field that is out of range
     */
    public TransformSettings {
        if (apodization == null || phaseCorrection == null || zpdSearch == null || sidedness == null) {
            throw new IllegalArgumentException("apodization, phaseCorrection, zpdSearch and sidedness must be set");
        }
        if (zeroFillFactor != 1 && zeroFillFactor != 2 && zeroFillFactor != 4 && zeroFillFactor != 8) {
            throw new IllegalArgumentException("zeroFillFactor must be 1, 2, 4 or 8, was " + zeroFillFactor);
        }
        if (phasePoints < 16 || phasePoints > 65536 || phasePoints % 2 != 0) {
            throw new IllegalArgumentException("phasePoints must be even and within 16 .. 65536, was " + phasePoints);
        }
        if (!(lowWavenumber >= 0 && Double.isFinite(lowWavenumber))) {
            throw new IllegalArgumentException("lowWavenumber must be finite and not negative, was " + lowWavenumber);
        }
        if (!(highWavenumber > lowWavenumber)) {
            throw new IllegalArgumentException("highWavenumber must be above lowWavenumber " + lowWavenumber
                    + ", was " + highWavenumber);
        }
    }

    /**
     * Happ-Genzel, zero filling 2, Mertz phase from 256 points, ZPD at the largest sample, single-sided, full
     * range (common practice for routine gas analysis, no source).
     */
    public static TransformSettings defaults() {
        return new TransformSettings(Apodization.HAPP_GENZEL, 2, PhaseCorrection.MERTZ, ZpdSearch.LARGEST_MAGNITUDE,
                Sidedness.SINGLE_SIDED, 256, 0.0, Double.POSITIVE_INFINITY);
    }

    public TransformSettings withApodization(Apodization value) {
        return new TransformSettings(value, zeroFillFactor, phaseCorrection, zpdSearch, sidedness, phasePoints,
                lowWavenumber, highWavenumber);
    }

    public TransformSettings withZeroFillFactor(int value) {
        return new TransformSettings(apodization, value, phaseCorrection, zpdSearch, sidedness, phasePoints,
                lowWavenumber, highWavenumber);
    }

    public TransformSettings withPhaseCorrection(PhaseCorrection value) {
        return new TransformSettings(apodization, zeroFillFactor, value, zpdSearch, sidedness, phasePoints,
                lowWavenumber, highWavenumber);
    }

    public TransformSettings withZpdSearch(ZpdSearch value) {
        return new TransformSettings(apodization, zeroFillFactor, phaseCorrection, value, sidedness, phasePoints,
                lowWavenumber, highWavenumber);
    }

    public TransformSettings withSidedness(Sidedness value) {
        return new TransformSettings(apodization, zeroFillFactor, phaseCorrection, zpdSearch, value, phasePoints,
                lowWavenumber, highWavenumber);
    }

    public TransformSettings withPhasePoints(int value) {
        return new TransformSettings(apodization, zeroFillFactor, phaseCorrection, zpdSearch, sidedness, value,
                lowWavenumber, highWavenumber);
    }

    public TransformSettings withRange(double low, double high) {
        return new TransformSettings(apodization, zeroFillFactor, phaseCorrection, zpdSearch, sidedness, phasePoints,
                low, high);
    }
}
