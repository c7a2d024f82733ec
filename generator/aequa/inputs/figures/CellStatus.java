package aequa.inputs.figures;

/**
 * What one field of a statistics source says. The statistics stage maps it one to one onto
 * the statistics stage's FigureStatus; it is a separate type because the readers come before the
 * statistics stage and may not depend on it (stage order, DEVELOPERS.md).
 */
public enum CellStatus {
    /** A number (it may be zero). */
    REPORTED,
    /** Empty, a declared missing-value marker, or a text that is not a number (see {@link FigureCell#problem()}). */
    NO_DATA,
    /** A declared marker for a figure withheld, for example for confidentiality. */
    SUPPRESSED,
    /** A declared marker for "does not apply to this region". */
    NOT_APPLICABLE
}
