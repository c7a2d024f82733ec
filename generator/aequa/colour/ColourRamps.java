package aequa.colour;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import aequa.findings.Finding;
import aequa.project.ColoursSpec;

/**
 * The front door of colour: generates, checks and if need be adjusts the fills of a map's classes.
 *
 * <p>Order of attempts for sequential and diverging ramps, each checked with {@link RampChecks}; the first
 * that passes every check is returned, and every adjustment is a NOTE finding
 * ({@code colours-ramp-adjusted}):
 * <ol>
 *   <li>the standard lightness range (OKLab L {@value #QUIET_ON_LIGHT} to {@value #LOUD_ON_LIGHT} on a light
 *       page, {@value #QUIET_ON_DARK} to {@value #LOUD_ON_DARK} on a dark one);</li>
 *   <li>the widest range: quiet end {@value #WIDEST_QUIET_ON_LIGHT} (or {@value #WIDEST_QUIET_ON_DARK}),
 *       loud end as far as the border and hatch still keep 3:1 against the fill;</li>
 *   <li>the widest range with one class fewer, repeated down to 2 classes (3 for diverging). The outcome
 *       then holds fewer fills than asked for, with the WARNING {@code colours-fewer-classes}: the caller
 *       classifies again with {@code ramp.fills().size()} classes.</li>
 * </ol>
 * Qualitative sets try equal lightness, then alternating lightness, then a search over lightness, chroma
 * and hue ({@link QualitativeSearch}); their count is never reduced (each
 * fill is a category). A ramp that still fails is returned with its failed checks and the WARNING
 * {@code colours-ramp-fails-checks}. An unknown scheme is the ERROR {@code colours-unknown-scheme}.
 *
 * <p>The loud end is bounded by the non-text colours: on a light page, borders and hatching are dark, so
 * fills must stay light enough to keep 3:1 against them (on a dark page, the reverse).
 */
public final class ColourRamps {

