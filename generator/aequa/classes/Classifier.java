package aequa.classes;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import aequa.findings.Finding;
import aequa.project.ClassMethod;
import aequa.project.ClassesSpec;

/**
 * The front door of classification: turns the values of a map (all periods pooled by the caller, so small
 * multiples share one set of classes) and the project file's {@link ClassesSpec} into a
 * {@link Classification}.
 *
 * <p>Contract:
 * <ul>
 *   <li>NaN means "not classified" (no data, suppressed, not applicable) and is skipped silently. Every
 *       other value is finite: the normaliser reports a quotient beyond a double's range, with its row, and
 *       leaves it out; an infinite value here is an {@link IllegalArgumentException}.</li>
 *   <li>The spec is one the project file's checks accepted ({@code aequa.project.ProjectChecks}, which report
 *       a bad one with its line and stop before any input is read): at least 2 classes unless unclassed,
 *       manual breaks given, finite and strictly ascending, a finite midpoint for diverging classes. Any
 *       other spec is a programming error, an {@link IllegalArgumentException}.</li>
 *   <li>No value to classify gives the WARNING {@code classes-no-values} and no classification.</li>
 *   <li>When fewer classes than asked for are made (all values equal, fewer distinct values than classes,
 *       ties that make quantile breaks coincide) a NOTE {@code classes-fewer-than-requested} says why.</li>
 *   <li>The limits of quantile, equal-interval and natural-breaks classes are rounded by the rules of
 *       {@link ReadableBreaks}: one step for the whole map, a thirtieth of the range or finer, and values
 *       classed by the rounded limits. Manual breaks are used as given; diverging
 *       limits are exact multiples of a rounded step from the midpoint (see {@link CentredBreaks}).</li>
 *   <li>Deterministic: the result depends only on the multiset of values, not their order.</li>
 * </ul>
 */
public final class Classifier {

    private Classifier() {
    }

    /**
     * @param values the values to classify; NaN = not classified; not modified
     * @param spec   the classification asked for
     * @param file   the project file the spec came from, for findings
     * @param place  where in it, for example {@code map "clinics"}, for findings
     */
    public static Classified classify(double[] values, ClassesSpec spec, String file, String place) {
        List<Finding> findings = new ArrayList<>();
        ClassMethod method = spec.method();
        requireCheckedSpec(method, spec);
        double[] sorted = finiteSorted(values);
        if (sorted.length == 0) {
            findings.add(Finding.warning("classes-no-values", file, place,
                    "There is no value to classify.", "Check the join report: no region has a figure."));
            return new Classified(Optional.empty(), findings);
        }
        Drafted drafted = draft(method, spec, sorted);
        Classification classification = new Classification(method, boxed(drafted.limits),
                counts(sorted, drafted.limits));
        if (drafted.reduction != null) {
            findings.add(Finding.note("classes-fewer-than-requested", file, place,
                    String.format(Locale.ROOT, "Made %d classes instead of %d: %s.",
                            classification.classCount(), spec.count(), drafted.reduction),
                    "Nothing to do unless you want a different method or count."));
        }
        return new Classified(Optional.of(classification), findings);
    }

    /** The checks of {@code aequa.project.ProjectChecks}, which report a failing spec with its line first. */
    private static void requireCheckedSpec(ClassMethod method, ClassesSpec spec) {
        if (method == ClassMethod.MANUAL) {
            List<Double> breaks = spec.breaks();
            for (int i = 0; i < breaks.size(); i++) {
                double b = breaks.get(i);
                if (!Double.isFinite(b) || i > 0 && !(breaks.get(i - 1) < b)) {
                    throw new IllegalArgumentException("manual breaks must be finite and strictly ascending: " + breaks);
                }
            }
            if (breaks.isEmpty()) {
                throw new IllegalArgumentException("manual classes need breaks");
            }
        } else if (method != ClassMethod.UNCLASSED && spec.count() < 2) {
            throw new IllegalArgumentException("at least 2 classes are needed: " + spec.count());
        }
        if (method == ClassMethod.DIVERGING && (spec.midpoint() == null || !Double.isFinite(spec.midpoint()))) {
            throw new IllegalArgumentException("diverging classes need a finite midpoint: " + spec.midpoint());
        }
    }

    /** The values without NaN, sorted; an infinite value is refused (the normaliser keeps them out). */
    private static double[] finiteSorted(double[] values) {
        double[] sorted = Arrays.stream(values).filter(v -> !Double.isNaN(v)).toArray();
        if (Arrays.stream(sorted).anyMatch(Double::isInfinite)) {
            throw new IllegalArgumentException("values must be finite or NaN");
        }
        Arrays.sort(sorted);
        return sorted;
    }

    /** Limits for the method, and why fewer classes than asked for were made (null if not). */
    private record Drafted(double[] limits, String reduction) {
    }

