package aequa.colour;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

import aequa.findings.Finding;
import aequa.findings.Severity;
import aequa.project.ColourScheme;
import aequa.project.ColoursSpec;
import aequa.project.Words;
import aequa.testing.ForkedJvm;

/** Generated ramps: shape, checks, adjustments and findings. */
class ColourRampsTest {

    private static final Rgb WHITE = Rgb.fromHex("#ffffff");
    private static final Rgb DARK_PAGE = Rgb.fromHex("#1b1b1f");

    private static RampOutcome generate(String scheme, double hue, double hueLow, int count, Rgb page) {
        return ColourRamps.generate(new ColoursSpec(Words.of(ColourScheme.class, scheme), hue, hueLow), count, page, "aequa.yaml", "map \"m\"");
    }

    @Test
    void sequentialRampsUpToNineClassesPassEveryCheckForEveryHue() {
        for (double hue = 0; hue < 360; hue += 30) {
            for (int count = 2; count <= 9; count++) {
                ColourRamp ramp = generate("sequential", hue, 0, count, WHITE).ramp();
                assertEquals(count, ramp.fills().size(), "hue " + hue);
                assertTrue(ramp.passes(), "hue " + hue + " count " + count + " " + failed(ramp));
                assertEquals(List.of("adjacent-deltaE-normal", "adjacent-deltaE-protanopia",
                                "adjacent-deltaE-deuteranopia", "adjacent-deltaE-tritanopia", "lightness-step",
                                "label-contrast", "border-contrast-background", "hatch-contrast-background"),
                        ramp.checks().stream().map(ColourRamp.RampCheck::name).collect(Collectors.toList()));
            }
        }
    }

    @Test
    void sequentialLightnessFallsAndHueHoldsOnALightPage() {
        ColourRamp ramp = generate("sequential", 150, 0, 6, WHITE).ramp();
        double previous = 2;
        for (Rgb fill : ramp.fills()) {
            OkLch lch = OkLch.of(OkLab.fromRgb(fill));
            assertTrue(lch.lightness() < previous, "monotonic lightness");
            previous = lch.lightness();
            assertEquals(150, lch.hueDeg(), 4, fill.hex()); // 8-bit rounding moves hue a little on faint tints
        }
        // on a dark page the order turns round: the quiet end is dark
        ColourRamp dark = generate("sequential", 150, 0, 5, DARK_PAGE).ramp();
        assertTrue(OkLab.fromRgb(dark.fills().get(0)).lightness() < OkLab.fromRgb(dark.fills().get(4)).lightness());
        assertTrue(dark.passes(), failed(dark));
    }

    /**
     * The stated figure: on a white page a sequential ramp runs from OKLab L 0.97 to 0.30, so five classes
     * are 0.1675 apart in lightness and the darkest class carries white labels. Lightness is measured here
     * from the 8-bit fills with the OKLab matrices of Ottosson 2020 (OkLabTest checks them against his
     * published values), so rounding and gamut mapping are included.
     */
    @Test
    void sequentialRampsUseTheWholeUsableLightnessRange() {
        for (double hue = 0; hue < 360; hue += 15) {
            List<Rgb> fills = generate("sequential", hue, 0, 5, WHITE).ramp().fills();
            double quiet = OkLab.fromRgb(fills.get(0)).lightness();
            double loud = OkLab.fromRgb(fills.get(4)).lightness();
            assertEquals(0.97, quiet, 0.005, "hue " + hue);
            assertEquals(0.30, loud, 0.005, "hue " + hue);
            for (int i = 1; i < 5; i++) {
                double step = OkLab.fromRgb(fills.get(i - 1)).lightness() - OkLab.fromRgb(fills.get(i)).lightness();
                assertEquals(0.1675, step, 0.006, "hue " + hue + " step " + i);
            }
            // WCAG 2.2 relative luminance of the darkest class: white text reaches 4.5:1 on it
            assertEquals(WcagContrast.LIGHT_TEXT, WcagContrast.labelColour(fills.get(4)), "hue " + hue);
        }
    }

