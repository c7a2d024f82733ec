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
import aequa.wording.NumberWriter;
import aequa.wording.Wording;

/**
 * The parts of a composite map on the page: each part's regions as a named group (so print SVG has a layer
 * per part), and each framed part's thin frame with its name in the band at its top.
 */
final class PartFrames {

    /** Largest share of the name band the name's capitals fill (chosen by eye). */
    private static final double NAME_CAP_SHARE = 0.45;
    /** Largest share of the area-scale band a part's own square's side takes (chosen by eye). */
    private static final double OWN_SQUARE_SHARE = 0.7;

    /** Room kept around the smallest type in a name band: a tenth more than the capitals need (by eye). */
    private static final double LEAST_BAND_ROOM = 1.1;

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private PartFrames() {
    }

    /**
     * The height of a one-line name band, points, at which {@link #paint} draws the name at {@code sizePt} (at
     * most the legend's size): its capitals fill {@value #NAME_CAP_SHARE} of the band. A two-line band, 1.7 of
     * these, then holds two lines at that size too (two line heights of 1.25 em are 2.5 em, and this band is
     * about 1.8 em).
     */
    static double nameBandPt(Theme theme, double sizePt) {
        Typesetter type = new Typesetter(1, Typesetter.installedFamily(theme.fonts().family()));
        return LEAST_BAND_ROOM * type.capHeight(sizePt) / NAME_CAP_SHARE;
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

    /**
     * The frames and names of the framed parts, one group each; a part at its own area scale also gets its own
     * area-scale square (true for its areas only) in the band at the bottom of its frame. Every word is in
     * {@code wording}'s language.
     */
    static void paint(Canvas canvas, MapModel model, Theme theme, MapFit fit, String suffix, Wording wording) {
        Theme.Colours c = theme.colours();
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
            canvas.begin(Ids.of("frame", part.id()) + suffix);
            canvas.stroke(new Rectangle2D.Double(x, y, w, h), c.textMuted(), theme.lines().border().pt());
            paintName(canvas, theme, part, wording, x, y, w, bandU);
            if (part.scaleBandM() > 0) {
                paintOwnScale(canvas, theme, wording.numbers(), part, scale, x, y + h, part.scaleBandM() * scale, bandU / Math.max(1, part.nameLines()));
            }
            canvas.end();
        }
    }

    /**
     * The name in its band: one line, or as many as the layout made room for when one does not fit (a scaled
     * part's name and its scale note break between the two first, and each breaks again where needed).
     */
    private static void paintName(Canvas canvas, Theme theme, MapPart part, Wording wording, double x, double y, double w, double bandU) {
        Typesetter type = canvas.type();
        String label = part.frameLabel(wording);
        int lines = Math.max(1, part.nameLines());
        double lineBandU = bandU / lines;
        double legend = theme.typePt().legend();
        double size = Math.min(legend, legend * NAME_CAP_SHARE * (lines == 1 ? bandU : lineBandU * 1.15) / type.capHeight(legend));
        double room = w - lineBandU * 0.6;
        List<String> text = List.of(label);
        if (type.width(label, size, false) > room && lines > 1) {
            List<String> given = part.frameLabelLines(wording);
            List<String> wrapped = given.isEmpty() ? type.wrap(label, size, false, room)
                    : given.size() == lines ? given
                    : given.stream().flatMap(line -> type.wrap(line, size, false, room).stream()).toList();
            text = wrapped.size() <= lines ? wrapped : List.of(label);
        }
        double widest = text.stream().mapToDouble(t -> type.width(t, size, false)).max().orElse(0);
        double fitted = widest > room ? size * room / widest : size;
        // never below the theme's smallest type (print preflight): a small print lets the name reach past its band
        fitted = Math.max(fitted, theme.typePt().minimum());
        double lineU = text.size() == 1 ? bandU : type.lineHeight(fitted);
        double baseline = text.size() == 1
                ? y + Math.max((bandU + type.capHeight(fitted)) / 2, bandU * 0.3 + type.capHeight(fitted))
                : y + (bandU - lineU * text.size()) / 2 + (lineU + type.capHeight(fitted)) / 2;
        for (String line : text) {
            canvas.text(line, x + lineBandU * 0.3, baseline, fitted, false, Canvas.Anchor.START,
                    theme.colours().text(), theme.colours().background());
            baseline += lineU;
        }
    }

    /**
     * The part's own area-scale square, bottom left in its frame: a round ground area whose square, drawn at the
     * part's area scale (linear factor sqrt(areaScale) on the map's page scale), fills most of the band.
     */
    private static void paintOwnScale(Canvas canvas, Theme theme, NumberWriter numbers, MapPart part, double scaleUnitsPerM, double x, double bottom,
                                      double scaleBandU, double insetU) {
        Typesetter type = canvas.type();
        AreaScale own = AreaScale.choose(scaleUnitsPerM * Math.sqrt(part.areaScale()), OWN_SQUARE_SHARE * scaleBandU);
        double side = own.sideU();
        double left = x + insetU * 0.3;
        double top = bottom - insetU * 0.3 - side;
        Rectangle2D.Double square = new Rectangle2D.Double(left, top, side, side);
        Theme.Colours c = theme.colours();
        canvas.precisely(() -> {
            canvas.fill(square, c.background());
            canvas.stroke(square, c.text(), theme.lines().border().pt());
        });
        double size = Math.max(theme.typePt().minimum(), Math.min(theme.typePt().legend(), theme.typePt().legend() * 0.8));
        canvas.text(own.label(numbers), left + side + 0.5 * size * type.unitsPerPt(), top + side / 2 + type.capHeight(size) / 2,
                size, false, Canvas.Anchor.START, c.text(), c.background());
    }
}
