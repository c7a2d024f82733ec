package aequa.atlas;

import aequa.statistics.FigureStatus;

/**
 * What one region shows for one period.
 *
 * @param status          reported, no data, suppressed or not applicable
 * @param value           the figure as given (NaN unless reported)
 * @param normalisedValue the value mapped: {@code value} itself, or per km2, or per the denominator column
 *                        times the multiplier (NaN unless reported)
 * @param marginOfError   the margin of error of {@code value} when the source gives one, else NaN
 * @param unreliable      true when the rate rests on too few events or too wide a margin (hatched on the map)
 * @param classIndex      the class of {@code normalisedValue}, or -1 when there is nothing to classify
 */
public record RegionValue(FigureStatus status, double value, double normalisedValue, double marginOfError,
                          boolean unreliable, int classIndex) {

    public static RegionValue noData() {
        return new RegionValue(FigureStatus.NO_DATA, Double.NaN, Double.NaN, Double.NaN, false, -1);
    }
}
