package aequa.colour;

import java.util.ArrayList;
import java.util.List;

import aequa.colour.ColourRamp.RampCheck;
import aequa.project.ColourScheme;

/**
 * The checks every generated ramp carries in {@link ColourRamp#checks()}.
 *
 * <ul>
 *   <li>{@code adjacent-deltaE-<vision>} (ordered schemes) or {@code pairwise-deltaE-<vision>} (qualitative):
 *       the smallest OKLab difference between neighbouring classes (every pair, for qualitative sets), for
 *       normal vision and as simulated for protanopia, deuteranopia and tritanopia ({@link ColourVision}),
 *       at least {@value #DISTINGUISHABLE_DELTA_E}.</li>
 *   <li>{@code lightness-step} (ordered schemes): the smallest step of OKLab L away from the quiet end
 *       (the centre, for diverging ramps), at least {@value #MINIMUM_LIGHTNESS_STEP}: neighbouring classes
 *       then differ by three JNDs in lightness alone, so they stay apart in greyscale and for every
 *       colour vision, and the order of the classes reads from light to dark.</li>
 *   <li>{@code label-contrast}: the smallest WCAG 2.2 contrast of each fill's label colour, at least 4.5.</li>
 *   <li>{@code border-contrast-background}, {@code hatch-contrast-background}: WCAG 2.2 non-text contrast
 *       (SC 1.4.11) of dark (light) lines against the page, at least 3.</li>
 *   <li>{@code border-contrast-fills}, {@code hatch-contrast-fills} (qualitative sets, whose fills are all of
 *       middle lightness): the same lines against every fill, at least 3. Ordered ramps reach from near the
 *       page to far from it, so no one line colour can keep 3:1 against all their fills; lines drawn over
 *       their fills take each fill's label colour instead ({@code label-contrast}).</li>
 * </ul>
 *
 * <p>Threshold {@value #DISTINGUISHABLE_DELTA_E}: three just-noticeable differences in OKLab (the JND is
 * 0.02, CSS Color Module Level 4, section 13.2). One JND is measured on large, touching patches; map
 * classes are often small and apart, and the difference needed to tell colours apart grows as marks
 * shrink (Stone, Szafir and Setlur 2014, "An engineering model for color difference as a function of
 * size", Color and Imaging Conference), so a few JNDs are asked for. Dichromat simulations compress the
 * colour plane to a surface, so meeting the threshold there mostly rests on lightness steps.
 */
final class RampChecks {

    static final double DISTINGUISHABLE_DELTA_E = 0.06;
    /** Three JNDs of OKLab lightness (the JND is 0.02, CSS Color Module Level 4, section 13.2). */
    static final double MINIMUM_LIGHTNESS_STEP = 0.06;

    private RampChecks() {
    }

    static List<RampCheck> run(ColourScheme scheme, List<Rgb> fills, List<Rgb> labels, NonTextColours nonText) {
        boolean qualitative = scheme == ColourScheme.QUALITATIVE;
        List<RampCheck> checks = new ArrayList<>();
        for (ColourVision vision : ColourVision.values()) {
            double smallest = qualitative ? smallestPairwise(fills, vision) : smallestAdjacent(fills, vision);
            String name = (qualitative ? "pairwise-deltaE-" : "adjacent-deltaE-") + vision.label();
            checks.add(atLeast(name, smallest, DISTINGUISHABLE_DELTA_E));
        }
        if (!qualitative) {
            double step = smallestLightnessStep(fills, scheme == ColourScheme.DIVERGING, NonTextColours.isLight(nonText.background()));
            checks.add(atLeast("lightness-step", step, MINIMUM_LIGHTNESS_STEP));
        }
        double label = Double.POSITIVE_INFINITY;
        for (int i = 0; i < fills.size(); i++) {
            label = Math.min(label, WcagContrast.ratio(fills.get(i), labels.get(i)));
        }
        checks.add(atLeast("label-contrast", label, WcagContrast.TEXT_MINIMUM));
        checks.add(atLeast("border-contrast-background",
                WcagContrast.ratio(nonText.border(), nonText.background()), WcagContrast.NON_TEXT_MINIMUM));
        checks.add(atLeast("hatch-contrast-background",
                WcagContrast.ratio(nonText.noDataHatch(), nonText.noDataGround()), WcagContrast.NON_TEXT_MINIMUM));
        if (qualitative) {
            checks.add(atLeast("border-contrast-fills", smallestContrast(nonText.border(), fills),
                    WcagContrast.NON_TEXT_MINIMUM));
            checks.add(atLeast("hatch-contrast-fills", smallestContrast(nonText.noDataHatch(), fills),
                    WcagContrast.NON_TEXT_MINIMUM));
        }
        return checks;
    }

    private static RampCheck atLeast(String name, double measured, double threshold) {
        return new RampCheck(name, measured >= threshold, measured, threshold);
    }

    static double smallestAdjacent(List<Rgb> fills, ColourVision vision) {
        double smallest = Double.POSITIVE_INFINITY;
        for (int i = 1; i < fills.size(); i++) {
            smallest = Math.min(smallest, vision.seen(fills.get(i - 1)).deltaE(vision.seen(fills.get(i))));
        }
        return smallest;
    }

    static double smallestPairwise(List<Rgb> fills, ColourVision vision) {
        return smallestPairwise(fills.stream().map(vision::seen).toArray(OkLab[]::new));
    }

    /** The smallest OKLab difference between any two of {@code colours}. */
    static double smallestPairwise(OkLab[] colours) {
        double smallest = Double.POSITIVE_INFINITY;
        for (int i = 0; i < colours.length; i++) {
            for (int j = i + 1; j < colours.length; j++) {
                smallest = Math.min(smallest, colours[i].deltaE(colours[j]));
            }
        }
        return smallest;
    }

    private static double smallestContrast(Rgb line, List<Rgb> fills) {
        return fills.stream().mapToDouble(f -> WcagContrast.ratio(line, f)).min().orElse(Double.POSITIVE_INFINITY);
    }

    /**
     * The smallest step of OKLab L in the loud direction (down on a light page, up on a dark one): along the
     * ramp for sequential ramps; outwards from the middle on both arms for diverging ones.
     */
    static double smallestLightnessStep(List<Rgb> fills, boolean diverging, boolean lightPage) {
        double sign = lightPage ? -1 : 1;
        int n = fills.size();
        double smallest = Double.POSITIVE_INFINITY;
        for (int i = 1; i < n; i++) {
            double step = OkLab.fromRgb(fills.get(i)).lightness() - OkLab.fromRgb(fills.get(i - 1)).lightness();
            boolean lowArm = diverging && i <= n / 2;
            double outward = lowArm ? -step : step;
            if (diverging && n % 2 == 0 && i == n / 2) {
                continue; // the two middle classes of an even diverging ramp share one lightness
            }
            smallest = Math.min(smallest, sign * outward);
        }
        return smallest;
    }
}
