package aequa.drawing;

import aequa.wording.NumberWriter;

/**
 * The area scale of an equal-area map: a square whose area on the ground is a round number of km2. On an
 * equal-area projection drawn at one uniform page scale s (page units per metre), every region's page area
 * is its ground area times s^2, so one square states the scale everywhere; a linear scale bar would not,
 * because lengths are distorted away from the projection's standard point or lines.
 *
 * @param areaKm2 the square's ground area: 1, 2 or 5 times a power of ten
 * @param sideU   its side on the page: {@code sqrt(areaKm2 * 1e6) * s}
 */
public record AreaScale(double areaKm2, double sideU) {

    /**
     * The largest round area whose square is no wider than {@code targetSideU} at {@code scaleUnitsPerM}.
     *
     * @throws IllegalArgumentException if either argument is not positive
     */
    public static AreaScale choose(double scaleUnitsPerM, double targetSideU) {
        if (!(scaleUnitsPerM > 0) || !(targetSideU > 0)) {
            throw new IllegalArgumentException("scale and side must be positive: " + scaleUnitsPerM + ", " + targetSideU);
        }
        double sideM = targetSideU / scaleUnitsPerM;
        double rawKm2 = sideM * sideM / 1e6;
        double areaKm2 = Symbols.niceFloor(rawKm2);
        return new AreaScale(areaKm2, Math.sqrt(areaKm2 * 1e6) * scaleUnitsPerM);
    }

    /** {@code "10,000 km²"} in the language of {@code numbers}, with decimals only below 1 km2. */
    public String label(NumberWriter numbers) {
        int decimals = areaKm2 >= 1 ? 0 : (int) Math.ceil(-Math.log10(areaKm2) - 1e-9);
        return numbers.areaKm2(areaKm2, decimals);
    }
}
