package aequa.projection;

import java.util.Arrays;
import java.util.Comparator;
import java.util.function.ToDoubleFunction;

/**
 * The Nelder-Mead downhill simplex minimiser (Nelder and Mead 1965, The Computer Journal 7(4); coefficients
 * reflection 1, expansion 2, contraction 1/2, shrink 1/2, as in Lagarias et al. 1998, SIAM J. Optim. 9(1)).
 * Chosen because omega-max objectives are not differentiable (the worst sample changes as parameters move)
 * and have 1 to 4 parameters. Deterministic; no library in aequa's dependencies offers it (Apache Commons
 * Math is not one of them).
 */
final class NelderMead {

    private NelderMead() {
    }

    /**
     * Minimises {@code f} from {@code start}, with an initial simplex of {@code start} plus each coordinate
     * moved by its {@code steps} entry; stops after {@code maxEvaluations} or when the simplex's values
     * differ by less than {@code tolerance}. Returns the best point found.
     */
    static double[] minimise(ToDoubleFunction<double[]> f, double[] start, double[] steps, int maxEvaluations, double tolerance) {
        int n = start.length;
        double[][] simplex = new double[n + 1][];
        double[] values = new double[n + 1];
        simplex[0] = start.clone();
        values[0] = f.applyAsDouble(simplex[0]);
        for (int i = 0; i < n; i++) {
            simplex[i + 1] = start.clone();
            simplex[i + 1][i] += steps[i];
            values[i + 1] = f.applyAsDouble(simplex[i + 1]);
        }
        int evaluations = n + 1;
        Integer[] order = new Integer[n + 1];
        while (evaluations < maxEvaluations) {
            for (int i = 0; i <= n; i++) {
                order[i] = i;
            }
            final double[] v = values;
            Arrays.sort(order, Comparator.comparingDouble(i -> v[i]));
            double[][] s = new double[n + 1][];
            double[] sv = new double[n + 1];
            for (int i = 0; i <= n; i++) {
                s[i] = simplex[order[i]];
                sv[i] = values[order[i]];
            }
            simplex = s;
            values = sv;
            if (Math.abs(values[n] - values[0]) <= tolerance) {
                break;
            }
            double[] centroid = new double[n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    centroid[j] += simplex[i][j] / n;
                }
            }
            double[] reflected = along(centroid, simplex[n], -1.0);
            double fr = f.applyAsDouble(reflected);
            evaluations++;
            if (fr < values[0]) {
                double[] expanded = along(centroid, simplex[n], -2.0);
                double fe = f.applyAsDouble(expanded);
                evaluations++;
                replaceWorst(simplex, values, fe < fr ? expanded : reflected, Math.min(fe, fr));
            } else if (fr < values[n - 1]) {
                replaceWorst(simplex, values, reflected, fr);
            } else {
                boolean outside = fr < values[n];
                double[] contracted = along(centroid, outside ? reflected : simplex[n], 0.5);
                double fc = f.applyAsDouble(contracted);
                evaluations++;
                if (fc < (outside ? fr : values[n])) {
                    replaceWorst(simplex, values, contracted, fc);
                } else {
                    for (int i = 1; i <= n; i++) {
                        simplex[i] = along(simplex[0], simplex[i], 0.5);
                        values[i] = f.applyAsDouble(simplex[i]);
                        evaluations++;
                    }
                }
            }
        }
        int best = 0;
        for (int i = 1; i <= n; i++) {
            if (values[i] < values[best]) {
                best = i;
            }
        }
        return simplex[best];
    }

    /** from + t (to - from). */
    private static double[] along(double[] from, double[] to, double t) {
        double[] p = new double[from.length];
        for (int i = 0; i < p.length; i++) {
            p[i] = from[i] + t * (to[i] - from[i]);
        }
        return p;
    }

    private static void replaceWorst(double[][] simplex, double[] values, double[] point, double value) {
        simplex[simplex.length - 1] = point;
        values[values.length - 1] = value;
    }
}
