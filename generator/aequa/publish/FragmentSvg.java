package aequa.publish;

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
 */
final class FragmentSvg {

    /** The root's size: its container's width, height from the viewBox's proportions. */
    static final String ROOT_STYLE = "display:block;width:100%;max-width:100%;height:auto;margin:0";

    private static final Pattern TAG = Pattern.compile(
            "<([A-Za-z][A-Za-z0-9:-]*)((?:\\s+[A-Za-z][A-Za-z0-9:_.-]*=(?:'[^']*'|\"[^\"]*\"))*)\\s*(/?)>");
    private static final Pattern ATTRIBUTE = Pattern.compile("\\s+([A-Za-z][A-Za-z0-9:_.-]*)=('[^']*'|\"[^\"]*\")");
    private static final Pattern OPENING = Pattern.compile("<[A-Za-z]");
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
        Matcher tags = TAG.matcher(webSvg);
        StringBuilder out = new StringBuilder(webSvg.length());
        boolean root = true;
        int rewritten = 0;
        while (tags.find()) {
            rewritten++;
            String name = tags.group(1);
            if (LOADING_ELEMENTS.contains(name.toLowerCase(Locale.ROOT))) {
                throw new IllegalStateException("the web SVG holds a <" + name + "> element; a fragment cannot carry it");
            }
            StringBuilder tag = new StringBuilder("<").append(name);
            if (root) {
                tag.append(" aria-label='").append(label).append("' style='").append(ROOT_STYLE).append('\'');
            }
            Matcher attributes = ATTRIBUTE.matcher(tags.group(2));
            while (attributes.find()) {
                String attribute = attributes.group(1);
                String quoted = attributes.group(2);
                String value = quoted.substring(1, quoted.length() - 1);
                if (LOADING_ATTRIBUTES.contains(attribute.toLowerCase(Locale.ROOT))
                        || attribute.equals("style") && value.toLowerCase(Locale.ROOT).contains("url(")) {
                    throw new IllegalStateException("the web SVG has " + attribute + "='" + value + "'; a fragment cannot carry it");
                }
                if (attribute.equals("id") || root && attribute.equals("aria-labelledby")) {
                    continue;
                }
                tag.append(' ').append(attribute).append('=').append(quoted);
            }
            tag.append(tags.group(3)).append('>');
            tags.appendReplacement(out, Matcher.quoteReplacement(tag.toString()));
            root = false;
        }
        tags.appendTail(out);
        if (rewritten != OPENING.matcher(webSvg).results().count()) {
            throw new IllegalStateException("the web SVG has a tag this rewriting does not read");
        }
        return out.toString();
    }
}
