package aequa.project;

import java.util.List;
import java.util.Locale;

/**
 * The hint for an unknown key of the project file: the known key it was probably meant to be, then every
 * key known at that place. A key that differs only in case is named as such (keys are lower case); else the
 * nearest known key by edit distance (Levenshtein 1966: insertions, deletions and substitutions), when at
 * most {@value #MAX_EDITS} edits and fewer than half the key's letters away.
 */
final class KeySuggestion {

    static final int MAX_EDITS = 2;

    private KeySuggestion() {
    }

    static String hint(String unknown, List<String> known) {
        String list = "Known keys here: " + String.join(", ", known) + ".";
        for (String key : known) {
            if (key.equalsIgnoreCase(unknown)) {
                return "Keys are lower case: write '" + key + "'. " + list;
            }
        }
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String key : known) {
            int distance = editDistance(unknown.toLowerCase(Locale.ROOT), key);
            if (distance < bestDistance) {
                best = key;
                bestDistance = distance;
            }
        }
        if (best != null && bestDistance <= MAX_EDITS && 2 * bestDistance < unknown.length()) {
            return "Did you mean '" + best + "'? " + list;
        }
        return list;
    }

    /** Levenshtein distance by the two-row dynamic programme (Wagner and Fischer 1974). */
    static int editDistance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j] + 1, current[j - 1] + 1));
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
