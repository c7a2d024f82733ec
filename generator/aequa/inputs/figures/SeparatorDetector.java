package aequa.inputs.figures;

/**
 * Guesses the field separator of a delimited file from its header record: the most frequent of comma,
 * semicolon, tab and vertical bar outside double quotes. Ties go to tab, then bar, then semicolon, then
 * comma (a header rarely holds a tab, bar or semicolon by chance, while commas appear in column titles). A header without any
 * of them is a single column, read with comma. Our own code: Jackson's CSV parser takes a fixed separator.
 */
final class SeparatorDetector {

    private SeparatorDetector() {
    }

    static FieldSeparator detect(String text) {
        int commas = 0;
        int semicolons = 0;
        int tabs = 0;
        int bars = 0;
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '"') {
                quoted = !quoted;
            } else if (!quoted && (c == '\n' || c == '\r')) {
                break;
            } else if (!quoted && c == ',') {
                commas++;
            } else if (!quoted && c == ';') {
                semicolons++;
            } else if (!quoted && c == '\t') {
                tabs++;
            } else if (!quoted && c == '|') {
                bars++;
            }
        }
        if (tabs > 0 && tabs >= bars && tabs >= semicolons && tabs >= commas) {
            return FieldSeparator.TAB;
        }
        if (bars > 0 && bars >= semicolons && bars >= commas) {
            return FieldSeparator.PIPE;
        }
        if (semicolons > 0 && semicolons >= commas) {
            return FieldSeparator.SEMICOLON;
        }
        return FieldSeparator.COMMA;
    }
}
