package aequa.statistics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.MapDisplay;
import aequa.project.Measure;
import aequa.project.Normalisation;
import aequa.project.ProjectFile;

/**
 * Refuses counts on a choropleth that does not normalise them. Filling regions by a count makes large
 * regions look important because they are large: the eye reads the filled area, not the number.
 *
 * <p>A map is refused ({@code count-on-choropleth}, error) when its display is a choropleth, it does not
 * normalise, and either it declares {@code measure: count}, or it declares no measure and its values
 * <em>look like counts</em>. The heuristic, kept simple on purpose:
 * <ol>
 *   <li>at least {@value #MIN_VALUES} reported values (pooled over the map's periods) in regions with a
 *       positive area;</li>
 *   <li>every one of them a non-negative whole number;</li>
 *   <li>they rise with region area: Spearman's rank correlation with the geodesic area is at least
 *       {@value #MIN_AREA_CORRELATION}.</li>
 * </ol>
 * A map that declares {@code measure: rate} is never refused.
 */
final class CountGuard {

    /** Fewer values say too little about a trend; a small table of regions is too small to judge. */
    static final int MIN_VALUES = 5;

    /**
     * A correlation of 0.5 or more is a "large" association in Cohen's conventional scale (Cohen 1988,
     * "Statistical Power Analysis for the Behavioral Sciences", 2nd ed., section 3.2; from memory).
     */
    static final double MIN_AREA_CORRELATION = 0.5;

    private CountGuard() {
    }

    /**
     * @param values  the reported values as given, pooled over the periods
     * @param areaKm2 the geodesic area of the region of each value, same order
     */
    static void check(MapFigureSettings settings, List<Double> values, List<Double> areaKm2, Findings findings) {
        if (settings.display() != MapDisplay.CHOROPLETH || settings.normalisation() != Normalisation.NONE) {
            return;
        }
        String why;
        if (settings.measure() == Measure.COUNT) {
            why = "it is declared a count (measure: count)";
        } else if (settings.measure() == Measure.UNDECLARED) {
            double correlation = countLikeness(values, areaKm2);
            if (Double.isNaN(correlation)) {
                return;
            }
            why = String.format(Locale.ROOT, "its values look like counts: all %d are non-negative whole numbers,"
                    + " and they rise with region area (Spearman rank correlation %.2f, at least %.1f)",
                    countWithArea(values, areaKm2), correlation, MIN_AREA_CORRELATION);
        } else {
            return;
        }
        findings.add(Finding.error("count-on-choropleth", ProjectFile.FILE_NAME, "map \"" + settings.mapId() + "\"",
                "Map \"" + settings.mapId() + "\" would fill regions by \"" + settings.indicator()
                        + "\" without normalising it, and " + why + "; large regions would dominate the map"
                        + " because they are large, not because the figure is high there.",
                "Normalise it (normalise: area, or normalise: column with per: a denominator such as population),"
                        + " or show it as proportional circles with display: circles"
                        + (settings.measure() == Measure.UNDECLARED
                        ? "; if the figures already are rates or shares, declare measure: rate." : ".")));
    }

    /**
     * The rank correlation of the values with area when they pass tests 1 and 2 of the heuristic and the
     * correlation reaches the threshold; NaN otherwise.
     */
    static double countLikeness(List<Double> values, List<Double> areaKm2) {
        List<double[]> pairs = new ArrayList<>();
        for (int i = 0; i < values.size(); i++) {
            double area = areaKm2.get(i);
            if (area > 0 && !Double.isInfinite(area)) {
                pairs.add(new double[] {values.get(i), area});
            }
        }
        if (pairs.size() < MIN_VALUES) {
            return Double.NaN;
        }
        for (double[] pair : pairs) {
            if (!(pair[0] >= 0) || pair[0] != Math.rint(pair[0])) {
                return Double.NaN;
            }
        }
        double[] x = pairs.stream().mapToDouble(p -> p[0]).toArray();
        double[] y = pairs.stream().mapToDouble(p -> p[1]).toArray();
        double correlation = RankCorrelation.spearman(x, y);
        return correlation >= MIN_AREA_CORRELATION ? correlation : Double.NaN;
    }

    private static long countWithArea(List<Double> values, List<Double> areaKm2) {
        return areaKm2.stream().filter(a -> a > 0 && !Double.isInfinite(a)).count();
    }
}