    @Test
    void divergingRampsHaveANeutralLightMiddle() {
        for (int count : new int[] {3, 5, 7, 9}) {
            ColourRamp ramp = generate("diverging", 250, 40, count, WHITE).ramp();
            assertTrue(ramp.passes(), count + " " + failed(ramp));
            OkLch middle = OkLch.of(OkLab.fromRgb(ramp.fills().get(count / 2)));
            assertEquals(0, middle.chroma(), 0.005, "neutral middle");
            for (Rgb fill : ramp.fills()) {
                assertTrue(OkLab.fromRgb(fill).lightness() <= middle.lightness() + 1e-9, "middle is the lightest");
            }
            // the arms mirror each other in lightness
            for (int j = 0; j < count / 2; j++) {
                double low = OkLab.fromRgb(ramp.fills().get(j)).lightness();
                double high = OkLab.fromRgb(ramp.fills().get(count - 1 - j)).lightness();
                assertEquals(low, high, 0.01, "arm step " + j);
            }
        }
        ColourRamp even = generate("diverging", 250, 40, 6, WHITE).ramp();
        assertTrue(even.passes(), failed(even));
    }

    @Test
    void qualitativeSetsShareLightnessAndSpreadHues() {
        RampOutcome outcome = generate("qualitative", 250, 0, 3, WHITE);
        ColourRamp ramp = outcome.ramp();
        assertTrue(ramp.passes(), failed(ramp));
        assertEquals(List.of(), codes(outcome)); // passed at equal lightness, no adjustment
        double l0 = OkLab.fromRgb(ramp.fills().get(0)).lightness();
        for (Rgb fill : ramp.fills()) {
            assertEquals(l0, OkLab.fromRgb(fill).lightness(), 0.005, fill.hex());
        }
        assertEquals(List.of("pairwise-deltaE-normal", "pairwise-deltaE-protanopia", "pairwise-deltaE-deuteranopia",
                        "pairwise-deltaE-tritanopia"),
                ramp.checks().subList(0, 4).stream().map(ColourRamp.RampCheck::name).collect(Collectors.toList()));
    }

    @Test
    void tooManyClassesAreReducedWithNotesAndAWarning() {
        // 0.67 of lightness cannot hold 14 classes 0.06 apart: (0.97 - 0.30) / 13 = 0.052
        RampOutcome outcome = generate("sequential", 250, 0, 14, WHITE);
        ColourRamp ramp = outcome.ramp();
        assertTrue(ramp.fills().size() < 14 && ramp.fills().size() >= 9, "size " + ramp.fills().size()); // 9 = the project file's own largest count
        assertTrue(ramp.passes(), failed(ramp));
        List<String> codes = codes(outcome);
        assertEquals("colours-ramp-adjusted", codes.get(0));
        assertEquals("colours-fewer-classes", codes.get(codes.size() - 1));
    }

    /**
     * Nine categories at one or two lightnesses cannot stay apart for dichromats; the search over lightness,
     * chroma and hue finds a set that every check passes (checked by RampChecks, independently of the
     * search), with no neutral grey among them and each apart from the page, on a light and a dark page.
     */
    @Test
    void manyCategoriesAreSearchedUntilEveryReaderCanTellThemApart() {
        for (Rgb page : List.of(WHITE, Rgb.fromHex("#1b1f24"))) {
            for (int count : new int[] {5, 7, 9, 12}) {
                RampOutcome outcome = generate("qualitative", 0, 0, count, page);
                ColourRamp ramp = outcome.ramp();
                assertEquals(count, ramp.fills().size());
                assertTrue(ramp.passes(), count + " on " + page.hex() + ": " + failed(ramp));
                for (Rgb fill : ramp.fills()) {
                    assertTrue(OkLch.of(OkLab.fromRgb(fill)).chroma() >= 0.04, fill.hex() + " is nearly grey");
                    for (ColourVision vision : ColourVision.values()) {
                        assertTrue(vision.seen(fill).deltaE(vision.seen(page)) >= 0.06, fill.hex() + " too close to the page");
                    }
                }
            }
        }
        // nine categories need the search: the adjustments are reported, as notes only
        RampOutcome nine = generate("qualitative", 0, 0, 9, WHITE);
        assertFalse(nine.findings().isEmpty());
        for (Finding f : nine.findings()) {
            assertEquals("colours-ramp-adjusted", f.code());
            assertEquals(Severity.NOTE, f.severity());
        }
    }

