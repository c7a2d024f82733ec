package aequa.inputs.figures;

/** How a statistics table holds its figures. */
public enum TableLayout {
    /** One row per region (and period, when there is a period column); one column per indicator. */
    WIDE,
    /** One row per region, indicator and period; the figure in a single value column. */
    LONG
}
