package aequa.statistics;

import java.util.Optional;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.figures.CellStatus;
import aequa.inputs.figures.FigureCell;
import aequa.inputs.figures.FigureTable;
import aequa.project.Normalisation;

/**
 * Builds the {@link RegionFigure} of one region and period from its joined cells: the status, the value as
 * given, the normalised value, the margin of error and the reliability flag.
 *
 * <p>Normalised value: {@link Normalisation#NONE} the value itself; {@link Normalisation#AREA}
 * value / geodesic area in km2 x multiplier; {@link Normalisation#COLUMN} value / denominator x multiplier.
 * A reported value that cannot be normalised (no positive area; a denominator that is absent, not
 * reported, zero or negative; a quotient times the multiplier beyond the range of a double) is not mapped:
 * the figure takes the denominator's status (suppressed stays suppressed, not applicable stays not
 * applicable) or else no data, with a warning {@code normalise-impossible}. Every normalised value of a
 * reported figure is therefore finite. A negative margin of error is ignored with a warning.
 *
 * <p>Reliability (common practice in official statistics, for example flagging rates based on fewer than
 * 20 events, or estimates whose relative error exceeds 30 %; thresholds from the project file): a figure is
 * unreliable when its events cell is reported and below {@code fewestEvents}, or when margin / |value|
 * exceeds {@code largestRelativeMargin} (a positive margin on a zero value counts as exceeding). A missing
 * events or margin cell does not flag a figure.
 */
final class Normaliser {

    private final MapFigureSettings settings;
    private final FigureTable table;
    private final Findings findings;

    Normaliser(MapFigureSettings settings, FigureTable table, Findings findings) {
        this.settings = settings;
        this.table = table;
        this.findings = findings;
    }

    RegionFigure figure(FigureJoin join, String period, RegionArea region) {
        Optional<FigureCell> valueCell = join.cell(FigureRole.VALUE, period, region.key());
        if (valueCell.isEmpty() || valueCell.get().status() != CellStatus.REPORTED) {
            return RegionFigure.withoutFigure(valueCell.map(c -> FigureStatuses.of(c.status()))
                    .orElse(FigureStatus.NO_DATA));
        }
        FigureCell cell = valueCell.get();
        double value = cell.value();
        double margin = margin(join, period, region.key());
        boolean unreliable = fewEvents(join, period, region.key()) || wideMargin(value, margin);
        switch (settings.normalisation()) {
            case AREA:
                if (!(region.geodesicAreaKm2() > 0) || Double.isInfinite(region.geodesicAreaKm2())) {
                    cannotNormalise(cell, "the region has no positive area (" + region.geodesicAreaKm2() + " km2)",
                            FigureStatus.NO_DATA);
                    return RegionFigure.withoutFigure(FigureStatus.NO_DATA);
                }
                return normalised(cell, value / region.geodesicAreaKm2() * settings.multiplier(), margin, unreliable);
            case COLUMN:
                Optional<FigureCell> denominator = join.cell(FigureRole.DENOMINATOR, period, region.key());
                if (denominator.isEmpty() || denominator.get().status() != CellStatus.REPORTED) {
                    FigureStatus status = denominator.map(c -> FigureStatuses.of(c.status()))
                            .orElse(FigureStatus.NO_DATA);
                    cannotNormalise(cell, "its denominator \"" + settings.denominator() + "\" is "
                            + (denominator.isEmpty() ? "absent" : describe(status)), status);
                    return RegionFigure.withoutFigure(status);
                }
                double per = denominator.get().value();
                if (!(per > 0)) {
                    cannotNormalise(cell, "its denominator \"" + settings.denominator() + "\" is " + per
                            + " at " + table.place(denominator.get()), FigureStatus.NO_DATA);
                    return RegionFigure.withoutFigure(FigureStatus.NO_DATA);
                }
                return normalised(cell, value / per * settings.multiplier(), margin, unreliable);
            default:
                return new RegionFigure(FigureStatus.REPORTED, value, value, margin, unreliable);
        }
    }

    /**
     * The normalised figure, or no data with {@code normalise-impossible} when the quotient times the
     * multiplier overflows the range of a double (above about 1.8e308): only finite values leave this class.
     */
    private RegionFigure normalised(FigureCell cell, double normalisedValue, double margin, boolean unreliable) {
        if (Double.isInfinite(normalisedValue)) {
            cannotNormalise(cell, "the normalised value is beyond the largest number aequa can hold (about 1.8e308)",
                    FigureStatus.NO_DATA, "check the multiplier and the denominator");
            return RegionFigure.withoutFigure(FigureStatus.NO_DATA);
        }
        return new RegionFigure(FigureStatus.REPORTED, cell.value(), normalisedValue, margin, unreliable);
    }

    private double margin(FigureJoin join, String period, String regionKey) {
        Optional<FigureCell> cell = join.cell(FigureRole.MARGIN, period, regionKey)
                .filter(c -> c.status() == CellStatus.REPORTED);
        if (cell.isEmpty()) {
            return Double.NaN;
        }
        if (cell.get().value() < 0) {
            findings.add(Finding.warning("figures-negative-margin", table.file(), table.place(cell.get()),
                    "The margin of error " + cell.get().text().strip() + " is negative; it is ignored.",
                    "Give margins of error as non-negative half-widths."));
            return Double.NaN;
        }
        return cell.get().value();
    }

    private boolean fewEvents(FigureJoin join, String period, String regionKey) {
        if (!(settings.fewestEvents() > 0)) {
            return false;
        }
        return join.cell(FigureRole.EVENTS, period, regionKey)
                .filter(c -> c.status() == CellStatus.REPORTED)
                .map(c -> c.value() < settings.fewestEvents())
                .orElse(false);
    }

    private boolean wideMargin(double value, double margin) {
        if (!(settings.largestRelativeMargin() > 0) || Double.isNaN(margin)) {
            return false;
        }
        return margin > settings.largestRelativeMargin() * Math.abs(value);
    }

    private void cannotNormalise(FigureCell cell, String reason, FigureStatus shownAs) {
        cannotNormalise(cell, reason, shownAs, "supply the missing figure to map it");
    }

    private void cannotNormalise(FigureCell cell, String reason, FigureStatus shownAs, String remedy) {
        findings.add(Finding.warning("normalise-impossible", table.file(), table.place(cell),
                "The figure of region \"" + cell.key() + "\" cannot be normalised for map \"" + settings.mapId()
                        + "\": " + reason + ".",
                "It is drawn as " + (shownAs == FigureStatus.NO_DATA ? "no data" : describe(shownAs)) + "; " + remedy + "."));
    }

    private static String describe(FigureStatus status) {
        switch (status) {
            case SUPPRESSED:
                return "suppressed";
            case NOT_APPLICABLE:
                return "not applicable";
            default:
                return "missing";
        }
    }
}
