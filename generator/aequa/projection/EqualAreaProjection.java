package aequa.projection;

import java.util.List;

/**
 * An equal-area projection of the WGS 84 ellipsoid onto the plane, with its parameters fixed.
 *
 * <p>Numeric contract: geographic coordinates are (longitude, latitude) in degrees, interleaved in
 * arrays, longitude first (JTS order, x = lon); projected coordinates are (easting, northing) in metres.
 * Points outside the domain (see {@link #frame()}) come out as NaN, never as an exception. Implementations
 * are immutable and thread-safe.
 */
public interface EqualAreaProjection {

    ProjectionFamily family();

    /** The parameters that define this projection, in a stable order, for captions and report.json. */
    List<ProjectionParameter> parameters();

    /** Projects {@code count} (lon, lat) pairs in degrees to (x, y) in metres. Source and target may be the same array. */
    void forward(double[] lonLatDeg, int srcOffset, double[] xyMetres, int dstOffset, int count);

    /** The inverse of {@link #forward}; points off the projected domain come out as NaN. */
    void inverse(double[] xyMetres, int srcOffset, double[] lonLatDeg, int dstOffset, int count);

    /** The frame in which the cut and domain of this projection are described. */
    AspectFrame frame();

    /** ISO 19162:2019 (WKT 2) of the projected CRS, parseable by Apache SIS. */
    String wkt2();

    /**
     * The same projection as a PROJ string that PROJ's {@code cct} reads (degrees in, metres out); for the families aequa computes on the authalic sphere, a pipeline that spells out the conversion
     * to authalic latitude (see {@code ProjStrings}).
     */
    String projString();
}
