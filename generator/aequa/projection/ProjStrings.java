package aequa.projection;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The projection as a PROJ string (PROJ 9 syntax, as {@code cct} reads it; {@code cs2cs} and {@code proj}
 * read the single operations but no pipelines), alongside the WKT 2: input longitude and latitude in degrees on the ellipsoid, output easting and northing in metres.
 *
 * <ul>
 * <li>The families Apache SIS computes, and Equal Earth, are single PROJ operations with the same
 *     ellipsoidal formulas: {@code laea} (EPSG method 9820), {@code aea} (9822), {@code cea} (9835),
 *     {@code eqearth} (1078, which PROJ computes on the authalic sphere as IOGP GN 7-2 defines it).</li>
 * <li>Mollweide and the transverse and oblique cylinders are computed on the authalic sphere, which no PROJ
 *     operation of those names does, so their string is a pipeline that spells the conversion chain out:
 *     <ol>
 *     <li>geodetic to authalic latitude, with operations PROJ has: the ellipsoidal {@code cea} (standard
 *         parallel 0) gives x = a lon, y = a q / 2 (Snyder 1987, eqs. 10-15 and 10-16); an {@code affine}
 *         step scales them to (lon, q / qp) = (lon, sin beta) (eq. 3-11); the inverse spherical {@code cea}
 *         on the unit sphere gives (lon, beta) (eq. 10-5);</li>
 *     <li>for the cylinders, the rotation of the authalic sphere to the aspect's frame ({@link SphereRotation}):
 *         {@code cart} on the unit sphere, an {@code affine} step with the rotation matrix, {@code cart}
 *         inverse; then the spherical {@code cea} with the authalic radius Rq (eq. 3-13) and the lines of true
 *         scale at the offset ({@code lat_ts}), and an {@code affine} turn that keeps the central line's
 *         azimuth on the page;</li>
 *     <li>for Mollweide, the spherical {@code moll} with the authalic radius.</li>
 *     </ol></li>
 * </ul>
 * Numbers are written with 17 significant digits, so PROJ reproduces aequa's coordinates to well under a
 * millimetre ({@code ProjStringsTest} runs PROJ's {@code cct} on random points of every family).
 */
final class ProjStrings {

    private ProjStrings() {
    }

    static String of(FixedProjection projection) {
        EllipsoidAxes axes = projection.ellipsoid();
        String ellipsoid = axes.equals(EllipsoidAxes.WGS84) ? "+ellps=WGS84"
                : "+a=" + number(axes.semiMajorM()) + " +b=" + number(axes.semiMinorM());
        switch (projection.family()) {
            case LAMBERT_AZIMUTHAL:
                return "+proj=laea +lat_0=" + value(projection, FamilyDefinitions.CENTRE_LAT) + " +lon_0="
                        + value(projection, FamilyDefinitions.CENTRE_LON) + " +x_0=0 +y_0=0 " + ellipsoid + " +units=m +no_defs";
            case ALBERS_CONIC:
                return "+proj=aea +lat_0=" + value(projection, FamilyDefinitions.CENTRE_LAT) + " +lon_0="
                        + value(projection, FamilyDefinitions.CENTRE_LON) + " +lat_1=" + value(projection, FamilyDefinitions.STANDARD_PARALLEL_1)
                        + " +lat_2=" + value(projection, FamilyDefinitions.STANDARD_PARALLEL_2) + " +x_0=0 +y_0=0 " + ellipsoid
                        + " +units=m +no_defs";
            case CYLINDRICAL:
                return "+proj=cea +lon_0=" + value(projection, FamilyDefinitions.CENTRE_LON) + " +lat_ts="
                        + value(projection, FamilyDefinitions.STANDARD_PARALLEL_1) + " +x_0=0 +y_0=0 " + ellipsoid + " +units=m +no_defs";
            case EQUAL_EARTH:
                return "+proj=eqearth +lon_0=" + value(projection, FamilyDefinitions.CENTRE_LON) + " +x_0=0 +y_0=0 " + ellipsoid
                        + " +units=m +no_defs";
            case MOLLWEIDE:
                return pipeline(toAuthalic(axes, ellipsoid), "+proj=moll +R=" + number(new AuthalicLatitude(axes).radiusM())
                        + " +lon_0=" + value(projection, FamilyDefinitions.CENTRE_LON));
            case CYLINDRICAL_TRANSVERSE:
            case CYLINDRICAL_OBLIQUE:
                return cylinder((AuthalicProjection) projection, axes, ellipsoid);
            default:
                throw new IllegalArgumentException("no PROJ string for " + projection.family());
        }
    }

    private static String cylinder(AuthalicProjection projection, EllipsoidAxes axes, String ellipsoid) {
        List<String> steps = new ArrayList<>(toAuthalic(axes, ellipsoid));
        double[] m = projection.rotation().matrix();
        steps.add("+proj=cart +R=1");
        steps.add(String.format(Locale.ROOT, "+proj=affine +s11=%s +s12=%s +s13=%s +s21=%s +s22=%s +s23=%s +s31=%s +s32=%s +s33=%s",
                number(m[0]), number(m[1]), number(m[2]), number(m[3]), number(m[4]), number(m[5]), number(m[6]),
                number(m[7]), number(m[8])));
        steps.add("+inv +proj=cart +R=1");
        steps.add("+proj=cea +R=" + number(new AuthalicLatitude(axes).radiusM()) + " +lat_ts="
                + value(projection, FamilyDefinitions.STANDARD_LINE_OFFSET));
        double azimuthRad = Math.toRadians(projection.azimuthDeg());
        steps.add("+proj=affine +s11=" + number(Math.sin(azimuthRad)) + " +s12=" + number(-Math.cos(azimuthRad))
                + " +s21=" + number(Math.cos(azimuthRad)) + " +s22=" + number(Math.sin(azimuthRad)));
        return pipeline(steps);
    }

    /** Degrees to radians, then geodetic to authalic latitude (see the class comment); longitude unchanged. */
    private static List<String> toAuthalic(EllipsoidAxes axes, String ellipsoid) {
        double a = axes.semiMajorM();
        double qp = 2 * Math.pow(new AuthalicLatitude(axes).radiusM() / a, 2);   // Rq^2 = a^2 qp / 2 (eq. 3-13)
        return List.of("+proj=unitconvert +xy_in=deg +xy_out=rad",
                "+proj=cea +lat_ts=0 " + ellipsoid,
                "+proj=affine +s11=" + number(1 / a) + " +s22=" + number(2 / (a * qp)),
                "+inv +proj=cea +R=1");
    }

    private static String pipeline(List<String> steps, String last) {
        List<String> all = new ArrayList<>(steps);
        all.add(last);
        return pipeline(all);
    }

    private static String pipeline(List<String> steps) {
        StringBuilder text = new StringBuilder("+proj=pipeline");
        for (String step : steps) {
            text.append(" +step ").append(step);
        }
        return text.toString();
    }

    private static String value(FixedProjection projection, String key) {
        for (ProjectionParameter p : projection.parameters()) {
            if (p.key().equals(key)) {
                return number(p.value());
            }
        }
        throw new IllegalArgumentException(projection.family() + " has no parameter " + key);
    }

    /** Shortest text that reads back as the same double (Java's own algorithm), never in exponent form. */
    private static String number(double value) {
        return new java.math.BigDecimal(Double.toString(value)).stripTrailingZeros().toPlainString();
    }
}
