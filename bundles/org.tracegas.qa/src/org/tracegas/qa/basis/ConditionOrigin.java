package org.tracegas.qa.basis;

/**
 * Where a cell temperature or pressure used for a result came from, in the order of preference: what the
 * spectrum file's labels say, else what the instrument's side channel logged, else what the method states.
 */
public enum ConditionOrigin {
    /** A label in the spectrum file itself. */
    FILE_LABEL,
    /** The instrument's side channel at the time of the spectrum. */
    INSTRUMENT_CHANNEL,
    /** The value the method states for its cell. */
    METHOD_STATED,
    /** The value the operator gave when importing a file that states none. */
    IMPORT_STATED
}
