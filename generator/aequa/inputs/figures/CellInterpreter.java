package aequa.inputs.figures;


/**
 * Decides what one field says: a reported number, or one of the declared markers, or a malformed text.
 * The order is: declared markers first (so a source may declare "0" or "-" as suppressed), then a blank
 * field (always no data), then a number under the declared format; anything else is malformed and kept
 * as no data with the reason in {@link FigureCell#problem()}, for the join to report where it is used.
 */
final class CellInterpreter {

    /** The reading of one field. {@code value} is NaN unless {@code status} is REPORTED. */
    record Reading(CellStatus status, double value, String problem) {
    }

    private final FigureSourceSettings settings;
    private final NumberText numbers;

    CellInterpreter(FigureSourceSettings settings) {
        this.settings = settings;
        this.numbers = new NumberText(settings.decimal(), settings.thousands());
    }

    Reading read(SourceField field) {
        if (field.typed()) {
            return new Reading(CellStatus.REPORTED, field.number(), "");
        }
        String trimmed = trim(field.text());
        CellStatus marker = settings.markers().get(trimmed);
        if (marker != null) {
            return new Reading(marker, Double.NaN, "");
        }
        if (trimmed.isEmpty()) {
            return new Reading(CellStatus.NO_DATA, Double.NaN, "");
        }
        double value = numbers.parse(trimmed);
        if (Double.isNaN(value)) {
            return new Reading(CellStatus.NO_DATA, Double.NaN, numbers.hint(trimmed));
        }
        return new Reading(CellStatus.REPORTED, value, "");
    }

    /** {@code text} without surrounding whitespace, counting no-break spaces as whitespace. */
    static String trim(String text) {
        int start = 0;
        int end = text.length();
        while (start < end && isSpace(text.charAt(start))) {
            start++;
        }
        while (end > start && isSpace(text.charAt(end - 1))) {
            end--;
        }
        return text.substring(start, end);
    }

    private static boolean isSpace(char c) {
        return Character.isWhitespace(c) || Character.isSpaceChar(c);
    }
}
