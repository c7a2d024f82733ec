package aequa.inputs.regions;

/**
 * Counts the vertices one region file has given so far against {@link ReadLimit#RING_POSITIONS} and
 * {@link ReadLimit#FILE_VERTICES}, so a reader stops before a hostile file exhausts the heap.
 */
final class VertexBudget {

    private final long maxRingPositions = ReadLimit.RING_POSITIONS.value();
    private final long maxFileVertices = ReadLimit.FILE_VERTICES.value();
    private long used;

    /** Whether a ring may hold {@code positions} positions. */
    boolean ringFits(long positions) {
        return positions <= maxRingPositions;
    }

    /**
     * Takes {@code vertices} more from the file's budget.
     *
     * @throws LimitExceeded when the file's vertices exceed {@link ReadLimit#FILE_VERTICES}
     */
    void take(long vertices) throws LimitExceeded {
        used += vertices;
        if (used > maxFileVertices) {
            throw new LimitExceeded(ReadLimit.FILE_VERTICES);
        }
    }
}
