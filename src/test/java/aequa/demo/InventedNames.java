package aequa.demo;

import java.util.HashSet;
import java.util.Locale;
import java.util.Random;
import java.util.Set;

/** Makes invented, pronounceable place names from syllables; deterministic for a given seed, never repeats. */
final class InventedNames {

    private static final String[] ONSETS = {"b", "br", "c", "d", "dr", "f", "g", "h", "k", "l", "m", "n", "p", "r",
            "s", "st", "t", "tr", "v", "w", "z", "th", "sh", "qu"};
    private static final String[] VOWELS = {"a", "e", "i", "o", "u", "ae", "ia", "ou", "y"};
    private static final String[] CODAS = {"", "", "n", "r", "l", "s", "th", "m", "nd", "rn", "x"};
    private static final String[] SUFFIXES = {"", "", "", " Vale", " Reach", " Hollow", " Downs", " Marches", " Shore", " Heights"};

    private final Random random;
    private final Set<String> used = new HashSet<>();

    InventedNames(long seed) {
        this.random = new Random(seed);
    }

    String next() {
        while (true) {
            StringBuilder name = new StringBuilder();
            int syllables = 2 + random.nextInt(2);
            for (int i = 0; i < syllables; i++) {
                name.append(pick(ONSETS)).append(pick(VOWELS));
            }
            name.append(pick(CODAS));
            String word = name.substring(0, 1).toUpperCase(Locale.ROOT) + name.substring(1);
            String candidate = word + pick(SUFFIXES);
            if (candidate.length() <= 22 && used.add(candidate)) {
                return candidate;
            }
        }
    }

    private String pick(String[] options) {
        return options[random.nextInt(options.length)];
    }
}
