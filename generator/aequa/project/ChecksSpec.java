package aequa.project;

/**
 * Thresholds that decide when the data has a problem.
 *
 * @param areaTolerance     the largest relative error allowed between a region's projected and geodesic area
 * @param missingFigures    {@code warning} (drawn as no data) or {@code error} (exit 1) when a region has no figure
 * @param unreliableBelow   a rate built from fewer events than this is flagged unreliable (0 = off)
 * @param marginAbove       a rate whose relative margin of error exceeds this is flagged unreliable (0 = off)
 */
public record ChecksSpec(Double areaTolerance, String missingFigures, Double unreliableBelow, Double marginAbove) {

    static final ChecksSpec DEFAULT = new ChecksSpec(null, null, null, null);

    public ChecksSpec {
        areaTolerance = areaTolerance == null ? 1e-4 : areaTolerance;
        missingFigures = missingFigures == null ? "warning" : missingFigures;
        unreliableBelow = unreliableBelow == null ? 0.0 : unreliableBelow;
        marginAbove = marginAbove == null ? 0.0 : marginAbove;
    }
}
