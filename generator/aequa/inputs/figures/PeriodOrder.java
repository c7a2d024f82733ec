package aequa.inputs.figures;

import java.util.Comparator;

/**
 * Orders period labels oldest first, comparing runs of digits by their numeric value and everything else
 * character by character: {@code 2009 < 2010}, {@code 2020-Q2 < 2020-Q10}, {@code FY9 < FY10}. Labels equal
 * but for leading zeros are ordered by their text so the order is total and deterministic.
 */
public final class PeriodOrder implements Comparator<String> {

    public static final PeriodOrder OLDEST_FIRST = new PeriodOrder();

    private PeriodOrder() {
    }

    @Override
    public int compare(String a, String b) {
        int i = 0;
        int j = 0;
        while (i < a.length() && j < b.length()) {
            char ca = a.charAt(i);
            char cb = b.charAt(j);
            if (isDigit(ca) && isDigit(cb)) {
                int endA = digitRunEnd(a, i);
                int endB = digitRunEnd(b, j);
                int byNumber = compareDigitRuns(a, i, endA, b, j, endB);
                if (byNumber != 0) {
                    return byNumber;
                }
                i = endA;
                j = endB;
            } else {
                if (ca != cb) {
                    return Character.compare(ca, cb);
                }
                i++;
                j++;
            }
        }
        int byRest = Integer.compare(a.length() - i, b.length() - j);
        return byRest != 0 ? byRest : a.compareTo(b);
    }

    /** Compares two runs of ASCII digits by value, at any length: fewer significant digits is smaller. */
    private static int compareDigitRuns(String a, int startA, int endA, String b, int startB, int endB) {
        while (startA < endA - 1 && a.charAt(startA) == '0') {
            startA++;
        }
        while (startB < endB - 1 && b.charAt(startB) == '0') {
            startB++;
        }
        int byLength = Integer.compare(endA - startA, endB - startB);
        if (byLength != 0) {
            return byLength;
        }
        for (int k = 0; k < endA - startA; k++) {
            int byDigit = Character.compare(a.charAt(startA + k), b.charAt(startB + k));
            if (byDigit != 0) {
                return byDigit;
            }
        }
        return 0;
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static int digitRunEnd(String s, int from) {
        int end = from;
        while (end < s.length() && isDigit(s.charAt(end))) {
            end++;
        }
        return end;
    }
}
