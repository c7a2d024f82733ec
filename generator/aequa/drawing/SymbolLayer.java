package aequa.drawing;

import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.locationtech.jts.algorithm.construct.MaximumInscribedCircle;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Point;

import aequa.atlas.MapModel;
import aequa.atlas.RegionValue;

/**
 * Proportional circles at each region's pole of inaccessibility, drawn largest first so small circles stay
 * visible on top of large ones. Circles are partly transparent with a light edge, so overlaps can be read.
 */
final class SymbolLayer {

    /** Fill opacity of circles (chosen by eye: overlaps stay legible, colour stays strong). */
    static final double FILL_OPACITY = 0.75;

    private SymbolLayer() {
    }

    private record Circle(int index, double value, Point centre) {
    }

    static void paint(Canvas canvas, MapModel model, Theme theme, Symbols symbols, List<Geometry> pageGeometries,
                      int period, String idPrefix) {
        List<Circle> circles = new ArrayList<>();
        for (int i = 0; i < pageGeometries.size(); i++) {
            RegionValue value = RegionFillLayer.valueOf(model.regions().get(i), period);
            Geometry page = pageGeometries.get(i);
            if (!Symbols.drawn(value) || page.isEmpty()) {
                continue;
            }
            double tolerance = Math.max(page.getEnvelopeInternal().getDiameter() / 50, 1e-3);
            circles.add(new Circle(i, value.normalisedValue(), MaximumInscribedCircle.getCenter(page, tolerance)));
        }
        circles.sort(Comparator.comparingDouble(Circle::value).reversed().thenComparingInt(Circle::index));
        canvas.begin(period == 0 ? "symbols" : "symbols-" + period);
        for (Circle c : circles) {
            double r = symbols.radius(c.value());
            Ellipse2D.Double shape = new Ellipse2D.Double(c.centre().getX() - r, c.centre().getY() - r, 2 * r, 2 * r);
            canvas.begin(Ids.of(idPrefix, model.regions().get(c.index()).key()));
            canvas.fill(shape, theme.colours().symbol(), FILL_OPACITY);
            canvas.stroke(shape, theme.colours().symbolEdge(), theme.lines().symbolEdge().pt());
            canvas.end();
        }
        canvas.end();
    }
}
