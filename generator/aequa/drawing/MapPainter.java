package aequa.drawing;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

import aequa.atlas.MapModel;
import aequa.atlas.MapPart;
import aequa.atlas.MapRegion;
import aequa.colour.Rgb;
import aequa.project.MapDisplay;

/**
 * Paints one {@link MapModel} onto a {@link Canvas}: the single drawing path behind SVG, PNG and PDF.
 * Layers, bottom to top, each a named group: background, title, per panel (globe and graticule, regions,
 * borders, outline, group outlines, symbols, labels, period label), legend, area scale, caption, credits.
 */
final class MapPainter {

    /** Graticule spacing for world maps, degrees (common practice). */
    private static final double WORLD_GRATICULE_DEG = 30;
    /** Candidate spacings for regional maps, degrees; the finest giving at most six lines across is used. */
    private static final double[] REGIONAL_GRATICULE_DEG = {1, 2, 5, 10, 15, 30};

    private final MapModel model;
    private final Theme theme;
    private final DrawOptions options;
    private final boolean circles;
    private final boolean wholeGlobe;
    private final boolean graticule;
    private final Envelope extentM;
    /** The outline of the whole globe in metres, when it is drawn (world maps with a graticule); else null. */
    private final Polygon globeM;

    MapPainter(MapModel model, Theme theme, DrawOptions options) {
        this.model = model;
        this.theme = theme;
        this.options = options;
        this.circles = model.spec().display() == MapDisplay.CIRCLES;
        this.wholeGlobe = GlobeLines.wholeGlobe(model.projection().projection());
        // the graticule of a composite map's main projection would be false in its framed parts
        this.graticule = !model.composite() && (options.graticule() == DrawOptions.Graticule.ALWAYS
                || (options.graticule() == DrawOptions.Graticule.AUTO && wholeGlobe));
        Envelope extent = new Envelope();
        for (MapRegion region : model.regions()) {
            if (!region.planarM().isEmpty()) {
                extent.expandToInclude(region.planarM().getEnvelopeInternal());
            }
        }
        for (MapPart part : model.parts()) {
            extent.expandToInclude(new Envelope(part.frame().minXM(), part.frame().maxXM(), part.frame().minYM(), part.frame().maxYM()));
        }
        this.globeM = wholeGlobe && graticule ? GlobeLines.globe(model.projection().projection()) : null;
        if (globeM != null) {
            extent.expandToInclude(globeM.getEnvelopeInternal());
        }
        if (extent.isNull()) {
            extent = new Envelope(-1, 1, -1, 1);
        }
        this.extentM = extent;
    }

    Layout layout(Typesetter type, Medium medium, double widthU, double fixedHeightU) {
        return Layout.compute(model, theme, type, options, medium, widthU, fixedHeightU, extentM, circles);
    }

    /**
     * @param web write data attributes and titles on regions
     */
    void paint(Canvas canvas, Layout layout, FixedDecimal precision, boolean web) {
        Theme.Colours c = theme.colours();
        Theme.TypeSizes sizes = theme.typePt();
        Typesetter type = canvas.type();
        canvas.rightToLeft(options.wording().language().rightToLeft());
        canvas.begin("background");
        canvas.fill(new Rectangle2D.Double(0, 0, layout.widthU(), layout.heightU()), c.background());
        canvas.end();
        if (!layout.titleLines().isEmpty()) {
            canvas.begin("title");
            double baseline = layout.marginU() + type.capHeight(sizes.title()); // the title block starts at the margin
            for (String line : layout.titleLines()) {
                boolean rtl = canvas.runsRightToLeft(line);
                canvas.text(line, rtl ? layout.widthU() - layout.marginU() : layout.marginU(), baseline, sizes.title(), true,
                        rtl ? Canvas.Anchor.END : Canvas.Anchor.START, c.text(), c.background());
                baseline += type.lineHeight(sizes.title());
            }
            canvas.end();
        }
        RegionFills fills = new RegionFills(model, theme);
        Geometry graticuleM = graticule ? graticuleLines() : null;
        boolean multiple = layout.panels().size() > 1;
        for (Layout.Panel panel : layout.panels()) {
            String suffix = multiple ? "-" + Ids.of("p", model.periods().get(panel.period())).substring(2) : "";
            String regionPrefix = multiple ? "r" + suffix : "r";
            List<Geometry> pages = new ArrayList<>(model.regions().size());
            for (MapRegion region : model.regions()) {
                pages.add(panel.fit().toPage(region.planarM()));
            }
            if (graticule && wholeGlobe) {
                paintGlobe(canvas, panel.fit(), graticuleM, precision, suffix);
            }
            // web: the inner borders are the stroke of the region fills, inherited from presentation attributes
            // on this group, rather than a second copy of every edge (which keeps large maps small); hatch lines
            // set their own stroke and the page's hover rule on a region overrides it (SVG 2, section 6.8)
            canvas.begin("regions" + suffix, web ? borderPresentation(canvas) : Map.of(), null);
            if (model.composite()) {
                PartFrames.paintRegionsByPart(canvas, model, pages, suffix,
                        partPages -> RegionFillLayer.paint(canvas, model, theme, fills, partPages, panel.period(), regionPrefix, web, precision, circles,
                                options.wording()));
            } else {
                RegionFillLayer.paint(canvas, model, theme, fills, pages, panel.period(), regionPrefix, web, precision, circles,
                        options.wording());
            }
            canvas.end();
            RegionFillLayer.paintBorders(canvas, theme, pages, precision, suffix, !web);
            if (!model.outlinesM().isEmpty()) {
                // group outlines (the states over a county map) in the weight and colour of the map's outer outline
                canvas.begin("group-outlines" + suffix);
                canvas.stroke(PagePaths.lines(panel.fit().toPage(model.outlinesM()), precision), c.outline(),
                        theme.lines().outline().pt());
                canvas.end();
            }
            if (model.composite()) {
                PartFrames.paint(canvas, model, theme, panel.fit(), suffix, options.wording());
            }
            if (graticule && !wholeGlobe) {
                canvas.begin("graticule" + suffix);
                canvas.stroke(PagePaths.lines(panel.fit().toPage(graticuleM), precision), c.graticule(), theme.lines().graticule().pt());
                canvas.end();
            }
            if (circles && layout.symbols() != null) {
                SymbolLayer.paint(canvas, model, theme, layout.symbols(), pages, panel.period(), "s" + suffix);
            }
            if (options.labels() && !multiple && !circles) {
                LabelLayer.paint(canvas, model, theme, fills, pages, panel.period());
            }
            if (multiple) {
                canvas.begin("period" + suffix);
                canvas.text(panel.label(), panel.mapBox().getX(), panel.labelBaselineU(), sizes.legend(), true,
                        Canvas.Anchor.START, c.text(), c.background());
                canvas.end();
            }
        }
        Rectangle2D legendBox = layout.legendBox();
        canvas.begin("legend");
        layout.legend().paint(canvas, legendBox.getX(), legendBox.getY(), legendBox.getWidth());
        canvas.end();
        paintAreaScale(canvas, layout);
        paintParagraph(canvas, "caption", layout.captionLines(), layout.captionTopU(), layout.marginU(), layout.widthU(), c.textMuted());
        paintParagraph(canvas, "credits", layout.creditLines(), layout.creditsTopU(), layout.marginU(), layout.widthU(), c.textMuted());
    }

