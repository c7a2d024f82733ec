package aequa.drawing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.locationtech.jts.algorithm.construct.MaximumInscribedCircle;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

import aequa.colour.WcagContrast;
import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;

/**
 * Region names at each region's pole of inaccessibility (the centre of the largest inscribed circle, JTS
 * {@link MaximumInscribedCircle}). A label is kept only if its box lies inside the region and clear of every
 * label already placed; roomier regions are placed first. Labels that do not fit are dropped, never shrunk
 * below the theme's label size. Light type on a dark fill (reversed) is set at least at the theme's
 * reversed minimum, since thin light strokes fill in on press (common practice).
 */
final class LabelLayer {

    private static final GeometryFactory FACTORY = new GeometryFactory();

    private LabelLayer() {
    }

    private record Candidate(int index, Point centre, double radiusU) {
    }

    static void paint(Canvas canvas, MapModel model, Theme theme, RegionFills fills, List<Geometry> pageGeometries, int period) {
        Typesetter type = canvas.type();
        double plainSize = theme.typePt().label();
        double reversedSize = Math.max(plainSize, theme.typePt().minimumReversed());
        double capU = type.capHeight(reversedSize);
        List<Candidate> candidates = new ArrayList<>();
        for (int i = 0; i < pageGeometries.size(); i++) {
            Geometry page = pageGeometries.get(i);
            Envelope e = page.getEnvelopeInternal();
            // a label box must lie inside the region, so a region narrower than its name can be skipped before
            // the costly circle search (a necessary condition only; the real test follows)
            if (page.isEmpty() || e.getHeight() < 2 * capU
                    || e.getWidth() < type.width(model.regions().get(i).name(), plainSize, false)) {
                continue;
            }
            Geometry largest = largestPart(page);
            MaximumInscribedCircle circle = new MaximumInscribedCircle(largest, capU / 4);
            LineString radius = circle.getRadiusLine();
            candidates.add(new Candidate(i, circle.getCenter(), radius.getLength()));
        }
        candidates.sort(Comparator.comparingDouble(Candidate::radiusU).reversed().thenComparingInt(Candidate::index));
        List<Envelope> placed = new ArrayList<>();
        canvas.begin(period == 0 ? "labels" : "labels-" + period);
        for (Candidate c : candidates) {
            MapRegion region = model.regions().get(c.index());
            RegionValue value = RegionFillLayer.valueOf(region, period);
            boolean reversed = WcagContrast.relativeLuminance(fills.text(value)) > WcagContrast.relativeLuminance(fills.fill(value));
            double size = reversed ? reversedSize : plainSize;
            double padU = 0.25 * size * type.unitsPerPt();
            String text = region.name();
            double width = type.width(text, size, false);
            double x = c.centre().getX();
            double y = c.centre().getY();
            Envelope box = new Envelope(x - width / 2 - padU, x + width / 2 + padU, y - capU / 2 - padU, y + capU / 2 + padU);
            if (!fitsInside(pageGeometries.get(c.index()), box, c) || placed.stream().anyMatch(box::intersects)) {
                continue;
            }
            placed.add(box);
            canvas.text(text, x, y + capU / 2, size, false, Canvas.Anchor.MIDDLE, fills.text(value), fills.fill(value));
        }
        canvas.end();
    }

    /** True when the label box is inside the inscribed circle, or failing that inside the region itself. */
    private static boolean fitsInside(Geometry region, Envelope box, Candidate c) {
        double halfW = box.getWidth() / 2;
        double halfH = box.getHeight() / 2;
        if (halfW * halfW + halfH * halfH <= c.radiusU() * c.radiusU()) {
            return true;
        }
        return halfH <= c.radiusU() && region.contains(FACTORY.toGeometry(box));
    }

    private static Geometry largestPart(Geometry geometry) {
        Geometry best = geometry.getGeometryN(0);
        for (int i = 1; i < geometry.getNumGeometries(); i++) {
            Geometry part = geometry.getGeometryN(i);
            if (part instanceof Polygon && part.getArea() > best.getArea()) {
                best = part;
            }
        }
        return best;
    }
}
