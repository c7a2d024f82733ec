package aequa.findings;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A short, escaped excerpt of text taken from a user's file, for messages: at most a given number of
 * characters, with control, format and line-separator characters shown as {@code \\uXXXX} escapes, so a
 * message never carries a file's content whole (a secret in a wrongly named file, a million-character key)
 * and never moves the terminal's cursor or reorders its text (bidirectional overrides).
 */
public final class Excerpt {

    /** Enough to recognise a key, a column name or a token; our choice. */
    public static final int SHORT_CHARS = 24;

    private static final Pattern QUOTED = Pattern.compile("'([^']*)'");

    private Excerpt() {
    }

    /** {@code text} cut to {@value #SHORT_CHARS} characters and escaped; see {@link #of(String, int)}. */
    public static String of(String text) {
        return of(text, SHORT_CHARS);
    }

    /**
     * {@code message} with every part between single quotes replaced by its {@link #of(String) excerpt}: for
     * a parser's message that quotes the offending text, such as Jackson's {@code Unrecognized token 'x'}.
     */
    public static String quotedParts(String message) {
        return QUOTED.matcher(message).replaceAll(m -> Matcher.quoteReplacement("'" + of(m.group(1)) + "'"));
    }

    /**
     * The first {@code maxChars} characters of {@code text} (never splitting a surrogate pair), escaped; when
     * cut, followed by {@code "... (N characters)"} with the full length.
     */
    public static String of(String text, int maxChars) {
        int end = Math.min(text.length(), maxChars);
        if (end < text.length() && end > 0 && Character.isHighSurrogate(text.charAt(end - 1))) {
            end--;
        }
        StringBuilder out = new StringBuilder(end + 24);
        for (int i = 0; i < end; i++) {
            char c = text.charAt(i);
            int type = Character.getType(c);
            boolean hidden = type == Character.CONTROL || type == Character.FORMAT
                    || type == Character.LINE_SEPARATOR || type == Character.PARAGRAPH_SEPARATOR;
            out.append(hidden ? String.format(Locale.ROOT, "\\u%04x", (int) c) : c);
        }
        if (end < text.length()) {
            out.append(String.format(Locale.ROOT, "... (%,d characters)", text.length()));
        }
        return out.toString();
    }
}