    private static Drafted draft(ClassMethod method, ClassesSpec spec, double[] sorted) {
        double min = sorted[0];
        double max = sorted[sorted.length - 1];
        int k = spec.count();
        switch (method) {
            case UNCLASSED:
                return new Drafted(new double[] {ReadableBreaks.floorOuter(min), ReadableBreaks.ceilOuter(max)}, null);
            case MANUAL:
                return new Drafted(manual(spec.breaks(), min, max), null);
            case DIVERGING:
                if (min == spec.midpoint() && max == spec.midpoint()) {
                    return single(min, "every value equals the midpoint");
                }
                return new Drafted(CentredBreaks.diverging(sorted, k, spec.midpoint()), null);
            default:
                break;
        }
        if (min == max) {
            return single(min, "all " + sorted.length + " values are equal");
        }
        switch (method) {
            case STANDARD_DEVIATION:
                return new Drafted(CentredBreaks.standardDeviation(sorted, k), null);
            case EQUAL_INTERVAL:
                return dataRange(sorted, equalSteps(min, max, k), null);
            case NATURAL_BREAKS: {
                int[] starts = NaturalBreaks.classStarts(sorted, k);
                double[] raw = new double[starts.length];
                for (int c = 0; c < starts.length; c++) {
                    raw[c] = (sorted[starts[c] - 1] + sorted[starts[c]]) / 2; // midway between the two classes
                }
                String reduction = starts.length + 1 < k
                        ? "there are only " + (starts.length + 1) + " distinct values, each a class of its own" : null;
                return dataRange(sorted, raw, reduction);
            }
            case QUANTILE: {
                double[] raw = withoutEmptyClasses(sorted, Quantiles.innerBreaks(sorted, k));
                String reduction = raw.length + 1 < k
                        ? "repeated values fill more than one quantile, so some quantile classes would be empty" : null;
                return dataRange(sorted, raw, reduction);
            }
            default:
                throw new IllegalStateException("unhandled method " + method);
        }
    }

    private static Drafted single(double value, String reason) {
        return new Drafted(new double[] {value, value}, reason);
    }

    /** Limits spanning the data: rounded inner breaks between outward-rounded extremes. */
    private static Drafted dataRange(double[] sorted, double[] rawInner, String reduction) {
        java.util.Optional<double[]> onStep = ReadableBreaks.onStep(sorted, rawInner);
        if (onStep.isPresent()) {
            return new Drafted(onStep.get(), reduction);
        }
        double[] inner = ReadableBreaks.roundInner(sorted, rawInner);
        double[] limits = new double[inner.length + 2];
        limits[0] = ReadableBreaks.floorOuter(sorted[0]);
        System.arraycopy(inner, 0, limits, 1, inner.length);
        limits[limits.length - 1] = ReadableBreaks.ceilOuter(sorted[sorted.length - 1]);
        return new Drafted(limits, reduction);
    }

    private static double[] equalSteps(double min, double max, int k) {
        double[] inner = new double[k - 1];
        for (int c = 1; c < k; c++) {
            inner[c - 1] = min + (max - min) * c / k;
        }
        return inner;
    }

    /** Manual breaks as given; outer limits reach the data or the outermost break, whichever is further. */
    private static double[] manual(List<Double> breaks, double min, double max) {
        double[] limits = new double[breaks.size() + 2];
        for (int i = 0; i < breaks.size(); i++) {
            limits[i + 1] = breaks.get(i);
        }
        limits[0] = ReadableBreaks.floorOuter(Math.min(min, breaks.get(0)));
        limits[limits.length - 1] = ReadableBreaks.ceilOuter(Math.max(max, breaks.get(breaks.size() - 1)));
        return limits;
    }

    /**
     * Drops breaks that would leave a class empty (possible for quantiles when values repeat): a break is
     * kept only if at least one value lies between it and the last kept break, and at least one at or above it.
     */
    static double[] withoutEmptyClasses(double[] sorted, double[] raw) {
        double[] kept = new double[raw.length];
        int size = 0;
        int lastStart = 0;
        for (double b : raw) {
            int start = ReadableBreaks.lowerBound(sorted, b);
            if (start > lastStart && start < sorted.length) {
                kept[size++] = b;
                lastStart = start;
            }
        }
        return Arrays.copyOf(kept, size);
    }

    /** Values per class: class i holds {@code limits[i] <= v < limits[i+1]}, the last class also its upper limit. */
    static List<Integer> counts(double[] sorted, double[] limits) {
        int classes = limits.length - 1;
        List<Integer> counts = new ArrayList<>(classes);
        int from = 0;
        for (int c = 0; c < classes; c++) {
            int to = c == classes - 1 ? sorted.length : ReadableBreaks.lowerBound(sorted, limits[c + 1]);
            counts.add(to - from);
            from = to;
        }
        return counts;
    }

    private static List<Double> boxed(double[] limits) {
        return Arrays.stream(limits).boxed().collect(Collectors.toList());
    }
}
