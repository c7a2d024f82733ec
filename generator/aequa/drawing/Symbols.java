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

    /** The share of the shorter side of a map panel the largest circle's radius takes at most (chosen by eye). */
    static final double MAX_RADIUS_SHARE = 0.045;
    /**
     * The share of the regions' drawn area that all circles of a panel together cover at most, so that a map of
     * thousands of small regions gets small circles instead of one blob (chosen by eye on the US counties).
     */
    static final double MAX_COVER_SHARE = 0.35;
    /** Millimetres to points (1 in = 25.4 mm = 72 pt). */
    private static final double PT_PER_MM = 72 / 25.4;

    /**
     * The largest circle's radius in page units: the map's {@code largest-circle-mm} when set (a diameter);
     * else the smaller of {@value #MAX_RADIUS_SHARE} of the panel's shorter side and the radius at which the
     * circles of the busiest period cover {@value #MAX_COVER_SHARE} of the regions' drawn area.
     *
     * @param scaleUPerM  the panel's page units per metre
     * @param shortSideU  the panel's shorter side
     * @param unitsPerPt  page units per point
     */
    static double largestRadiusU(MapModel model, double maxValue, double scaleUPerM, double shortSideU, double unitsPerPt) {
        if (model.spec().largestCircleMm() != null) {
            return model.spec().largestCircleMm() / 2 * PT_PER_MM * unitsPerPt;
        }
        double regionsM2 = 0;
        for (MapRegion region : model.regions()) {
            regionsM2 += region.planarM().getArea();
        }
        double busiest = 0; // the largest sum of v / vMax over a period: the circles' total area in units of the largest
        for (int p = 0; p < Math.max(1, model.periods().size()); p++) {
            double sum = 0;
            for (MapRegion region : model.regions()) {
                RegionValue v = p < region.values().size() ? region.values().get(p) : null;
                if (v != null && drawn(v)) {
                    sum += v.normalisedValue() / maxValue;
                }
            }
            busiest = Math.max(busiest, sum);
        }
        double byShare = MAX_RADIUS_SHARE * shortSideU;
        if (busiest == 0 || regionsM2 == 0) {
            return byShare;
        }
        double byCover = Math.sqrt(MAX_COVER_SHARE * regionsM2 * scaleUPerM * scaleUPerM / (Math.PI * busiest));
        return Math.min(byShare, byCover);
    }

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
