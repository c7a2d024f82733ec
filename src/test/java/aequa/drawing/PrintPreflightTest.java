package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

import aequa.atlas.MapModel;
import aequa.colour.ColourRamp;
import aequa.colour.Rgb;
import aequa.colour.WcagContrast;
import aequa.findings.Finding;
import aequa.project.ColourScheme;

/** The print preflight against crafted themes and ramps, each with the one problem it must report. */
class PrintPreflightTest {

    private static final MapModel MODEL = MapFixtures.choropleth(10, 8);
    private static final Theme NEWSPRINT = Themes.bundled("newsprint");
    private static final PrintSize SIZE = PrintSize.of(PrintPreset.TWO_COLUMNS);

    private static Set<String> codes(MapModel model, Theme theme) {
        DrawnMap map = MapDrawings.printSvg(model, theme, SIZE);
        return PrintPreflight.check(model, theme, map, "map.svg").stream().map(Finding::code).collect(Collectors.toSet());
    }

    @Test
    void theBundledPrintThemeWithAGoodRampPasses() {
        assertEquals(Set.of(), codes(MODEL, NEWSPRINT));
    }

    @Test
    void typeBelowTheMinimumIsReported() {
        Theme.TypeSizes t = NEWSPRINT.typePt();
        Theme small = new Theme("small", "", NEWSPRINT.colours(), NEWSPRINT.fonts(),
                new Theme.TypeSizes(t.title(), t.label(), t.legend(), 5.0, t.minimum(), t.minimumReversed()),
                NEWSPRINT.lines(), NEWSPRINT.print());
        DrawnMap map = MapDrawings.printSvg(MODEL, small, SIZE);
        List<Finding> findings = PrintPreflight.check(MODEL, small, map, "map.svg");
        assertEquals(Set.of("print-type-too-small"), findings.stream().map(Finding::code).collect(Collectors.toSet()));
        // 5 pt is 1.7639 mm; fonts are set to 1/100 mm, so the drawn size is 1.76 mm = 4.99 pt
        assertTrue(findings.get(0).message().contains("4.99 pt, below the theme's minimum of 7.00 pt"), findings.get(0).message());
    }

    @Test
    void reversedTypeNeedsTheLargerMinimum() {
        // a crafted inventory: the same 7.5 pt type dark on light (allowed, minimum 7) and light on dark (minimum 8)
        Inventory inventory = new Inventory();
        Rgb dark = new Rgb(38, 38, 38);
        Rgb light = new Rgb(255, 255, 255);
        inventory.text(new Inventory.TextMark("Dorval", 7.5, dark, light, "labels"));
        DrawnMap plain = new DrawnMap(DrawnMap.Format.PRINT_SVG, new byte[0], 100, 100, "mm", 1e-3, null, inventory);
        assertEquals(List.of(), PrintPreflight.check(MODEL, NEWSPRINT, plain, "map.svg"));
        inventory.text(new Inventory.TextMark("Dorval", 7.5, light, dark, "labels"));
        List<Finding> findings = PrintPreflight.check(MODEL, NEWSPRINT, plain, "map.svg");
        assertEquals(1, findings.size(), findings.toString());
        assertTrue(findings.get(0).message().startsWith("Reversed"), findings.get(0).message());
    }

    @Test
    void reversedLabelsAreRaisedToTheReversedMinimum() {
        DrawnMap map = MapDrawings.printSvg(MODEL, NEWSPRINT, PrintSize.of(PrintPreset.FULL_WIDTH));
        boolean anyReversed = false;
        for (Inventory.TextMark t : map.inventory().texts()) {
            if (t.layer().equals("labels") && WcagContrast.relativeLuminance(t.colour()) > WcagContrast.relativeLuminance(t.background())) {
                anyReversed = true;
                assertEquals(NEWSPRINT.typePt().minimumReversed(), t.sizePt(), 0.02);
            }
        }
        assertTrue(anyReversed, "the fixture's darkest class carries white labels");
    }

    @Test
    void linesThinnerThanAQuarterPointAreReported() {
        Theme.Lines l = NEWSPRINT.lines();
        Theme thin = new Theme("thin", "", NEWSPRINT.colours(), NEWSPRINT.fonts(), NEWSPRINT.typePt(),
                new Theme.Lines(new LineWeight(0.1), l.outline(), l.graticule(), l.hatch(), l.symbolEdge()), NEWSPRINT.print());
        assertEquals(Set.of("print-line-too-thin"), codes(MODEL, thin));
    }

    @Test
    void heavyInkIsReported() {
        // rgb(60,0,0): naive separation K = 1 - 60/255 = 0.765, C = 0, M = Y = 1 -> 276 %, above newsprint's 240 %
        assertEquals(276.47, ColourMeasures.naiveTotalInkPercent(new Rgb(60, 0, 0)), 0.01);
        List<Rgb> fills = new ArrayList<>(MODEL.ramp().fills());
        fills.set(fills.size() - 1, new Rgb(60, 0, 0));
        MapModel heavy = withRamp(new ColourRamp(ColourScheme.SEQUENTIAL, fills, MODEL.ramp().labelColours(), List.of()));
        assertEquals(Set.of("print-ink-too-heavy"), codes(heavy, NEWSPRINT));
    }

    @Test
    void classesThatMergeInGreyscaleAreReported() {
        // a red and a green of nearly equal luminance: distinct in colour, the same grey
        List<Rgb> fills = new ArrayList<>(MODEL.ramp().fills());
        fills.set(1, new Rgb(230, 90, 90));
        fills.set(2, new Rgb(95, 160, 95));
        double delta = Math.abs(ColourMeasures.greyLightness(fills.get(1)) - ColourMeasures.greyLightness(fills.get(2)));
        assertTrue(delta < 6, "crafted pair differs by " + delta + " L*");
        MapModel grey = withRamp(new ColourRamp(ColourScheme.SEQUENTIAL, fills, MODEL.ramp().labelColours(), List.of()));
        List<Finding> findings = PrintPreflight.check(grey, NEWSPRINT, MapDrawings.printSvg(grey, NEWSPRINT, SIZE), "map.svg");
        assertTrue(findings.stream().anyMatch(f -> f.code().equals("print-classes-grey") && f.place().equals("classes 2 and 3")),
                findings.toString());
    }

    private static MapModel withRamp(ColourRamp ramp) {
        return new MapModel(MODEL.spec(), MODEL.periods(), MODEL.projection(), MODEL.regions(), MODEL.classification(), ramp,
                MODEL.areaAudit(), MODEL.notices());
    }
}
