package aequa.drawing;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Envelope;

import aequa.atlas.MapModel;
import aequa.wording.Wording;

/**
 * Where everything goes on the page, in page units: title, one panel per period (same scale in all),
 * then the legend beside the area scale (stacked on narrow pages), then caption and credits. The page
 * width is given; the height follows from the content unless it is given too, in which case the map
 * shrinks to leave room for the furniture.
 *
 * @param widthU      page width
 * @param heightU     page height (rounded up to the output's coarse step: 0.1 mm or 1 px)
 * @param marginU     margin on every side
 * @param titleLines  the title, broken into lines (empty when the options leave it out)
 * @param panels      the map panels, in period order
 * @param areaScale   the area-scale square
 * @param legend      the legend, as measured for {@code legendBox}
 * @param legendBox   where the legend goes
 * @param scaleBox    where the area scale goes
 * @param captionLines the caption, broken into lines
 * @param captionTopU  top of the caption block
 * @param creditLines  the credits, broken into lines
 * @param creditsTopU  top of the credits block
 * @param symbols     proportional circles, or null for a choropleth
 */
record Layout(double widthU, double heightU, double marginU, List<String> titleLines,
              List<Panel> panels, AreaScale areaScale, Legend legend, Rectangle2D legendBox, Rectangle2D scaleBox,
              List<String> captionLines, double captionTopU, List<String> creditLines, double creditsTopU,
              Symbols symbols) {

    /**
     * One map panel.
     *
     * @param period        index into the regions' values
     * @param label         the period shown above the panel, or empty for a single map
     * @param labelBaselineU baseline of the label
     * @param mapBox        the box the map is fitted into
     * @param fit           metres to page units for this panel
     */
    record Panel(int period, String label, double labelBaselineU, Rectangle2D mapBox, MapFit fit) {
    }

    /** Tallest map block relative to the page's inner width when the height is free (chosen by eye). */
    static final double MAX_MAP_ASPECT = 1.25;
    /** The same for small multiples, lower so panels sit side by side rather than stacked (chosen by eye). */
    static final double MAX_MULTIPLES_ASPECT = 0.6;
    /** Target side of the area-scale square, in ems of legend type (chosen by eye). */
    static final double SCALE_SQUARE_EM = 2.6;
    /** The page's margin on every side, points (chosen by eye). */
    static final double MARGIN_PT = 6;
    /** Points per millimetre: 72 points to the inch of 25.4 mm (PostScript point, the unit of PDF). */
    static final double PT_PER_MM = 72 / 25.4;

    static Layout compute(MapModel model, Theme theme, Typesetter type, DrawOptions options, Medium medium,
                          double widthU, double fixedHeightU, Envelope extentM, boolean circles) {
        double upt = type.unitsPerPt();
        double margin = MARGIN_PT * upt;
        double gap = 6 * upt;
        double inner = widthU - 2 * margin;
        Theme.TypeSizes sizes = theme.typePt();
        double em = sizes.legend() * upt;

        List<String> titleLines = options.title() ? type.wrap(model.spec().title(), sizes.title(), true, inner) : List.of();
        double titleH = titleLines.isEmpty() ? 0 : titleLines.size() * type.lineHeight(sizes.title()) + gap;

        // panel grid: the column count that gives the largest common scale
        int n = Math.max(1, model.periods().size());
        double panelLabelH = n > 1 ? type.lineHeight(sizes.legend()) : 0;
        double aspect = extentM.getHeight() / Math.max(extentM.getWidth(), 1e-9);

        // the legend and the area-scale block depend only on the width (and, for circles, the panel width)
        Wording w = options.wording();
        double scaleLabelW = type.width(new AreaScale(5_000_000, 1).label(w.numbers()), sizes.legend(), false);
        double scaleBlockW = Math.max(type.width(w.text("draw.areaScale"), sizes.legend(), true),
                SCALE_SQUARE_EM * em + 0.6 * em + scaleLabelW);
        double scaleBlockH = type.lineHeight(sizes.legend()) + 0.3 * em + SCALE_SQUARE_EM * em;
        boolean stacked = inner - scaleBlockW - 2 * em < 22 * em;
        double legendW = stacked ? inner : inner - scaleBlockW - 2 * em;

        // first pass at the natural height to size the symbols; they depend on the panel width only
        double naturalMaxH = inner * (n > 1 ? MAX_MULTIPLES_ASPECT : MAX_MAP_ASPECT);
        int columns = bestColumns(n, inner, naturalMaxH, panelLabelH, gap, aspect);
        double cellW = (inner - (columns - 1) * gap) / columns;
        Symbols symbols = null;
        if (circles) {
            double maxValue = Symbols.maxValue(model);
            double shortSide = Math.min(cellW, cellW * aspect);
            symbols = Double.isNaN(maxValue) ? null : new Symbols(maxValue,
                    Symbols.largestRadiusU(model, maxValue, cellW / extentM.getWidth(), shortSide, upt));
        }
        Legend legend = new Legend(model, theme, type, options.histogram(), symbols, w);
        double legendH = legend.height(legendW);
        double furnitureH = stacked ? legendH + gap + scaleBlockH : Math.max(legendH, scaleBlockH);

        // caption and credits (the caption's area-scale sentence is measured with a long stand-in figure)
        String captionProbe = Caption.caption(model, new AreaScale(5_000_000, 1), w);
        List<String> probeLines = type.wrap(captionProbe, sizes.caption(), false, inner);
        List<String> creditLines = type.wrap(Caption.credits(model, w), sizes.caption(), false, inner);
        double captionH = probeLines.size() * type.lineHeight(sizes.caption());
        double creditsH = creditLines.isEmpty() ? 0 : creditLines.size() * type.lineHeight(sizes.caption()) + 0.3 * em;

        double fixedParts = margin + titleH + gap + furnitureH + gap + captionH + creditsH + margin;
        double mapMaxH = Double.isNaN(fixedHeightU) ? naturalMaxH : Math.max(fixedHeightU - fixedParts, 10 * em);
        columns = bestColumns(n, inner, mapMaxH, panelLabelH, gap, aspect);
        cellW = (inner - (columns - 1) * gap) / columns;
        int rows = (int) Math.ceil(n / (double) columns);
        double cellMaxH = (mapMaxH - rows * panelLabelH - (rows - 1) * gap) / rows;
        double scale = Math.min(cellW / extentM.getWidth(), cellMaxH / extentM.getHeight());
        double cellH = extentM.getHeight() * scale;

        double top = margin + titleH;
        List<Panel> panels = new ArrayList<>();
        for (int p = 0; p < n; p++) {
            int row = p / columns;
            int col = p % columns;
            double x = margin + col * (cellW + gap);
            double y = top + row * (panelLabelH + cellH + gap);
            Rectangle2D box = new Rectangle2D.Double(x, y + panelLabelH, cellW, cellH);
            String label = n > 1 ? w.numbers().period(model.periods().get(p)) : "";
            panels.add(new Panel(p, label, y + type.capHeight(sizes.legend()), box, MapFit.at(scale, extentM, box)));
        }
        double y = top + rows * (panelLabelH + cellH) + (rows - 1) * gap + gap;

        AreaScale areaScale = AreaScale.choose(scale, SCALE_SQUARE_EM * em);
        Rectangle2D legendBox = new Rectangle2D.Double(margin, y, legendW, legendH);
        Rectangle2D scaleBox = stacked
                ? new Rectangle2D.Double(margin, y + legendH + gap, scaleBlockW, scaleBlockH)
                : new Rectangle2D.Double(margin + inner - scaleBlockW, y, scaleBlockW, scaleBlockH);
        y += furnitureH + gap;
        List<String> captionLines = type.wrap(Caption.caption(model, areaScale, w), sizes.caption(), false, inner);
        double captionTop = y;
        y += captionLines.size() * type.lineHeight(sizes.caption()) + 0.3 * em;
        double creditsTop = y;
        y += creditLines.size() * type.lineHeight(sizes.caption()) + margin;

        double stepsPerUnit = medium == Medium.PRINT ? 10 : 1; // heights in whole 0.1 mm or whole px
        double height = Double.isNaN(fixedHeightU) ? Math.ceil(y * stepsPerUnit - 1e-6) / stepsPerUnit : fixedHeightU;
        return new Layout(widthU, height, margin, titleLines, panels, areaScale, legend, legendBox, scaleBox,
                captionLines, captionTop, creditLines, creditsTop, symbols);
    }

    /**
     * The number of columns (1 to n) giving the largest scale, weighted by the share of grid cells in use so
     * that a grid with empty cells must earn its place; fewer columns win ties.
     */
    private static int bestColumns(int n, double inner, double mapMaxH, double labelH, double gap, double aspect) {
        int best = 1;
        double bestScale = -1;
        for (int c = 1; c <= n; c++) {
            int rows = (int) Math.ceil(n / (double) c);
            double cellW = (inner - (c - 1) * gap) / c;
            double cellMaxH = (mapMaxH - rows * labelH - (rows - 1) * gap) / rows;
            double s = Math.min(cellW, cellMaxH / aspect) * n / (double) (c * rows);
            if (s > bestScale * (1 + 1e-9)) {
                bestScale = s;
                best = c;
            }
        }
        return best;
    }
}
