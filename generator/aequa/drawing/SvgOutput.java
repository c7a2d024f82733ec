package aequa.drawing;

import java.util.List;

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

    /**
     * The style properties whose values JFreeSVG writes from floats widened to double (0.0882000029...),
     * each followed by a number of the characters {@link #NUMBER_CHARS}.
     */
    private static final List<String> FLOAT_NOISE = List.of("stroke-width:", "fill-opacity:", "stroke-opacity:");
    private static final String NUMBER_CHARS = "0123456789.Ee-";
    private static final String PATH_DATA = " d='";

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

    /**
     * Rounds float noise in style values to 4 decimals, drops the default {@code stroke-opacity:1.0}, and
     * writes path data in the compact relative form ({@link PathCompactor}).
     *
     * <p>Works by plain text search ({@link String#indexOf}), not regular expressions, which at the launcher's
     * first-tier compilation took about 200 ms on the 1.5 MB of a 3,231-region map: the launcher stops at
     * the first compiler (see the README's performance section).
     *
     * @param decimals the decimals coordinates were written with
     */
    static String tidy(String svg, int decimals) {
        String styled = tidyStyles(svg);
        PathCompactor compactor = new PathCompactor(decimals);
        StringBuilder compact = new StringBuilder(styled.length());
        int copied = 0;
        for (int at = styled.indexOf(PATH_DATA); at >= 0; at = styled.indexOf(PATH_DATA, copied)) {
            int start = at + PATH_DATA.length();
            int end = styled.indexOf('\'', start);
            if (end < 0) {
                break;
            }
            compact.append(styled, copied, start).append(compactor.compact(styled.substring(start, end))).append('\'');
            copied = end + 1;
        }
        compact.append(styled, copied, styled.length());
        return compact.toString();
    }

    /** Each property of {@link #FLOAT_NOISE} followed by a number gets the number to 4 decimals; then the defaults go. */
    private static String tidyStyles(String svg) {
        FixedDecimal four = new FixedDecimal(4);
        StringBuilder out = new StringBuilder(svg.length());
        int[] next = new int[FLOAT_NOISE.size()];
        for (int k = 0; k < next.length; k++) {
            next[k] = nextNoise(svg, FLOAT_NOISE.get(k), 0);
        }
        int copied = 0;
        while (true) {
            int first = -1;
            for (int k = 0; k < next.length; k++) {
                if (next[k] >= 0 && (first < 0 || next[k] < next[first])) {
                    first = k;
                }
            }
            if (first < 0) {
                break;
            }
            int numberStart = next[first] + FLOAT_NOISE.get(first).length();
            int numberEnd = numberStart;
            while (numberEnd < svg.length() && NUMBER_CHARS.indexOf(svg.charAt(numberEnd)) >= 0) {
                numberEnd++;
            }
            out.append(svg, copied, numberStart).append(four.apply(Double.parseDouble(svg.substring(numberStart, numberEnd))));
            copied = numberEnd;
            for (int k = 0; k < next.length; k++) {
                if (next[k] >= 0 && next[k] < copied) {
                    next[k] = nextNoise(svg, FLOAT_NOISE.get(k), copied);
                }
            }
        }
        out.append(svg, copied, svg.length());
        return out.toString().replace(";stroke-opacity:1;", ";").replace("stroke:none;", "").replace(";stroke:none'", "'");
    }

    /** Where {@code property} next appears from {@code from} followed by at least one number character, or -1. */
    private static int nextNoise(String svg, String property, int from) {
        for (int at = svg.indexOf(property, from); at >= 0; at = svg.indexOf(property, at + 1)) {
            int after = at + property.length();
            if (after < svg.length() && NUMBER_CHARS.indexOf(svg.charAt(after)) >= 0) {
                return at;
            }
        }
        return -1;
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
