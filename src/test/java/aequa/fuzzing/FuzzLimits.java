package aequa.fuzzing;

/** The bounds every fuzz test holds its target to, and the length of a campaign per target. */
final class FuzzLimits {

    /**
     * The longest one input may take ({@link FuzzFolder#withinSeconds}): hundreds of times what a valid
     * file of the same size takes, so only a hang trips it.
     */
    static final long SECONDS_PER_INPUT = 10;

    /** The same for one whole load step, which projects, simplifies and classifies as well as reading. */
    static final long SECONDS_PER_LOAD = 30;

    /** How long {@code JAZZER_FUZZ=1} fuzzes one target (regression runs ignore it). */
    static final String CAMPAIGN = "3m";

    private FuzzLimits() {
    }
}
