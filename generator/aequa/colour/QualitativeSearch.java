package aequa.colour;

import java.util.List;
import java.util.Random;

/**
 * A qualitative set of {@code count} fills found by search, for when hues spread round the circle do not
 * stay apart for every reader: it maximises the smallest OKLab difference between any two fills, and
 * between any fill and the page, as seen with normal vision and each simulated dichromacy
 * ({@link ColourVision}), which is what {@link RampChecks} asks of a qualitative set, while every fill
 * keeps 3:1 against the border and the hatch and 4.5:1 against its label colour (WCAG 2.2) and a chroma
 * of at least {@value #MIN_CHROMA}, so no category looks like the neutral greys of missing figures.
 * Dichromats see the colour plane collapsed to a surface, so a set that works for all of them mixes
 * lightness and chroma as well as hue.
 *
 * <p>Method: stochastic hill climbing (common practice for such max-min spreading problems): starting
 * from the given set, one fill at a time is moved to a random nearby OKLCh point within the lightness
 * band, and the move is kept when the smallest difference does not shrink. The first fill keeps the
 * project's hue. The random sequence has a fixed seed, so the same request gives the same set.
 */
final class QualitativeSearch {

    private static final int STEPS = 6000;
    private static final long SEED = 20261202L;
    private static final double MAX_CHROMA = 0.17;
    private static final double MIN_CHROMA = 0.05;
    /** Contrast margin above the WCAG minimums, absorbing 8-bit rounding of the fills. */
    private static final double MARGIN = 1.03;

    private final NonTextColours nonText;
    private final double lowLightness;
    private final double highLightness;

    /**
     * @param lowLightness  lowest OKLab L a fill may take
     * @param highLightness highest OKLab L a fill may take
     */
    QualitativeSearch(NonTextColours nonText, double lowLightness, double highLightness) {
        this.nonText = nonText;
        this.lowLightness = lowLightness;
        this.highLightness = highLightness;
    }

    /** The best set found from {@code start} (OKLCh points; the first one's hue is kept). */
    List<Rgb> search(List<OkLch> start) {
        int n = start.size();
        OkLch[] points = start.toArray(new OkLch[0]);
        Rgb[] fills = new Rgb[n];
        // column n holds the page, which every fill must also differ from
        OkLab[][] seen = new OkLab[ColourVision.values().length][n + 1];
        see(nonText.background(), n, seen);
        for (int i = 0; i < n; i++) {
            fills[i] = GamutMapping.toRgb(points[i]);
            see(fills[i], i, seen);
        }
        double score = usable(fills) ? smallestDifference(seen) : -1;
        Random random = new Random(SEED + 31L * n + Math.round(points[0].hueDeg()));
        for (int step = 0; step < STEPS; step++) {
            int i = random.nextInt(n);
            double reach = 0.25 * (1 - (double) step / STEPS) + 0.02; // moves shrink as the search settles
            OkLch p = points[i];
            double l = clamp(p.lightness() + reach * 0.5 * random.nextGaussian(), lowLightness, highLightness);
            double c = clamp(p.chroma() + reach * 0.3 * random.nextGaussian(), MIN_CHROMA, MAX_CHROMA);
            double h = i == 0 ? p.hueDeg() : (p.hueDeg() + reach * 180 * random.nextGaussian() + 360) % 360;
            OkLch moved = new OkLch(l, c, h);
            Rgb fill = GamutMapping.toRgb(moved);
            if (!usable(fill)) {
                continue;
            }
            Rgb before = fills[i];
            fills[i] = fill;
            OkLab[] seenBefore = column(seen, i);
            see(fill, i, seen);
            double candidate = smallestDifference(seen);
            if (candidate >= score) {
                score = candidate;
                points[i] = moved;
            } else {
                fills[i] = before;
                for (int v = 0; v < seen.length; v++) {
                    seen[v][i] = seenBefore[v];
                }
            }
        }
        return List.of(fills);
    }


    private boolean usable(Rgb[] fills) {
        for (Rgb fill : fills) {
            if (!usable(fill)) {
                return false;
            }
        }
        return true;
    }

    private boolean usable(Rgb fill) {
        if (OkLch.of(OkLab.fromRgb(fill)).chroma() < MIN_CHROMA - 0.01) { // 8-bit rounding moves chroma a little
            return false;
        }
        double floor = WcagContrast.NON_TEXT_MINIMUM * MARGIN;
        return WcagContrast.ratio(fill, nonText.border()) >= floor
                && WcagContrast.ratio(fill, nonText.noDataHatch()) >= floor
                && WcagContrast.ratio(fill, WcagContrast.labelColour(fill)) >= WcagContrast.TEXT_MINIMUM * MARGIN;
    }

    private static void see(Rgb fill, int i, OkLab[][] seen) {
        for (ColourVision vision : ColourVision.values()) {
            seen[vision.ordinal()][i] = vision.seen(fill);
        }
    }

    private static OkLab[] column(OkLab[][] seen, int i) {
        OkLab[] column = new OkLab[seen.length];
        for (int v = 0; v < seen.length; v++) {
            column[v] = seen[v][i];
        }
        return column;
    }

    private static double smallestDifference(OkLab[][] seen) {
        double smallest = Double.POSITIVE_INFINITY;
        for (OkLab[] byVision : seen) {
            smallest = Math.min(smallest, RampChecks.smallestPairwise(byVision));
        }
        return smallest;
    }

    private static double clamp(double v, double low, double high) {
        return Math.max(low, Math.min(high, v));
    }
}
