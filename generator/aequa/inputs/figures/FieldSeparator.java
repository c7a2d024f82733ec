package aequa.inputs.figures;

/** The field separator of a delimited text file. */
public enum FieldSeparator {
    /** Detect from the header line: the most frequent of comma, semicolon, tab and bar outside quotes. */
    AUTO('\0'),
    COMMA(','),
    SEMICOLON(';'),
    TAB('\t'),
    PIPE('|');

    private final char character;

    FieldSeparator(char character) {
        this.character = character;
    }

    /** The separator character; {@code '\0'} for {@link #AUTO}. */
    public char character() {
        return character;
    }
}
