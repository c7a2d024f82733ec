package aequa.drawing;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

import aequa.atlas.MapModel;
import aequa.atlas.MapPart;
import aequa.atlas.MapRegion;

/**
 * The parts of a composite map on the page: each part's regions as a named group (so print SVG has a layer
 * per part), and each framed part's thin frame with its name in the band at its top.
 */
final class PartFrames {

    /** Largest share of the name band the name's capitals fill (chosen by eye). */
    private static final double NAME_CAP_SHARE = 0.45;

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private PartFrames() {
    }

    /**
     * Calls {@code paintRegions} once per part, inside a group named after the part, with the page
     * geometries of the other parts' regions left empty (which the region painter skips).
     */
    static void paintRegionsByPart(Canvas canvas, MapModel model, List<Geometry> pages, String suffix,
                                   Consumer<List<Geometry>> paintRegions) {
        Geometry empty = GEOMETRY.createPolygon();
        for (MapPart part : model.parts()) {
            Set<String> keys = new HashSet<>(part.keys());
            List<Geometry> partPages = new ArrayList<>(pages.size());
            List<MapRegion> regions = model.regions();
            for (int i = 0; i < regions.size(); i++) {
                partPages.add(keys.contains(regions.get(i).key()) ? pages.get(i) : empty);
            }
            canvas.begin(Ids.of("regions", part.id()) + suffix);
            paintRegions.accept(partPages);
            canvas.end();
        }
    }

    /** The frames and names of the framed parts, one group each. */
    static void paint(Canvas canvas, MapModel model, Theme theme, MapFit fit, String suffix) {
        Theme.Colours c = theme.colours();
        Typesetter type = canvas.type();
        for (MapPart part : model.parts()) {
            if (part.main()) {
                continue;
            }
            MapPart.Frame f = part.frame();
            double scale = fit.scaleUnitsPerM();
            double x = fit.originXU() + (f.minXM() - fit.minXM()) * scale;
            double y = fit.originYU() + (fit.maxYM() - f.maxYM()) * scale;
            double w = (f.maxXM() - f.minXM()) * scale;
            double h = (f.maxYM() - f.minYM()) * scale;
            double bandU = part.nameBandM() * scale;
            String label = part.frameLabel();
            double size = theme.typePt().legend();
            size = Math.min(size, size * NAME_CAP_SHARE * bandU / type.capHeight(size));
            double room = w - bandU * 0.6;
            double width = type.width(label, size, false);
            if (width > room) {
                size *= room / width;
            }
            // never below the theme's smallest type (print preflight): a small print lets the name reach past its band
            size = Math.max(size, theme.typePt().minimum());
            canvas.begin(Ids.of("frame", part.id()) + suffix);
            canvas.stroke(new Rectangle2D.Double(x, y, w, h), c.textMuted(), theme.lines().border().pt());
            double baseline = y + Math.max((bandU + type.capHeight(size)) / 2, bandU * 0.3 + type.capHeight(size));
            canvas.text(label, x + bandU * 0.3, baseline, size, false, Canvas.Anchor.START,
                    c.text(), c.background());
            canvas.end();
        }
    }
}
