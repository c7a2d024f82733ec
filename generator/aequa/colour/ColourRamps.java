package aequa.colour;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import aequa.findings.Finding;
import aequa.project.ColourScheme;
import aequa.project.ColoursSpec;

/**
 * The front door of colour: generates, checks and if need be adjusts the fills of a map's classes.
 *
 * <p>Sequential and diverging ramps run in OKLab lightness from {@value #QUIET_ON_LIGHT} (the class closest
 * to the page) to {@value #LOUD_ON_LIGHT} on a light page, and from {@value #QUIET_ON_DARK} to
 * {@value #LOUD_ON_DARK} on a dark one: nearly the whole usable range, so that the loudest class is dark
 * (light) and neighbouring classes are far apart in lightness as well as in hue and chroma. The ends are
 * common practice for sequential choropleth ramps (a near-white first class; a last class dark enough that
 * white labels read on it); the step between neighbouring classes is then {@code (0.97 - 0.30) / (n - 1)},
 * 0.168 for five classes, and at least {@value RampChecks#MINIMUM_LIGHTNESS_STEP} is checked
 * ({@code lightness-step}), so classes stay apart in greyscale print too. Lines drawn over fills do not bound
 * the range: the hatching of unreliable values takes each fill's label colour (checked at 4.5:1 by
 * {@code label-contrast}); no-data hatching lies on the page colour, never on a fill.
 *
 * <p>A ramp that fails a check is built again with one class fewer, down to 2 classes (3 for diverging),
 * each attempt a NOTE ({@code colours-ramp-adjusted}); fewer fills than asked for give the WARNING
 * {@code colours-fewer-classes}, and the caller classifies again with {@code ramp.fills().size()} classes.
 * Qualitative sets try equal lightness, then alternating lightness, then a search over lightness, chroma
 * and hue ({@link QualitativeSearch}); their count is never reduced (each fill is a category), and their
 * fills also keep 3:1 against dark lines. A ramp that still fails is returned with its failed checks and
 * the WARNING {@code colours-ramp-fails-checks}.
 */
public final class ColourRamps {

    /*
     * Where the values below come from. The light-page ends follow the common practice stated in the class
     * comment; ColourRampsTest re-derives them from the 8-bit fills. The dark-page ends, the chroma targets and
     * the qualitative band are tuned, not taken from a published table: set by hand so that every hue passes
     * RampChecks (WCAG 2.2 contrast, a CIEDE-style difference in OKLab under four colour visions); what keeps
     * them honest is ColourRampsTest (every hue, 2 to 9 classes, on light and dark pages; qualitative sets of
     * 5 to 12 on both), which fails when a change breaks a check.
     */
    static final double QUIET_ON_LIGHT = 0.97;
    static final double LOUD_ON_LIGHT = 0.30;
    static final double QUIET_ON_DARK = 0.27;
    static final double LOUD_ON_DARK = 0.92;
    /** OKLCh chroma aimed at for the loud end; gamut mapping lowers it where sRGB cannot reach it. */
    static final double MAX_CHROMA = 0.16;
    static final double QUALITATIVE_CHROMA = 0.13;
    /** The lightness band a searched qualitative set may use (OKLab L); the border and hatch contrast bound it too. */
    static final double QUALITATIVE_LOWEST_ON_LIGHT = 0.55;
    static final double QUALITATIVE_HIGHEST_ON_LIGHT = 0.90;
    static final double QUALITATIVE_LOWEST_ON_DARK = 0.30;
    static final double QUALITATIVE_HIGHEST_ON_DARK = 0.70;

    private ColourRamps() {
    }

    /**
     * @param spec       scheme and hues from the project file (hues in degrees on the OKLCh circle, any real)
     * @param classCount the number of classes, at least 1
     * @param background the page colour the map is drawn on
     * @param file       the project file, for findings
     * @param place      where in it, for example {@code map "clinics"}, for findings
     */
    public static RampOutcome generate(ColoursSpec spec, int classCount, Rgb background, String file, String place) {
        if (classCount < 1) {
            throw new IllegalArgumentException("classCount must be at least 1: " + classCount);
        }
        NonTextColours nonText = NonTextColours.forBackground(background);
        List<Finding> findings = new ArrayList<>();
        ColourScheme scheme = spec.scheme();
        boolean lightPage = NonTextColours.isLight(background);
        double hue = normalHue(spec.hue());
        double hueLow = normalHue(spec.hueLow());
        ColourRamp ramp = scheme == ColourScheme.QUALITATIVE
                ? qualitative(hue, classCount, lightPage, nonText, file, place, findings)
                : ordered(scheme, hue, hueLow, classCount, lightPage, nonText, file, place, findings);
        if (ramp.fills().size() < classCount) {
            findings.add(Finding.warning("colours-fewer-classes", file, place,
                    String.format(Locale.ROOT, "Only %d %s classes can be told apart by every reader; %d were asked for.",
                            ramp.fills().size(), scheme.configName(), classCount),
                    "The map uses " + ramp.fills().size() + " classes; ask for that many to silence this."));
        }
        if (!ramp.passes()) {
            String failed = ramp.checks().stream().filter(c -> !c.passed()).map(ColourRamp.RampCheck::name)
                    .collect(Collectors.joining(", "));
            findings.add(Finding.warning("colours-ramp-fails-checks", file, place,
                    "The colours fail these checks: " + failed + ".",
                    "Try other hues, fewer classes or another scheme."));
        }
        return new RampOutcome(ramp, nonText, findings);
    }