    static final double QUIET_ON_LIGHT = 0.94;
    static final double LOUD_ON_LIGHT = 0.62;
    static final double WIDEST_QUIET_ON_LIGHT = 0.975;
    static final double QUIET_ON_DARK = 0.30;
    static final double LOUD_ON_DARK = 0.50;
    static final double WIDEST_QUIET_ON_DARK = 0.22;
    /** OKLCh chroma aimed at for the loud end; gamut mapping lowers it where sRGB cannot reach it. */
    static final double MAX_CHROMA = 0.16;
    static final double QUALITATIVE_CHROMA = 0.13;
    /** The lightness band a searched qualitative set may use (OKLab L); the border and hatch contrast bound it too. */
    static final double QUALITATIVE_LOWEST_ON_LIGHT = 0.55;
    static final double QUALITATIVE_HIGHEST_ON_LIGHT = 0.90;
    static final double QUALITATIVE_LOWEST_ON_DARK = 0.30;
    static final double QUALITATIVE_HIGHEST_ON_DARK = 0.70;
    /** Contrast margin above 3:1 when bounding the loud end, absorbing 8-bit rounding of the fills. */
    private static final double BOUND_MARGIN = 1.03;
    private static final double BOUND_STEP = 0.005;

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
        String scheme = spec.scheme();
        if (!List.of("sequential", "diverging", "qualitative").contains(scheme)) {
            findings.add(Finding.error("colours-unknown-scheme", file, place,
                    "Unknown colour scheme \"" + scheme + "\".", "Use sequential, diverging or qualitative."));
            return new RampOutcome(Optional.empty(), nonText, findings);
        }
        boolean lightPage = NonTextColours.isLight(background);
        double hue = normalHue(spec.hue());
        double hueLow = normalHue(spec.hueLow());
        ColourRamp ramp = "qualitative".equals(scheme)
                ? qualitative(hue, classCount, lightPage, nonText, file, place, findings)
                : ordered(scheme, hue, hueLow, classCount, lightPage, nonText, file, place, findings);
        if (ramp.fills().size() < classCount) {
            findings.add(Finding.warning("colours-fewer-classes", file, place,
                    String.format(Locale.ROOT, "Only %d %s classes can be told apart by every reader; %d were asked for.",
                            ramp.fills().size(), scheme, classCount),
                    "The map uses " + ramp.fills().size() + " classes; ask for that many to silence this."));
        }
        if (!ramp.passes()) {
            String failed = ramp.checks().stream().filter(c -> !c.passed()).map(ColourRamp.RampCheck::name)
                    .collect(Collectors.joining(", "));
            findings.add(Finding.warning("colours-ramp-fails-checks", file, place,
                    "The colours fail these checks: " + failed + ".",
                    "Try other hues, fewer classes or another scheme."));
        }
        return new RampOutcome(Optional.of(ramp), nonText, findings);
    }

    private static ColourRamp ordered(String scheme, double hue, double hueLow, int classCount, boolean lightPage,
                                      NonTextColours nonText, String file, String place, List<Finding> findings) {
        double quiet = lightPage ? QUIET_ON_LIGHT : QUIET_ON_DARK;
        double widestQuiet = lightPage ? WIDEST_QUIET_ON_LIGHT : WIDEST_QUIET_ON_DARK;
        double loudBound = loudBound(hue, nonText, lightPage);
        if ("diverging".equals(scheme)) {
            double other = loudBound(hueLow, nonText, lightPage);
            loudBound = lightPage ? Math.max(loudBound, other) : Math.min(loudBound, other);
        }
        double standardLoud = lightPage ? Math.max(LOUD_ON_LIGHT, loudBound) : Math.min(LOUD_ON_DARK, loudBound);
        ColourRamp ramp = build(scheme, hue, hueLow, classCount, new RampShapes.Shape(quiet, standardLoud, MAX_CHROMA), nonText);
        if (ramp.passes()) {
            return ramp;
        }
        RampShapes.Shape widest = new RampShapes.Shape(widestQuiet, loudBound, MAX_CHROMA);
        findings.add(adjusted(file, place, String.format(Locale.ROOT,
                "Widened the lightness range from %.3f-%.3f to %.3f-%.3f (OKLab L) so neighbouring classes differ more.",
                quiet, standardLoud, widestQuiet, loudBound)));
        ramp = build(scheme, hue, hueLow, classCount, widest, nonText);
        int minimum = "diverging".equals(scheme) ? 3 : 2;
        for (int count = classCount - 1; !ramp.passes() && count >= minimum; count--) {
            ColourRamp fewer = build(scheme, hue, hueLow, count, widest, nonText);
            findings.add(adjusted(file, place, "Tried " + count + " classes instead of " + classCount + "."));
            ramp = fewer;
        }
        return ramp;
    }

    private static ColourRamp qualitative(double hue, int classCount, boolean lightPage, NonTextColours nonText,
                                          String file, String place, List<Finding> findings) {
        double lightness = lightPage ? 0.74 : 0.40;
        double other = lightPage ? 0.60 : 0.52;
        ColourRamp ramp = withChecks("qualitative",
                RampShapes.qualitative(hue, classCount, lightness, other, QUALITATIVE_CHROMA, false), nonText);
        if (ramp.passes()) {
            return ramp;
        }
        findings.add(adjusted(file, place, String.format(Locale.ROOT,
                "Alternated lightness %.2f and %.2f (OKLab L) so categories stay apart without hue.", lightness, other)));
        ramp = withChecks("qualitative",
                RampShapes.qualitative(hue, classCount, lightness, other, QUALITATIVE_CHROMA, true), nonText);
        if (ramp.passes()) {
            return ramp;
        }
        double low = lightPage ? QUALITATIVE_LOWEST_ON_LIGHT : QUALITATIVE_LOWEST_ON_DARK;
        double high = lightPage ? QUALITATIVE_HIGHEST_ON_LIGHT : QUALITATIVE_HIGHEST_ON_DARK;
        ColourRamp searched = withChecks("qualitative", new QualitativeSearch(nonText, low, high)
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

    private static ColourRamp build(String scheme, double hue, double hueLow, int count, RampShapes.Shape shape,
                                    NonTextColours nonText) {
        List<Rgb> fills = "diverging".equals(scheme)
                ? RampShapes.diverging(hueLow, hue, count, shape)
                : RampShapes.sequential(hue, count, shape);
        return withChecks(scheme, fills, nonText);
    }

    private static ColourRamp withChecks(String scheme, List<Rgb> fills, NonTextColours nonText) {
        List<Rgb> labels = fills.stream().map(WcagContrast::labelColour).collect(Collectors.toList());
        return new ColourRamp(scheme, fills, labels, RampChecks.run(scheme, fills, labels, nonText));
    }

    /**
     * The loudest OKLab lightness at which a fill of this hue (at {@link #MAX_CHROMA}, gamut-mapped) keeps
     * 3:1 against both the border and the hatch, searched from the quiet end outwards.
     */
    static double loudBound(double hue, NonTextColours nonText, boolean lightPage) {
        double step = lightPage ? -BOUND_STEP : BOUND_STEP;
        double l = lightPage ? WIDEST_QUIET_ON_LIGHT : WIDEST_QUIET_ON_DARK;
        double lastGood = l;
        while (l > 0 && l < 1) {
            Rgb fill = GamutMapping.toRgb(new OkLch(l, MAX_CHROMA, hue));
            double worst = Math.min(WcagContrast.ratio(fill, nonText.border()), WcagContrast.ratio(fill, nonText.noDataHatch()));
            if (worst < WcagContrast.NON_TEXT_MINIMUM * BOUND_MARGIN) {
                break;
            }
            lastGood = l;
            l += step;
        }
        return lastGood;
    }

    private static Finding adjusted(String file, String place, String message) {
        return Finding.note("colours-ramp-adjusted", file, place, message, "");
    }

    private static double normalHue(double hueDeg) {
        double h = hueDeg % 360;
        return h < 0 ? h + 360 : h;
    }
}
