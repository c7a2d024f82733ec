package aequa.projection;

/**
 * The rotated lon/lat frame in which a projection is "normal": its discontinuity (cut) is the frame's
 * antimeridian, {@code frameLon = +-180}, and it is defined for frame latitudes in
 * [{@link #minFrameLatDeg()}, {@link #maxFrameLatDeg()}]. Geometry is cut and clipped in this frame before
 * it is projected, so no polygon straddles the cut and nothing outside the domain reaches the kernel.
 *
 * <p>For a normal-aspect family the frame is the geographic frame shifted by the central meridian. For an
 * azimuthal projection the frame's north pole is the projection centre, so its domain is a cap. Angles in
 * degrees; frame longitudes in [-180, 180].
 *
 * <p>aequa's frames rotate the authalic sphere (Snyder 1987, eq. 3-11): frame latitudes are authalic
 * latitudes, which makes the cut and the domain exact for every family. Implementations are immutable.
 */
public interface AspectFrame {

    /** Writes (frameLon, frameLat) of the geographic point (lon, lat) into {@code out[0..1]}. */
    void toFrame(double lonDeg, double latDeg, double[] out);

    /** The inverse of {@link #toFrame}: writes (lon, lat) into {@code out[0..1]}, lon in [-180, 180]. */
    void fromFrame(double frameLonDeg, double frameLatDeg, double[] out);

    /** The lowest frame latitude the projection may be given. */
    double minFrameLatDeg();

    /** The highest frame latitude the projection may be given. */
    double maxFrameLatDeg();

    /**
     * Whether the frame antimeridian is a discontinuity of the projection. True for the cylindrical, conic
     * and world families (geometry must be cut there); false for the azimuthal family, which is continuous
     * everywhere inside its domain (a cap around the centre), so geometry needs clipping only.
     */
    boolean hasCut();
}
