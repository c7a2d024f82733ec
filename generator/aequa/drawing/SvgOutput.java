package aequa.drawing;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGUnits;
import org.jfree.svg.ViewBox;

/**
 * Sets up JFreeSVG for deterministic, compact output and finishes its text. The pitfalls of JFreeSVG 5.0.7
 * handled here (each seen in its output): the ids of clip paths and gradients carry {@code System.nanoTime()}
 * unless a defs prefix is set, so every run would differ; numbers are written in Java's shortest form
 * ({@code 1.0E-7}, {@code -0.0}) unless a converter is set.
 */
final class SvgOutput {

    /** JFreeSVG writes stroke widths and opacities from floats widened to double (0.0882000029...). */
    private static final Pattern FLOAT_NOISE = Pattern.compile("(stroke-width:|fill-opacity:|stroke-opacity:)([0-9.Ee-]+)");

    private SvgOutput() {
    }

    /** A canvas-ready SVG surface {@code width} x {@code height} page units. */
    static SVGGraphics2D graphics(double width, double height, SVGUnits units, FixedDecimal coordinates, String fontStack,
                                  String defsPrefix) {
        SVGGraphics2D g = new SVGGraphics2D(width, height, units);
        g.setDefsKeyPrefix(defsPrefix);               // the default prefix holds System.nanoTime()
        g.setGeomDoubleConverter(coordinates);
        g.setTransformDoubleConverter(new FixedDecimal(6));
        g.setFontFunction(family -> fontStack);       // the theme's whole stack, not the measuring family
        return g;
    }

    private static final Pattern PATH_DATA = Pattern.compile(" d='([^']*)'");

    /**
     * Rounds float noise in style values to 4 decimals, drops the default {@code stroke-opacity:1.0}, and
     * writes path data in the compact relative form ({@link PathCompactor}).
     *
     * @param decimals the decimals coordinates were written with
     */
    static String tidy(String svg, int decimals) {
        PathCompactor compactor = new PathCompactor(decimals);
        Matcher paths = PATH_DATA.matcher(tidyStyles(svg));
        StringBuilder compact = new StringBuilder(svg.length());
        while (paths.find()) {
            paths.appendReplacement(compact, "");
            compact.append(" d='").append(compactor.compact(paths.group(1))).append('\'');
        }
        paths.appendTail(compact);
        return compact.toString();
    }

    private static String tidyStyles(String svg) {
        FixedDecimal four = new FixedDecimal(4);
        Matcher m = FLOAT_NOISE.matcher(svg);
        StringBuilder out = new StringBuilder(svg.length());
        while (m.find()) {
            String replacement = m.group(1) + four.apply(Double.parseDouble(m.group(2)));
            m.appendReplacement(out, Matcher.quoteReplacement(replacement));
        }
        m.appendTail(out);
        return out.toString().replace(";stroke-opacity:1;", ";").replace("stroke:none;", "").replace(";stroke:none'", "'");
    }

    /**
     * The web root: a viewBox and no fixed size (it fills its container's width), {@code role="img"} and
     * {@code aria-labelledby} pointing at a {@code <title>} and {@code <desc>} written first inside it
     * (WAI-ARIA 1.2 "img" role; the pattern recommended for inline SVG by the W3C SVG Accessibility API Mappings).
     * {@code direction="ltr"}: the layout places every text by its left end, so the map must not inherit a
     * right-to-left page's direction (SVG 1.1, section 10.7.4); right-to-left lines carry their own embedding.
     */
    static String webRoot(SVGGraphics2D g, String rootId, double width, double height, String title, String description) {
        String element = g.getSVGElement(rootId, false, new ViewBox(0, 0, width, height), null, null);
        int rootEnd = element.indexOf('>');
        String open = element.substring(0, rootEnd);
        String rest = element.substring(rootEnd + 1);
        return open + " class='aequa-map' direction='ltr' role='img' aria-labelledby='" + rootId + "-title " + rootId + "-desc'>"
                + "<title id='" + rootId + "-title'>" + escape(title) + "</title>"
                + "<desc id='" + rootId + "-desc'>" + escape(description) + "</desc>"
                + rest;
    }

    /** The print root: exact physical size in millimetres, one user unit per millimetre. */
    static String printDocument(SVGGraphics2D g, String rootId, double widthMm, double heightMm, String title) {
        String element = g.getSVGElement(rootId, true, new ViewBox(0, 0, widthMm, heightMm), null, null);
        int rootEnd = element.indexOf('>');
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + element.substring(0, rootEnd + 1)
                + "<title>" + escape(title) + "</title>" + element.substring(rootEnd + 1) + "\n";
    }

    /** XML text escaping for element content and single-quoted attributes. */
    static String escape(String text) {
        StringBuilder out = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            switch (ch) {
                case '&': out.append("&amp;"); break;
                case '<': out.append("&lt;"); break;
                case '>': out.append("&gt;"); break;
                case '\'': out.append("&apos;"); break;
                case '"': out.append("&quot;"); break;
                default:
                    if (ch < 0x20 && ch != '\t' && ch != '\n' && ch != '\r') {
                        out.append(' '); // not allowed in XML 1.0
                    } else {
                        out.append(ch);
                    }
            }
        }
        return out.toString();
    }
}
