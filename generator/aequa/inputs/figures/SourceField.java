package aequa.inputs.figures;

/**
 * One field as a source holds it: text still to be interpreted, or a number the source already typed
 * (an INTEGER or REAL column of a database), whose text is only kept for messages.
 *
 * @param text   the text as in the file, or the database value written out; empty for SQL NULL
 * @param typed  whether {@code number} was typed by the source
 * @param number the typed value; NaN when not typed
 */
record SourceField(String text, boolean typed, double number) {

    static SourceField text(String text) {
        return new SourceField(text == null ? "" : text, false, Double.NaN);
    }

    static SourceField number(double number, String text) {
        return new SourceField(text, true, number);
    }
}
