package aequa.statistics;

/** How a map shows its figures. */
public enum MapDisplay {
    /** Regions filled by class: only for rates, shares and densities. */
    CHOROPLETH,
    /** Proportional symbols: a circle per region with area proportional to the figure; for counts. */
    CIRCLES
}
