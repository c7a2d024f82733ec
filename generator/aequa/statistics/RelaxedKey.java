package aequa.statistics;

import java.util.Locale;

/**
 * The relaxed form of a region key, under which keys that differ only in letter case, whitespace or
 * leading zeros are equal: all whitespace (including no-break spaces) removed, letters in lower case
 * (Locale.ROOT), and leading zeros dropped from every run of digits ({@code "AB-007"} and {@code "ab-7"}
 * give {@code "ab-7"}; a run of zeros keeps one: {@code "00"} gives {@code "0"}).
 */
final class RelaxedKey {

    private RelaxedKey() {
    }

    static String of(String key) {
        StringBuilder compact = new StringBuilder(key.length());
        for (int i = 0; i < key.length(); i++) {
            char c = key.charAt(i);
            if (!Character.isWhitespace(c) && !Character.isSpaceChar(c)) {
                compact.append(c);
            }
        }
        StringBuilder relaxed = new StringBuilder(compact.length());
        for (int i = 0; i < compact.length(); i++) {
            char c = compact.charAt(i);
            boolean startsDigitRun = isDigit(c) && (i == 0 || !isDigit(compact.charAt(i - 1)));
            if (startsDigitRun) {
                while (c == '0' && i + 1 < compact.length() && isDigit(compact.charAt(i + 1))) {
                    c = compact.charAt(++i);
                }
            }
            relaxed.append(c);
        }
        return relaxed.toString().toLowerCase(Locale.ROOT);
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }
}
