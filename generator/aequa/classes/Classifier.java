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
 *   <li>NaN means "not classified" (no data, suppressed, not applicable) and is skipped silently; an
 *       infinite value is skipped with a warning (it usually means a division by zero upstream).</li>
 *   <li>Errors in the spec (fewer than 2 classes, manual breaks missing or not strictly
 *       ascending, diverging without a midpoint) are returned as ERROR findings, never thrown; the
 *       classification is then empty. Codes: {@code classes-count-too-small},
 *       {@code classes-manual-breaks-missing}, {@code classes-manual-breaks-not-ascending},
 *       {@code classes-midpoint-missing}.</li>
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
        checkSpec(method, spec, file, place, findings);
        if (!findings.isEmpty()) {
            return new Classified(Optional.empty(), findings);
        }
        double[] sorted = finiteSorted(values, file, place, findings);
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

    private static void checkSpec(ClassMethod method, ClassesSpec spec, String file, String place,
                                  List<Finding> findings) {
        if (method == ClassMethod.MANUAL) {
            List<Double> breaks = spec.breaks();
            if (breaks.isEmpty()) {
                findings.add(Finding.error("classes-manual-breaks-missing", file, place,
                        "Manual classes need breaks, and none are given.",
                        "List the inner class limits under breaks, for example [10, 20, 50]."));
            }
            for (int i = 0; i < breaks.size(); i++) {
                Double b = breaks.get(i);
                boolean bad = b == null || !Double.isFinite(b) || (i > 0 && !(breaks.get(i - 1) < b));
                if (bad) {
                    findings.add(Finding.error("classes-manual-breaks-not-ascending", file, place,
                            "Manual break " + (i + 1) + " (" + b + ") is not a number greater than the one before.",
                            "List the breaks as numbers in strictly ascending order."));
                    return;
                }
            }
        } else if (method != ClassMethod.UNCLASSED && spec.count() < 2) {
            findings.add(Finding.error("classes-count-too-small", file, place,
                    "A map needs at least 2 classes; the count is " + spec.count() + ".",
                    "Set count to 2 or more, or use method unclassed for a continuous ramp."));
        }
        if (method == ClassMethod.DIVERGING && (spec.midpoint() == null || !Double.isFinite(spec.midpoint()))) {
            findings.add(Finding.error("classes-midpoint-missing", file, place,
                    "Diverging classes need a midpoint, and none is given.",
                    "Set midpoint to the value the colours diverge from, for example 0 or the national rate."));
        }
    }

    private static double[] finiteSorted(double[] values, String file, String place, List<Finding> findings) {
        long infinite = Arrays.stream(values).filter(Double::isInfinite).count();
        if (infinite > 0) {
            findings.add(Finding.warning("classes-infinite-value", file, place,
                    infinite + " value(s) are infinite and were left unclassified.",
                    "Look for a division by zero, for example a region with no population."));
        }
        double[] sorted = Arrays.stream(values).filter(Double::isFinite).toArray();
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
