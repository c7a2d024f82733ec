package aequa.statistics;

import java.util.Objects;

/**
 * What one region shows for one period, before classification. Field for field the first five
 * components of the model's RegionValue (atlas stage); the class index is added there.
 *
 * @param status          reported, no data, suppressed or not applicable (a reported zero is REPORTED with 0)
 * @param value           the figure as given; NaN unless REPORTED
 * @param normalisedValue the value mapped: {@code value} itself, per km2 of geodesic area, or per the
 *                        denominator, times the multiplier; NaN unless REPORTED
 * @param marginOfError   the margin of error of {@code value} as the source gives it; NaN when none
 * @param unreliable      built from fewer events than the threshold, or with a relative margin of error
 *                        above the threshold
 */
public record RegionFigure(FigureStatus status, double value, double normalisedValue, double marginOfError,
                           boolean unreliable) {

    public RegionFigure {
        Objects.requireNonNull(status, "status");
    }

    static RegionFigure withoutFigure(FigureStatus status) {
        return new RegionFigure(status, Double.NaN, Double.NaN, Double.NaN, false);
    }
}
