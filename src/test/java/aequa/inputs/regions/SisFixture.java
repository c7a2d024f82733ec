package aequa.inputs.regions;

import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.CommonCRS;
import org.apache.sis.referencing.crs.AbstractCRS;
import org.apache.sis.referencing.cs.AxesConvention;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.opengis.referencing.operation.MathTransform;

/** Projects test geometry from WGS 84 lon/lat into a CRS given as WKT, with Apache SIS (a reference library). */
final class SisFixture {

    private SisFixture() {
    }

    static Geometry project(Geometry lonLat, String targetWkt) throws Exception {
        var target = AbstractCRS.castOrCopy(CRS.fromWKT(targetWkt)).forConvention(AxesConvention.RIGHT_HANDED);
        MathTransform transform = CRS.findOperation(CommonCRS.WGS84.normalizedGeographic(), target, null).getMathTransform();
        Geometry copy = lonLat.copy();
        copy.apply(new CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                double[] p = {seq.getX(i), seq.getY(i)};
                try {
                    transform.transform(p, 0, p, 0, 1);
                } catch (Exception e) {
                    throw new IllegalStateException(e);
                }
                seq.setOrdinate(i, 0, p[0]);
                seq.setOrdinate(i, 1, p[1]);
            }

            @Override
            public boolean isDone() {
                return false;
            }

            @Override
            public boolean isGeometryChanged() {
                return true;
            }
        });
        copy.geometryChanged();
        return copy;
    }
}