    @Test
    void failingSetIsReturnedWithItsFailedChecksAndAWarning() {
        // 28 categories cannot all stay three JNDs apart for every reader within the usable lightness band
        RampOutcome outcome = generate("qualitative", 0, 0, 28, WHITE);
        ColourRamp ramp = outcome.ramp();
        assertEquals(28, ramp.fills().size());
        assertTrue(!ramp.passes());
        assertEquals(List.of("colours-ramp-adjusted", "colours-ramp-adjusted", "colours-ramp-fails-checks"), codes(outcome));
    }

    /**
     * Ramps, the qualitative search included, depend on their inputs only: made in a JVM that differs in
     * pool size, locale and time zone ({@link ForkedJvm}), every fill and every finding is the same.
     */
    @Test
    void sameColoursInAnotherJvm() throws Exception {
        assertEquals(RampsInAnotherJvm.describe(), ForkedJvm.output(RampsInAnotherJvm.class));
    }

    /** Prints the fills and findings of a diverging ramp and of searched qualitative sets on two pages. */
    static final class RampsInAnotherJvm {
        public static void main(String[] args) {
            ForkedJvm.print(describe());
        }

        static String describe() {
            StringBuilder text = new StringBuilder();
            List<RampOutcome> outcomes = new java.util.ArrayList<>(List.of(generate("diverging", 300, 120, 7, WHITE)));
            for (Rgb page : List.of(WHITE, Rgb.fromHex("#1b1f24"))) {
                for (int count : new int[] {9, 12}) {
                    outcomes.add(generate("qualitative", 0, 0, count, page));
                }
            }
            for (RampOutcome outcome : outcomes) {
                outcome.ramp().fills().forEach(fill -> text.append(fill.hex()).append(' '));
                outcome.findings().forEach(f -> text.append('\n').append(f.toLine()));
                text.append('\n');
            }
            return text.toString();
        }
    }

    @Test
    void huesAreReadModulo360() {
        // a hue is an angle on the OKLCh circle (Ottosson 2020): 370 degrees is 10 degrees
        assertEquals(generate("sequential", 10, 0, 5, WHITE).ramp(), generate("sequential", 370, 0, 5, WHITE).ramp());
    }

    @Test
    void nonTextColoursMeetThreeToOneOnAnyPage() {
        for (String page : new String[] {"#ffffff", "#f4f1ea", "#777777", "#767676", "#1b1b1f", "#000000", "#203060"}) {
            NonTextColours colours = NonTextColours.forBackground(Rgb.fromHex(page));
            assertTrue(WcagContrast.ratio(colours.border(), colours.background()) >= 3, page);
            assertTrue(WcagContrast.ratio(colours.noDataHatch(), colours.noDataGround()) >= 3, page);
            assertEquals(Rgb.fromHex(page), colours.noDataGround());
        }
    }

    @Test
    void continuousColoursRunThroughTheFills() {
        ColourRamp ramp = generate("sequential", 200, 0, 5, WHITE).ramp();
        assertEquals(ramp.fills().get(0), ramp.colourAt(0));
        assertEquals(ramp.fills().get(2), ramp.colourAt(0.5));
        assertEquals(ramp.fills().get(4), ramp.colourAt(1));
        assertEquals(ramp.fills().get(4), ramp.colourAt(7)); // clamped
        // between two fills: lightness between theirs (OKLab interpolation is linear in L)
        double l = OkLab.fromRgb(ramp.colourAt(0.125)).lightness();
        double l0 = OkLab.fromRgb(ramp.fills().get(0)).lightness();
        double l1 = OkLab.fromRgb(ramp.fills().get(1)).lightness();
        assertEquals((l0 + l1) / 2, l, 0.005);
    }

    private static String failed(ColourRamp ramp) {
        return ramp.checks().stream().filter(c -> !c.passed()).map(Object::toString).collect(Collectors.joining("; "));
    }

    private static List<String> codes(RampOutcome outcome) {
        return outcome.findings().stream().map(Finding::code).collect(Collectors.toList());
    }
}
