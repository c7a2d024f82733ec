package aequa.drawing;

/**
 * Rewrites the path data JFreeSVG writes (absolute {@code M x,y L x,y ... Z}) as shorter, equivalent SVG
 * path data: each subpath starts with an absolute {@code M}, the following points become one relative
 * {@code l} with implicit repetition (SVG 1.1, section 8.3.2, "the command letter can be eliminated on
 * subsequent commands if the same command is used multiple times in a row"), and leading zeros and
 * redundant separators are dropped (section 8.3.9, path data grammar).
 *
 * <p>Exact: numbers are parsed as whole multiples of {@code 10^-decimals} (the precision they were
 * written with), so every relative step adds back to the same absolute point. Path data with other
 * commands (curves) or more decimals than expected is returned unchanged.
 */
final class PathCompactor {

    private final int decimals;
    private final long scale;

    PathCompactor(int decimals) {
        this.decimals = decimals;
        long s = 1;
        for (int i = 0; i < decimals; i++) {
            s *= 10;
        }
        this.scale = s;
    }

    /** The compact equivalent of {@code d}, or {@code d} itself when it cannot be rewritten exactly. */
    String compact(String d) {
        StringBuilder out = new StringBuilder(d.length());
        int[] position = {0};
        long currentX = 0;
        long currentY = 0;
        char previous = 0;
        while (position[0] < d.length()) {
            char command = d.charAt(position[0]++);
            switch (command) {
                case 'M':
                case 'L': {
                    long x = number(d, position);
                    if (position[0] >= d.length() || d.charAt(position[0]) != ',') {
                        return d;
                    }
                    position[0]++;
                    long y = number(d, position);
                    if (x == Long.MIN_VALUE || y == Long.MIN_VALUE) {
                        return d;
                    }
                    if (command == 'M') {
                        out.append('M');
                        write(out, x, false);
                        write(out, y, true);
                    } else {
                        if (previous != 'L') {
                            out.append('l');
                            write(out, x - currentX, false);
                        } else {
                            write(out, x - currentX, true);
                        }
                        write(out, y - currentY, true);
                    }
                    currentX = x;
                    currentY = y;
                    previous = command;
                    break;
                }
                case 'Z':
                    out.append('z');
                    previous = 'Z';
                    break;
                case ' ':
                    break;
                default:
                    return d;
            }
        }
        return out.toString();
    }

    /** Parses a decimal number at {@code position} into units of 10^-decimals, or MIN_VALUE if impossible. */
    private long number(String d, int[] position) {
        int i = position[0];
        boolean negative = i < d.length() && d.charAt(i) == '-';
        if (negative) {
            i++;
        }
        long whole = 0;
        int digits = 0;
        while (i < d.length() && Character.isDigit(d.charAt(i))) {
            whole = whole * 10 + (d.charAt(i++) - '0');
            digits++;
        }
        long fraction = 0;
        int fractionDigits = 0;
        if (i < d.length() && d.charAt(i) == '.') {
            i++;
            while (i < d.length() && Character.isDigit(d.charAt(i))) {
                fraction = fraction * 10 + (d.charAt(i++) - '0');
                fractionDigits++;
                digits++;
            }
        }
        if (digits == 0 || fractionDigits > decimals || digits > 15) {
            return Long.MIN_VALUE;
        }
        for (int k = fractionDigits; k < decimals; k++) {
            fraction *= 10;
        }
        position[0] = i;
        long units = whole * scale + fraction;
        return negative ? -units : units;
    }

    /** Writes {@code units} (10^-decimals) shortest, with a separator only where the grammar needs one. */
    private void write(StringBuilder out, long units, boolean separated) {
        long magnitude = Math.abs(units);
        long whole = magnitude / scale;
        long fraction = magnitude % scale;
        StringBuilder number = new StringBuilder(12);
        if (units < 0) {
            number.append('-');
        }
        if (whole != 0 || fraction == 0) {
            number.append(whole);
        }
        if (fraction != 0) {
            String text = Long.toString(fraction);
            number.append('.');
            for (int pad = text.length(); pad < decimals; pad++) {
                number.append('0');
            }
            int end = text.length();
            while (text.charAt(end - 1) == '0') {
                end--;
            }
            number.append(text, 0, end);
        }
        // a separator is needed unless the number starts with '-', or starts with '.' after a number holding a '.'
        if (separated && number.charAt(0) != '-' && !(number.charAt(0) == '.' && lastNumberHasPoint(out))) {
            out.append(',');
        }
        out.append(number);
    }

    private static boolean lastNumberHasPoint(StringBuilder out) {
        for (int i = out.length() - 1; i >= 0; i--) {
            char c = out.charAt(i);
            if (c == '.') {
                return true;
            }
            if (!Character.isDigit(c)) {
                return false;
            }
        }
        return false;
    }
}
