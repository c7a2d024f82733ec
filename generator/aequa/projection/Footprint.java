package aequa.projection;

import java.util.Collection;

import org.locationtech.jts.geom.Geometry;

/**
 * Where on the globe a set of regions lies, as the automatic projection choice needs it. Geometries are in
 * lon/lat degrees (x = lon), polygons as GeoJSON (RFC 7946) has them: edges straight in lon/lat, cut at
 * +-180. Built by {@link #of}; all angles in degrees.
 *
 * @param centreLonDeg          centre of the smallest longitude arc that covers the data, in [-180, 180)
 * @param lonSpanDeg            width of that arc (360 when the data go all the way round)
 * @param minLatDeg             southernmost latitude
 * @param maxLatDeg             northernmost latitude
 * @param containsNorthPole     whether a region contains the North Pole
 * @param containsSouthPole     whether a region contains the South Pole
 * @param sphericalCentreLonDeg longitude of the area-weighted mean direction of the data on the sphere
 * @param sphericalCentreLatDeg latitude of that direction
 * @param angularRadiusDeg      largest angular distance from the spherical centre to any sample (180 when
 *                              the data surround it)
 * @param elongation            ratio of the data's spread along their main axis to the spread across it
 *                              (1 for a round area; from the area-weighted second moments on the sphere)
 * @param orientationDeg        azimuth of that main axis at the spherical centre, clockwise from north, in [0, 180)
 * @param samples               area-weighted interior points and boundary points
 */
public record Footprint(double centreLonDeg, double lonSpanDeg, double minLatDeg, double maxLatDeg,
                        boolean containsNorthPole, boolean containsSouthPole,
                        double sphericalCentreLonDeg, double sphericalCentreLatDeg, double angularRadiusDeg,
                        double elongation, double orientationDeg, FootprintSamples samples) {

    /**
     * Analyses the regions. The work is bounded: at most about {@value FootprintSampler#TARGET_INTERIOR}
     * interior samples and {@value FootprintAnalysis#BOUNDARY_SAMPLES} boundary samples, whatever the vertex
     * count. An empty collection (or one without coordinates) gives the footprint of the whole globe.
     */
    public static Footprint of(Collection<? extends Geometry> lonLatGeometries) {
        return FootprintAnalysis.analyse(lonLatGeometries);
    }

    /** The middle of the latitude range. */
    public double midLatDeg() {
        return (minLatDeg + maxLatDeg) / 2;
    }

    /** Whether the data lie on both sides of the equator. */
    public boolean crossesEquator() {
        return minLatDeg < 0 && maxLatDeg > 0;
    }
}
