package aequa.project;

import java.util.List;

/**
 * @param method   {@code quantile}, {@code equal-interval}, {@code natural-breaks}, {@code std-dev},
 *                 {@code diverging}, {@code manual} or {@code unclassed}
 * @param count    the number of classes
 * @param breaks   the inner class limits, for {@code manual}
 * @param midpoint the value diverging classes are centred on
 */
public record ClassesSpec(ClassMethod method, Integer count, List<Double> breaks, Double midpoint) {

    static final ClassesSpec DEFAULT = new ClassesSpec(null, null, null, null);

    public ClassesSpec {
        method = method == null ? ClassMethod.QUANTILE : method;
        count = count == null ? 5 : count;
        breaks = breaks == null ? List.of() : List.copyOf(breaks);
    }
}
