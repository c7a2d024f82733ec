package aequa.projection;

import java.util.Collection;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;

/**
 * Where on the globe a set of regions lies. Geometries are in lon/lat degrees (x = lon).
 *
 * @param centreLonDeg centre of the longitude extent
 * @param centreLatDeg centre of the latitude extent
 * @param lonSpanDeg   width of the longitude extent
 * @param minLatDeg    southernmost latitude
 * @param maxLatDeg    northernmost latitude
 */
public record Footprint(double centreLonDeg, double centreLatDeg, double lonSpanDeg, double minLatDeg, double maxLatDeg) {

    public static Footprint of(Collection<? extends Geometry> lonLatGeometries) {
        Envelope envelope = new Envelope();
        for (Geometry g : lonLatGeometries) {
            envelope.expandToInclude(g.getEnvelopeInternal());
        }
        return new Footprint(envelope.centre().x, envelope.centre().y, envelope.getWidth(),
                envelope.getMinY(), envelope.getMaxY());
    }
}
