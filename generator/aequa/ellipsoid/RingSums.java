package aequa.ellipsoid;

import java.util.function.ToDoubleFunction;

import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

/** The area of a Polygon or MultiPolygon from the areas of its rings: shells added, holes subtracted, empty parts 0. */
final class RingSums {

    private RingSums() {
    }

    static double areaM2(Geometry lonLat, ToDoubleFunction<CoordinateSequence> ringAreaM2) {
        double total = 0;
        for (int i = 0; i < lonLat.getNumGeometries(); i++) {
            Geometry part = lonLat.getGeometryN(i);
            if (part instanceof Polygon && !part.isEmpty()) {
                Polygon polygon = (Polygon) part;
                total += ringAreaM2.applyAsDouble(polygon.getExteriorRing().getCoordinateSequence());
                for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                    total -= ringAreaM2.applyAsDouble(polygon.getInteriorRingN(h).getCoordinateSequence());
                }
            }
        }
        return total;
    }
}