    /** The theme's inner-border colour and weight in page units, as SVG presentation attributes. */
    private Map<String, String> borderPresentation(Canvas canvas) {
        Map<String, String> attributes = new LinkedHashMap<>();
        attributes.put("stroke", theme.colours().border().hex());
        attributes.put("stroke-width", new FixedDecimal(2).apply(theme.lines().border().pt() * canvas.unitsPerPt()));
        attributes.put("stroke-linejoin", "round");
        return attributes;
    }

    private Geometry graticuleLines() {
        var projection = model.projection().projection();
        if (wholeGlobe) {
            return GlobeLines.graticule(projection, WORLD_GRATICULE_DEG);
        }
        double[] box = GlobeLines.geographicBox(projection, extentM, 2);
        double span = Math.max(box[1] - box[0], box[3] - box[2]);
        double spacing = REGIONAL_GRATICULE_DEG[REGIONAL_GRATICULE_DEG.length - 1];
        for (double candidate : REGIONAL_GRATICULE_DEG) {
            if (span / candidate <= 6) {
                spacing = candidate;
                break;
            }
        }
        return GlobeLines.clip(GlobeLines.graticule(projection, spacing, box[0], box[1], box[2], box[3]), extentM);
    }

    private void paintGlobe(Canvas canvas, MapFit fit, Geometry graticuleM, FixedDecimal precision, String suffix) {
        Theme.Colours c = theme.colours();
        Geometry globe = fit.toPage(globeM);
        canvas.begin("globe" + suffix);
        canvas.fill(PagePaths.area(globe, precision), c.sea());
        canvas.stroke(PagePaths.lines(fit.toPage(graticuleM), precision), c.graticule(), theme.lines().graticule().pt());
        canvas.stroke(PagePaths.area(globe, precision), c.outline(), theme.lines().outline().pt());
        canvas.end();
    }

    private void paintAreaScale(Canvas canvas, Layout layout) {
        Theme.Colours c = theme.colours();
        double size = theme.typePt().legend();
        Typesetter type = canvas.type();
        Rectangle2D box = layout.scaleBox();
        AreaScale scale = layout.areaScale();
        canvas.begin("area-scale");
        canvas.text(options.wording().text("draw.areaScale"), box.getX(), box.getY() + type.capHeight(size), size, true, Canvas.Anchor.START, c.text(), c.background());
        double squareTop = box.getY() + type.lineHeight(size) + 0.3 * size * type.unitsPerPt();
        double side = scale.sideU();
        Rectangle2D.Double square = new Rectangle2D.Double(box.getX(), squareTop, side, side);
        canvas.precisely(() -> {
            canvas.fill(square, c.background());
            canvas.stroke(square, c.text(), theme.lines().border().pt());
        });
        canvas.text(scale.label(options.wording().numbers()), box.getX() + side + 0.6 * size * type.unitsPerPt(), squareTop + side / 2 + type.capHeight(size) / 2,
                size, false, Canvas.Anchor.START, c.text(), c.background());
        canvas.end();
    }

    private void paintParagraph(Canvas canvas, String id, List<String> lines, double top, double x, double layoutWidthU, Rgb colour) {
        if (lines.isEmpty()) {
            return;
        }
        double size = theme.typePt().caption();
        Typesetter type = canvas.type();
        canvas.begin(id);
        double baseline = top + type.capHeight(size);
        for (String line : lines) {
            // a right-to-left line is set against the right margin, as right-to-left paragraphs are
            boolean rtl = canvas.runsRightToLeft(line);
            canvas.text(line, rtl ? layoutWidthU - x : x, baseline, size, false, rtl ? Canvas.Anchor.END : Canvas.Anchor.START,
                    colour, theme.colours().background());
            baseline += type.lineHeight(size);
        }
        canvas.end();
    }
}
