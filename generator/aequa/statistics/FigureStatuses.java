package aequa.statistics;

import aequa.inputs.figures.CellStatus;

/** The one place where a reader's {@link CellStatus} becomes a {@link FigureStatus}. */
final class FigureStatuses {

    private FigureStatuses() {
    }

    static FigureStatus of(CellStatus status) {
        switch (status) {
            case REPORTED:
                return FigureStatus.REPORTED;
            case SUPPRESSED:
                return FigureStatus.SUPPRESSED;
            case NOT_APPLICABLE:
                return FigureStatus.NOT_APPLICABLE;
            case NO_DATA:
                return FigureStatus.NO_DATA;
            default:
                throw new IllegalArgumentException("Unknown cell status " + status);
        }
    }
}