    private static ColourRamp ordered(ColourScheme scheme, double hue, double hueLow, int classCount, boolean lightPage,
                                      NonTextColours nonText, String file, String place, List<Finding> findings) {
        RampShapes.Shape shape = lightPage
                ? new RampShapes.Shape(QUIET_ON_LIGHT, LOUD_ON_LIGHT, MAX_CHROMA)
                : new RampShapes.Shape(QUIET_ON_DARK, LOUD_ON_DARK, MAX_CHROMA);
        ColourRamp ramp = build(scheme, hue, hueLow, classCount, shape, nonText);
        int minimum = scheme == ColourScheme.DIVERGING ? 3 : 2;
        for (int count = classCount - 1; !ramp.passes() && count >= minimum; count--) {
            findings.add(adjusted(file, place, "Tried " + count + " classes instead of " + classCount + "."));
            ramp = build(scheme, hue, hueLow, count, shape, nonText);
        }
        return ramp;
    }

    private static ColourRamp qualitative(double hue, int classCount, boolean lightPage, NonTextColours nonText,
                                          String file, String place, List<Finding> findings) {
        double lightness = lightPage ? 0.74 : 0.40;
        double other = lightPage ? 0.60 : 0.52;
        ColourRamp ramp = withChecks(ColourScheme.QUALITATIVE,
                RampShapes.qualitative(hue, classCount, lightness, other, QUALITATIVE_CHROMA, false), nonText);
        if (ramp.passes()) {
            return ramp;
        }
        findings.add(adjusted(file, place, String.format(Locale.ROOT,
                "Alternated lightness %.2f and %.2f (OKLab L) so categories stay apart without hue.", lightness, other)));
        ramp = withChecks(ColourScheme.QUALITATIVE,
                RampShapes.qualitative(hue, classCount, lightness, other, QUALITATIVE_CHROMA, true), nonText);
        if (ramp.passes()) {
            return ramp;
        }
        double low = lightPage ? QUALITATIVE_LOWEST_ON_LIGHT : QUALITATIVE_LOWEST_ON_DARK;
        double high = lightPage ? QUALITATIVE_HIGHEST_ON_LIGHT : QUALITATIVE_HIGHEST_ON_DARK;
        ColourRamp searched = withChecks(ColourScheme.QUALITATIVE, new QualitativeSearch(nonText, low, high)
                .search(RampShapes.qualitativePoints(hue, classCount, lightness, other, QUALITATIVE_CHROMA)), nonText);
        if (smallestCheckedDifference(searched) <= smallestCheckedDifference(ramp)) {
            return ramp;
        }
        findings.add(adjusted(file, place, String.format(Locale.ROOT,
                "Searched lightness %.2f-%.2f, chroma and hue for categories every reader can tell apart.", low, high)));
        return searched;
    }

    /** The smallest of a qualitative set's colour differences over all visions. */
    private static double smallestCheckedDifference(ColourRamp ramp) {
        return ramp.checks().stream().filter(c -> c.name().startsWith("pairwise-deltaE-"))
                .mapToDouble(ColourRamp.RampCheck::measured).min().orElse(0);
    }

    private static ColourRamp build(ColourScheme scheme, double hue, double hueLow, int count, RampShapes.Shape shape,
                                    NonTextColours nonText) {
        List<Rgb> fills = scheme == ColourScheme.DIVERGING
                ? RampShapes.diverging(hueLow, hue, count, shape)
                : RampShapes.sequential(hue, count, shape);
        return withChecks(scheme, fills, nonText);
    }

    private static ColourRamp withChecks(ColourScheme scheme, List<Rgb> fills, NonTextColours nonText) {
        List<Rgb> labels = fills.stream().map(WcagContrast::labelColour).collect(Collectors.toList());
        return new ColourRamp(scheme, fills, labels, RampChecks.run(scheme, fills, labels, nonText));
    }

    private static Finding adjusted(String file, String place, String message) {
        return Finding.note("colours-ramp-adjusted", file, place, message, "");
    }

    private static double normalHue(double hueDeg) {
        double h = hueDeg % 360;
        return h < 0 ? h + 360 : h;
    }
}
