package aequa.project;

/**
 * Thresholds that decide when the data has a problem.
 *
 * @param areaTolerance     the largest relative error allowed between a region's projected and geodesic area
 * @param missingFigures    {@code warning} (drawn as no data) or {@code error} (exit 1) when a region has no figure
 * @param unreliableBelow   a rate built from fewer events than this is flagged unreliable (0 = off)
 * @param marginAbove       a rate whose relative margin of error exceeds this is flagged unreliable (0 = off)
 * @param minMatchedPercent the smallest share of a map's regions, in percent, that must find a figure; below it
 *                          the join has half failed (keys that lost leading zeros, another key column) and the
 *                          build stops (0 = off)
 */
public record ChecksSpec(Double areaTolerance, MissingFigures missingFigures, Double unreliableBelow, Double marginAbove,
                         Double minMatchedPercent) {

    static final ChecksSpec DEFAULT = new ChecksSpec(null, null, null, null, null);

    /**
     * 95 %: a national statistics table normally covers every region of its own boundary set, and the
     * usual ways a join half fails (codes that lost leading zeros, names in another case) leave 5 % to 20 %
     * of the regions empty; measured on the US counties file, FIPS codes without leading zeros match 90.7 %.
     */
    public static final double DEFAULT_MIN_MATCHED_PERCENT = 95;
    /** The default largest relative difference between a region's drawn and geodesic area. */
    public static final double DEFAULT_AREA_TOLERANCE = 1e-4;

    public ChecksSpec {
        areaTolerance = areaTolerance == null ? DEFAULT_AREA_TOLERANCE : areaTolerance;
        missingFigures = missingFigures == null ? MissingFigures.WARNING : missingFigures;
        unreliableBelow = unreliableBelow == null ? 0.0 : unreliableBelow;
        marginAbove = marginAbove == null ? 0.0 : marginAbove;
        minMatchedPercent = minMatchedPercent == null ? DEFAULT_MIN_MATCHED_PERCENT : minMatchedPercent;
    }
}
