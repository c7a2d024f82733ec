package aequa.statistics;

/** The part an indicator plays in a map. */
enum FigureRole {
    /** The figure mapped. */
    VALUE("the mapped indicator"),
    /** What the figure is divided by. */
    DENOMINATOR("the denominator (per:)"),
    /** The number of events a rate was built from. */
    EVENTS("the events column (events-column:)"),
    /** The margin of error of the figure. */
    MARGIN("the margin-of-error column (margin-column:)");

    private final String description;

    FigureRole(String description) {
        this.description = description;
    }

    String description() {
        return description;
    }

    /** The indicator playing this role in {@code settings}; empty when the map uses none. */
    String indicatorIn(MapFigureSettings settings) {
        switch (this) {
            case VALUE:
                return settings.indicator();
            case DENOMINATOR:
                return settings.denominator();
            case EVENTS:
                return settings.eventsIndicator();
            default:
                return settings.marginIndicator();
        }
    }
}
