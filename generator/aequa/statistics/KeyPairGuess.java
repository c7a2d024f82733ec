package aequa.statistics;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * Guesses the join keys of a new project: the (region attribute, figure column) pair under which most regions
 * find a figure row. Exact matching is tried first; relaxed matching (letter case, whitespace, leading zeros of
 * digit runs: {@link RelaxedKey}, as {@code key-matching: relaxed} matches) is chosen only when it matches more regions than
 * the best exact pair. Among pairs matching as many regions, the attribute with the shorter values wins (a code such
 * as a FIPS code before a name spelled out: codes are what statistics offices key tables by, common practice), then
 * the earlier attribute and the earlier column, so the guess is deterministic.
 */
public final class KeyPairGuess {

    /**
     * The chosen pair.
     *
     * @param attribute      the region attribute
     * @param column         the figure column
     * @param relaxed        whether only relaxed matching gives {@code matchedRegions}
     * @param matchedRegions how many regions find a row under this pair
     * @param regions        how many regions there are (with a value for {@code attribute})
     */
    public record Guess(String attribute, String column, boolean relaxed, int matchedRegions, int regions) {

        /** Whether fewer than half the regions match, so that the user must check the key. */
        public boolean weak() {
            return matchedRegions * 2 < regions;
        }
    }

    private KeyPairGuess() {
    }

    /**
     * @param attributes region attribute to its values, in order of preference
     * @param columns    figure column to its values, in order of preference
     * @return the best pair; null when either side has nothing to offer
     */
    public static Guess best(Map<String, List<String>> attributes, Map<String, List<String>> columns) {
        Guess bestExact = null;
        Guess bestRelaxed = null;
        long bestExactChars = 0;
        long bestRelaxedChars = 0;
        for (var attribute : attributes.entrySet()) {
            List<String> regionKeys = attribute.getValue().stream().filter(Objects::nonNull).toList();
            long keyChars = regionKeys.stream().mapToLong(String::length).sum();
            for (var column : columns.entrySet()) {
                Set<String> exact = new HashSet<>();
                Set<String> relaxed = new HashSet<>();
                for (String value : column.getValue()) {
                    if (value != null) {
                        exact.add(value);
                        relaxed.add(RelaxedKey.of(value));
                    }
                }
                int exactCount = (int) regionKeys.stream().filter(exact::contains).count();
                int relaxedCount = (int) regionKeys.stream().filter(k -> relaxed.contains(RelaxedKey.of(k))).count();
                if (bestExact == null || better(exactCount, keyChars, bestExact.matchedRegions(), bestExactChars)) {
                    bestExact = new Guess(attribute.getKey(), column.getKey(), false, exactCount, regionKeys.size());
                    bestExactChars = keyChars;
                }
                if (bestRelaxed == null || better(relaxedCount, keyChars, bestRelaxed.matchedRegions(), bestRelaxedChars)) {
                    bestRelaxed = new Guess(attribute.getKey(), column.getKey(), true, relaxedCount, regionKeys.size());
                    bestRelaxedChars = keyChars;
                }
            }
        }
        if (bestExact == null) {
            return null;
        }
        return bestRelaxed.matchedRegions() > bestExact.matchedRegions() ? bestRelaxed : bestExact;
    }

    private static boolean better(int matched, long keyChars, int bestMatched, long bestKeyChars) {
        return matched > bestMatched || matched == bestMatched && matched > 0 && keyChars < bestKeyChars;
    }
}
