package aequa.projection;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A brute-force search over one family's parameters, independent of the chooser's Nelder-Mead: an even grid
 * over each parameter's range, zoomed around the best point a few times (each zoom half as wide). Scores
 * by omega max over all of the footprint's samples. Slow, for tests only.
 */
final class ExhaustiveSearch {

    /** The best omega max found and its parameters. */
    record Best(double omegaMaxDeg, Map<String, Double> parameters) {
    }

    /** One searched parameter and its range. */
    record Axis(String key, double from, double to) {
    }

    private ExhaustiveSearch() {
    }

    static Best run(ProjectionFamily family, Map<String, Double> fixed, List<Axis> axes, Footprint footprint,
                    int pointsPerAxis, int zooms) {
        double[] from = new double[axes.size()];
        double[] to = new double[axes.size()];
        for (int i = 0; i < axes.size(); i++) {
            from[i] = axes.get(i).from();
            to[i] = axes.get(i).to();
        }
        Best best = new Best(Double.POSITIVE_INFINITY, fixed);
        for (int zoom = 0; zoom <= zooms; zoom++) {
            int total = (int) Math.pow(pointsPerAxis, axes.size());
            for (int index = 0; index < total; index++) {
                Map<String, Double> values = new HashMap<>(fixed);
                int rest = index;
                for (int i = 0; i < axes.size(); i++) {
                    int k = rest % pointsPerAxis;
                    rest /= pointsPerAxis;
                    values.put(axes.get(i).key(), from[i] + (to[i] - from[i]) * k / (pointsPerAxis - 1));
                }
                double omega = omegaMax(family, values, footprint);
                if (omega < best.omegaMaxDeg()) {
                    best = new Best(omega, values);
                }
            }
            for (int i = 0; i < axes.size(); i++) {
                double width = (to[i] - from[i]) / 2;
                double centre = best.parameters().get(axes.get(i).key());
                from[i] = Math.max(axes.get(i).from(), centre - width / 2);
                to[i] = Math.min(axes.get(i).to(), centre + width / 2);
            }
        }
        return best;
    }

    static double omegaMax(ProjectionFamily family, Map<String, Double> values, Footprint footprint) {
        EqualAreaProjection projection = FamilySearch.build(family, values);
        if (projection == null) {
            return Double.POSITIVE_INFINITY;
        }
        OmegaScore score = OmegaScore.of(projection, footprint.samples());
        return Double.isFinite(score.score()) ? score.omegaMaxDeg() : Double.POSITIVE_INFINITY;
    }
}
