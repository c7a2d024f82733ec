package aequa.drawing;

import java.awt.geom.Rectangle2D;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.util.AffineTransformation;

/**
 * Places projected coordinates (metres, y to the north) on the page (units, y down) with one uniform scale:
 * {@code xU = originX + (xM - minXM) s}, {@code yU = originY + (maxYM - yM) s}. North stays up; nothing is
 * stretched, so areas on the page stay proportional to areas on the ellipsoid (the projection is
 * equal-area) with the constant factor {@code s^2}.
 *
 * @param scaleUnitsPerM page units per projected metre
 * @param minXM          the projected x placed at {@code originXU}
 * @param maxYM          the projected y placed at {@code originYU}
 * @param originXU       page x of {@code minXM}
 * @param originYU       page y of {@code maxYM}
 */
public record MapFit(double scaleUnitsPerM, double minXM, double maxYM, double originXU, double originYU) {

    /** {@code extentM} at the given scale, centred in {@code box}. */
    public static MapFit at(double scaleUnitsPerM, Envelope extentM, Rectangle2D box) {
        double originX = box.getX() + (box.getWidth() - extentM.getWidth() * scaleUnitsPerM) / 2;
        double originY = box.getY() + (box.getHeight() - extentM.getHeight() * scaleUnitsPerM) / 2;
        return new MapFit(scaleUnitsPerM, extentM.getMinX(), extentM.getMaxY(), originX, originY);
    }

    /** A copy of {@code geometryM} in page units. */
    public Geometry toPage(Geometry geometryM) {
        AffineTransformation t = new AffineTransformation(
                scaleUnitsPerM, 0, originXU - minXM * scaleUnitsPerM,
                0, -scaleUnitsPerM, originYU + maxYM * scaleUnitsPerM);
        return t.transform(geometryM);
    }
}
