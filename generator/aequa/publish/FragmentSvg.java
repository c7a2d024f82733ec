package aequa.publish;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The web SVG of a map made fit for an HTML fragment that any number of other fragments may share a page
 * with: every {@code id} attribute removed (so none can collide, even with the same map twice), the root's
 * {@code aria-labelledby} replaced by an {@code aria-label} holding the title (the {@code <title>} and
 * {@code <desc>} stay its first children, which also name and describe it: SVG Accessibility API Mappings,
 * section 5), and sized by a style attribute to the width of its container.
 *
 * <p>Works tag by tag on well-formed SVG whose text is escaped (as {@code aequa.drawing.MapDrawings#webSvg}
 * writes it), so a {@code <} only ever opens a tag; text is left as it is. Refuses, as a
 * programming error, an SVG that could load anything or refers to an id (a style, script, image or use
 * element, an {@code href} or {@code src}, a {@code url(...)} in a style), since the fragment must stand alone.
 * Tags are read by plain text search, not regular expressions, which took about 150 ms on a 3,231-region map at
 * the launcher's first-tier compilation.
 */
final class FragmentSvg {

    /** The root's size: its container's width, height from the viewBox's proportions. */
    static final String ROOT_STYLE = "display:block;width:100%;max-width:100%;height:auto;margin:0";

    private static final Pattern TITLE = Pattern.compile("<title[^>]*>([^<]*)</title>");
    private static final Set<String> LOADING_ELEMENTS = Set.of("style", "script", "image", "use", "foreignobject", "a",
            "iframe", "feimage");
    private static final Set<String> LOADING_ATTRIBUTES = Set.of("href", "xlink:href", "src", "srcset");

    private FragmentSvg() {
    }

    /**
     * @param webSvg the map's web SVG
     * @return the same drawing without ids, labelled by its title, sized to its container
     * @throws IllegalStateException when the SVG could load anything or refers to an id
     */
    static String of(String webSvg) {
        if (!webSvg.startsWith("<svg ")) {
            throw new IllegalStateException("the web SVG must start with its root element");
        }
        Matcher title = TITLE.matcher(webSvg);
        // XML text: already escaped but for the apostrophe, which text may hold and a single-quoted attribute may not
        String label = title.find() ? title.group(1).replace("'", "&apos;") : "";
        StringBuilder out = new StringBuilder(webSvg.length());
        boolean root = true;
        int copied = 0;
        for (int open = webSvg.indexOf('<'); open >= 0; open = webSvg.indexOf('<', Math.max(open + 1, copied))) {
            if (open + 1 >= webSvg.length() || !letter(webSvg.charAt(open + 1))) {
                continue; // a closing tag, or none that opens an element
            }
            StartTag tag = StartTag.read(webSvg, open);
            if (LOADING_ELEMENTS.contains(tag.name().toLowerCase(Locale.ROOT))) {
                throw new IllegalStateException("the web SVG holds a <" + tag.name() + "> element; a fragment cannot carry it");
            }
            out.append(webSvg, copied, open).append('<').append(tag.name());
            if (root) {
                out.append(" aria-label='").append(label).append("' style='").append(ROOT_STYLE).append('\'');
            }
            for (String[] attribute : tag.attributes()) {
                String name = attribute[0];
                String quoted = attribute[1];
                String value = quoted.substring(1, quoted.length() - 1);
                if (LOADING_ATTRIBUTES.contains(name.toLowerCase(Locale.ROOT))
                        || name.equals("style") && value.toLowerCase(Locale.ROOT).contains("url(")) {
                    throw new IllegalStateException("the web SVG has " + name + "='" + value + "'; a fragment cannot carry it");
                }
                if (name.equals("id") || root && name.equals("aria-labelledby")) {
                    continue;
                }
                out.append(' ').append(name).append('=').append(quoted);
            }
            out.append(tag.selfClosing() ? "/>" : ">");
            copied = tag.end();
            root = false;
        }
        out.append(webSvg, copied, webSvg.length());
        return out.toString();
    }

    private static boolean letter(char c) {
        return c >= 'A' && c <= 'Z' || c >= 'a' && c <= 'z';
    }

    /**
     * A start tag as this rewriting reads it: {@code <NAME}, then attributes {@code NAME='...'} or
     * {@code NAME="..."} each after white space, optional white space, {@code >} or {@code />}. Names start with
     * a letter, then letters, digits and {@code :-} (elements) or {@code :_.-} (attributes).
     *
     * @param attributes each {@code [name, value with its quotes]}, in order
     * @param end        the index after the tag's {@code >}
     */
    private record StartTag(String name, List<String[]> attributes, boolean selfClosing, int end) {

        /** Reads the start tag at {@code open} (a '<' followed by a letter), or refuses the SVG. */
        static StartTag read(String svg, int open) {
            int at = open + 1;
            int nameEnd = nameEnd(svg, at, ":-");
            List<String[]> attributes = new ArrayList<>();
            at = nameEnd;
            while (true) {
                int afterSpace = skipSpace(svg, at);
                if (afterSpace == at || afterSpace >= svg.length() || !letter(svg.charAt(afterSpace))) {
                    at = afterSpace;
                    break;
                }
                int attributeEnd = nameEnd(svg, afterSpace, ":_.-");
                if (attributeEnd + 1 >= svg.length() || svg.charAt(attributeEnd) != '=') {
                    throw unreadable();
                }
                char quote = svg.charAt(attributeEnd + 1);
                int close = quote == '\'' || quote == '"' ? svg.indexOf(quote, attributeEnd + 2) : -1;
                if (close < 0) {
                    throw unreadable();
                }
                String quoted = svg.substring(attributeEnd + 1, close + 1);
                if (quoted.indexOf('<') >= 0) {
                    throw unreadable(); // escaped text never holds one
                }
                attributes.add(new String[] {svg.substring(afterSpace, attributeEnd), quoted});
                at = close + 1;
            }
            boolean selfClosing = at < svg.length() && svg.charAt(at) == '/';
            int close = selfClosing ? at + 1 : at;
            if (close >= svg.length() || svg.charAt(close) != '>') {
                throw unreadable();
            }
            return new StartTag(svg.substring(open + 1, nameEnd), attributes, selfClosing, close + 1);
        }

        private static int nameEnd(String svg, int start, String punctuation) {
            int at = start + 1;
            while (at < svg.length() && (letter(svg.charAt(at)) || Character.isDigit(svg.charAt(at)) && svg.charAt(at) < 128
                    || punctuation.indexOf(svg.charAt(at)) >= 0)) {
                at++;
            }
            return at;
        }

        /** Past the white space of regular expressions' \s: space, tab, line feed, vertical tab, form feed, return. */
        private static int skipSpace(String svg, int at) {
            while (at < svg.length() && " \t\n\u000b\f\r".indexOf(svg.charAt(at)) >= 0) {
                at++;
            }
            return at;
        }

        private static IllegalStateException unreadable() {
            return new IllegalStateException("the web SVG has a tag this rewriting does not read");
        }
    }
}
