package aequa.projection;

import java.util.Optional;

import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.CommonCRS;
import org.apache.sis.referencing.crs.AbstractCRS;
import org.apache.sis.referencing.cs.AxesConvention;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.opengis.referencing.crs.CoordinateReferenceSystem;
import org.opengis.referencing.operation.MathTransform;
import org.opengis.referencing.operation.TransformException;
import org.opengis.util.FactoryException;

/**
 * Transforms coordinates of a source's own CRS (a GeoPackage layer's {@code gpkg_spatial_ref_sys.definition},
 * OGC 12-128 clause 1.1.2) to WGS 84 longitude/latitude with Apache SIS. Coordinates are taken easting (or
 * longitude) first, as GeoPackage geometries store them whatever the CRS's declared axis order (OGC 12-128
 * clause 2.1.3.1: "x" is easting or longitude). When the source datum differs from WGS 84 and no EPSG
 * database is present, SIS may use an approximate datum shift; the caller's data then shifts by up to the
 * datum difference (metres), which is acceptable for statistical maps.
 */
public final class SourceCrs {

    static {
        SisLogging.silence();
    }

    private SourceCrs() {
    }

    /**
     * @param definitionWkt a WKT 1 or WKT 2 CRS definition
     * @return a filter rewriting (x, y) in place into (lon, lat) degrees, points it cannot transform becoming
     *         NaN; empty when SIS cannot parse the definition or find an operation to WGS 84
     */
    public static Optional<CoordinateSequenceFilter> toLonLat(String definitionWkt) {
        try {
            CoordinateReferenceSystem source = AbstractCRS.castOrCopy(CRS.fromWKT(definitionWkt))
                    .forConvention(AxesConvention.RIGHT_HANDED);
            MathTransform transform = CRS.findOperation(source, CommonCRS.WGS84.normalizedGeographic(), null)
                    .getMathTransform();
            return Optional.of(new TransformFilter(transform));
        } catch (FactoryException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /** Applies a 2-D SIS transform to each coordinate of a JTS sequence. */
    private static final class TransformFilter implements CoordinateSequenceFilter {
        private final MathTransform transform;
        private final double[] point = new double[2];

        TransformFilter(MathTransform transform) {
            this.transform = transform;
        }

        @Override
        public void filter(CoordinateSequence seq, int i) {
            point[0] = seq.getX(i);
            point[1] = seq.getY(i);
            try {
                transform.transform(point, 0, point, 0, 1);
            } catch (TransformException e) {
                point[0] = Double.NaN;
                point[1] = Double.NaN;
            }
            seq.setOrdinate(i, 0, point[0]);
            seq.setOrdinate(i, 1, point[1]);
        }

        @Override
        public boolean isDone() {
            return false;
        }

        @Override
        public boolean isGeometryChanged() {
            return true;
        }
    }
}
