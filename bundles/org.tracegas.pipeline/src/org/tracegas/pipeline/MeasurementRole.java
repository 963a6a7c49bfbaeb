package org.tracegas.pipeline;

/**
 * What a campaign measurement is for, as its acquisition header says under the key {@link #KEY}: stack gas,
 * or one of the QA measurements.
 */
public final class MeasurementRole {

    /** Header key of the role; a record without it is a sample of the stack gas. */
    public static final String KEY = "role";
    public static final String SAMPLE = "sample";
    /** Calibration transfer standard. */
    public static final String CTS = "cts";
    public static final String ZERO = "zero";
    public static final String SPIKE = "spike";
    /** The spike gas sent to the spectrometer directly, undiluted: its measured analyte and tracer. */
    public static final String SPIKE_DIRECT = "spike-direct";
    /** The sample taken just before a spiked one, for the native analyte level. */
    public static final String UNSPIKED = "unspiked";

    private MeasurementRole() {
    }
}
