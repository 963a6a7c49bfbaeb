package org.tracegas.preprocess;

/** How the zero path difference (ZPD) sample of an interferogram is found. */
public enum ZpdSearch {
    /** The sample of largest absolute signal after DC removal. */
    LARGEST_MAGNITUDE,
    /**
     * The centroid of the squared signal over the phase region around the largest sample, rounded to a sample:
     * steadier than the single largest sample when the burst is asymmetric or noisy.
     */
    BURST_CENTRE
}
