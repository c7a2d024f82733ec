package aequa.inputs.regions;

/** A region file went beyond one of its {@link ReadLimit}s while streaming; carries which. */
final class LimitExceeded extends Exception {

    private static final long serialVersionUID = 1L;

    private final transient ReadLimit limit;

    LimitExceeded(ReadLimit limit) {
        super(limit.name(), null, false, false);
        this.limit = limit;
    }

    ReadLimit limit() {
        return limit;
    }
}
