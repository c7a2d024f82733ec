package aequa.inputs.regions;

import java.util.Optional;

import org.locationtech.jts.geom.CoordinateSequenceFilter;

/**
 * Turns the definition of a source's coordinate reference system into a transform to WGS 84 longitude and
 * latitude. The readers depend on this small interface rather than on the projection stage (where Apache
 * SIS lives), so imports keep flowing from later stages to earlier ones; the pipeline passes
 * {@code aequa.projection.SourceCrs::toLonLat}.
 */
@FunctionalInterface
public interface SourceCrsResolver {

    /** A resolver that knows no CRS: every layer not already in WGS 84 lon/lat is reported as unsupported. */
    SourceCrsResolver NONE = definition -> Optional.empty();

    /**
     * @param definitionWkt the CRS definition as stored with the data (WKT 1 or WKT 2)
     * @return a filter that rewrites (x, y) in that CRS, easting/longitude first, into (lon, lat) degrees in
     *         place (points it cannot transform become NaN), or empty when the definition cannot be used
     */
    Optional<CoordinateSequenceFilter> toLonLat(String definitionWkt);
}
