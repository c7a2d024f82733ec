package aequa.inputs.figures;

/** The character between the integer and the fractional part of a number written as text. */
public enum DecimalMark {
    POINT('.'),
    /** Common practice in several European locales, usually with semicolon-separated files. */
    COMMA(',');

    private final char character;

    DecimalMark(char character) {
        this.character = character;
    }

    public char character() {
        return character;
    }
}
