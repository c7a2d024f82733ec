package aequa.endtoend;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The text a reader sees or hears in one published HTML page or SVG map, as one line: text between tags, and
 * the attributes read aloud or shown (alt, title, aria-label, placeholder). Left out: scripts, styles, code
 * ({@code <code>}, {@code <pre>}, {@code <textarea>}: the embed snippets are code to copy, not prose) and any
 * element marked {@code lang="en"} (text the page declares English on purpose, as WCAG 2.2 success criterion
 * 3.1.2, Language of Parts, asks). Character references are decoded and bidirectional controls (UAX #9)
 * removed, so text matches what the author typed.
 */
final class VisibleText {

    private static final Pattern HIDDEN = Pattern.compile(
            "<(script|style|code|pre|textarea)\\b[^>]*>.*?</\\1\\s*>", Pattern.DOTALL | Pattern.CASE_INSENSITIVE);
    private static final Pattern ENGLISH_PART = Pattern.compile(
            "<([a-zA-Z][a-zA-Z0-9]*)\\b[^>]*\\slang=\"en\"[^>]*>.*?</\\1\\s*>", Pattern.DOTALL);
    private static final Pattern SPOKEN_ATTRIBUTE = Pattern.compile("\\s(?:alt|title|aria-label|placeholder)=(\"[^\"]*\"|'[^']*')");
    private static final Pattern TAG = Pattern.compile("<[^>]*>");
    private static final Pattern REFERENCE = Pattern.compile("&(#x[0-9a-fA-F]+|#[0-9]+|amp|lt|gt|quot|apos|nbsp);");
    private static final Pattern BIDI_CONTROLS = Pattern.compile("[\\u200e\\u200f\\u061c\\u202a-\\u202e\\u2066-\\u2069]");
    private static final Pattern SPACES = Pattern.compile("[\\s\\u00a0\\u202f]+");

    private VisibleText() {
    }

    /** The visible text of {@code markup} (HTML or SVG), whitespace collapsed to single spaces. */
    static String of(String markup) {
        String shown = HIDDEN.matcher(markup).replaceAll(" ");
        shown = ENGLISH_PART.matcher(shown).replaceAll(" ");
        StringBuilder text = new StringBuilder();
        Matcher tag = TAG.matcher(shown);
        int last = 0;
        while (tag.find()) {
            text.append(shown, last, tag.start()).append(' ');
            Matcher attribute = SPOKEN_ATTRIBUTE.matcher(tag.group());
            while (attribute.find()) {
                String value = attribute.group(1);
                text.append(value, 1, value.length() - 1).append(' ');
            }
            last = tag.end();
        }
        text.append(shown.substring(last));
        return normalise(decode(text.toString()));
    }

    /** {@code text} without bidirectional controls, its whitespace collapsed to single spaces. */
    static String normalise(String text) {
        return SPACES.matcher(BIDI_CONTROLS.matcher(text).replaceAll("")).replaceAll(" ").strip();
    }

    private static String decode(String text) {
        Matcher reference = REFERENCE.matcher(text);
        StringBuilder out = new StringBuilder();
        while (reference.find()) {
            String name = reference.group(1);
            String character = switch (name) {
                case "amp" -> "&";
                case "lt" -> "<";
                case "gt" -> ">";
                case "quot" -> "\"";
                case "apos" -> "'";
                case "nbsp" -> " ";
                default -> new String(Character.toChars(name.startsWith("#x")
                        ? Integer.parseInt(name.substring(2), 16) : Integer.parseInt(name.substring(1))));
            };
            reference.appendReplacement(out, Matcher.quoteReplacement(character));
        }
        reference.appendTail(out);
        return out.toString();
    }
}
