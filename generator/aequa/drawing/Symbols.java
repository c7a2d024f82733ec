package aequa.drawing;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.statistics.FigureStatus;

/**
 * Proportional circles for count maps: a circle's area is proportional to its value,
 * {@code r = rMax sqrt(v / vMax)}, exact area scaling with no perceptual correction (common practice for
 * counts; the nested-circle legend lets readers compare directly). Values that are not reported, not
 * positive or NaN get no circle.
 *
 * @param maxValue   the largest value over all periods, which gets {@code maxRadiusU}
 * @param maxRadiusU the radius of the largest circle in page units
 */
record Symbols(double maxValue, double maxRadiusU) {

    /** The share of the shorter side of a map panel the largest circle's radius takes (chosen by eye). */
    static final double MAX_RADIUS_SHARE = 0.045;

    static boolean drawn(RegionValue value) {
        return value.status() == FigureStatus.REPORTED && value.normalisedValue() > 0;
    }

    /** The largest drawable value of the map, or NaN when there is none. */
    static double maxValue(MapModel model) {
        double max = Double.NaN;
        for (MapRegion region : model.regions()) {
            for (RegionValue value : region.values()) {
                if (drawn(value) && !(value.normalisedValue() <= max)) {
                    max = value.normalisedValue();
                }
            }
        }
        return max;
    }

    double radius(double value) {
        return maxRadiusU * Math.sqrt(value / maxValue);
    }

    /**
     * Up to three round values for the nested legend, largest first: the largest is 1, 1.5, 2, 3, 5 or 7.5
     * times a power of ten (close below the largest circle on the map), the others 1, 2 or 5 times one.
     */
    double[] legendValues() {
        double decade = Math.pow(10, Math.floor(Math.log10(maxValue)));
        double first = decade;
        for (double n : new double[]{7.5, 5, 3, 2, 1.5, 1}) {
            if (n * decade <= maxValue * (1 + 1e-12)) {
                first = n * decade;
                break;
            }
        }
        double second = niceFloor(first / 3.5);
        double third = niceFloor(first / 15);
        if (third >= second) {
            return second >= first ? new double[]{first} : new double[]{first, second};
        }
        return new double[]{first, second, third};
    }

    /** The largest 1, 2 or 5 times a power of ten not above {@code v}. */
    static double niceFloor(double v) {
        double decade = Math.pow(10, Math.floor(Math.log10(v)));
        for (double n : new double[]{5, 2, 1}) {
            if (n * decade <= v * (1 + 1e-12)) {
                return n * decade;
            }
        }
        return decade;
    }
}
