package aequa.statistics;

/** What a statistics cell says about a region; kept apart in data, legend and tables. */
public enum FigureStatus {
    /** A number was reported (it may be zero). */
    REPORTED,
    /** No figure: the cell is empty, or holds a declared missing-value marker, or the row is absent. */
    NO_DATA,
    /** The figure exists but is withheld, for example for confidentiality. */
    SUPPRESSED,
    /** The indicator does not apply to this region. */
    NOT_APPLICABLE
}
