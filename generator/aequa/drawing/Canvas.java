package aequa.drawing;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.text.Bidi;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGHints;

import aequa.colour.Rgb;

/**
 * The one surface every layer paints on: a {@link Graphics2D} in page units, plus named groups (written as
 * {@code <g id=...>} when the target is SVG, ignored otherwise) and an {@link Inventory} of what was drawn.
 *
 * <p>Type: JFreeSVG 5.0.7 writes font sizes as whole numbers ({@code Font.getSize()}: 3.5 becomes 4), so text is set
 * in a font {@link Typesetter#TEXT_SCALE} times larger under the inverse scale; sizes are therefore exact
 * to 1/100 of a page unit in every output. Not thread-safe; one canvas per render.
 */
final class Canvas {

    /** Horizontal placement of text relative to its x. */
    enum Anchor { START, MIDDLE, END }

    private final Graphics2D g;
    private final SVGGraphics2D svg;
    private final Typesetter type;
    private final Inventory inventory = new Inventory();
    private final Deque<String> groups = new ArrayDeque<>();
    private final Set<String> usedIds = new HashSet<>();

    /**
     * @param g    the target, already transformed so that one user unit is one page unit
     * @param type measures type and supplies fonts
     */
    private boolean rightToLeft;

    Canvas(Graphics2D g, Typesetter type) {
        this.g = g;
        this.svg = g instanceof SVGGraphics2D ? (SVGGraphics2D) g : null;
        this.type = type;
    }

    Typesetter type() {
        return type;
    }

    Inventory inventory() {
        return inventory;
    }

    double unitsPerPt() {
        return type.unitsPerPt();
    }

    /**
     * Opens a group. {@code id} must already be an XML-safe id (see {@link Ids}); a repeated id gets a
     * numeric suffix, since JFreeSVG would leave a broken tag behind on a duplicate.
     *
     * @param attributes extra attributes in the order to write them (data-*); values are escaped by JFreeSVG
     * @param title      the group's {@code <title>}, or null
     */
    void begin(String id, Map<String, String> attributes, String title) {
        String unique = id;
        for (int n = 2; !usedIds.add(unique); n++) {
            unique = id + "-" + n;
        }
        groups.push(unique);
        if (svg != null) {
            Map<String, String> all = new LinkedHashMap<>();
            all.put("id", unique);
            attributes.forEach((name, value) -> all.put(name, xmlSafe(value)));
            svg.setRenderingHint(SVGHints.KEY_BEGIN_GROUP, all);
            if (title != null) {
                svg.setRenderingHint(SVGHints.KEY_ELEMENT_TITLE, xmlSafe(title));
            }
        }
    }

    void begin(String id) {
        begin(id, Map.of(), null);
    }

    void end() {
        groups.pop();
        if (svg != null) {
            svg.setRenderingHint(SVGHints.KEY_END_GROUP, "end");
        }
    }

    /**
     * Runs {@code drawing} with SVG coordinates written to 4 decimals instead of the page's precision, for
     * shapes whose size carries a stated measure (the area-scale square: at 0.01 mm a 7 mm side would be
     * off by up to 0.15 % in area). No effect on other targets, which draw from doubles.
     */
    void precisely(Runnable drawing) {
        if (svg == null) {
            drawing.run();
            return;
        }
        var saved = svg.getGeomDoubleConverter();
        svg.setGeomDoubleConverter(new FixedDecimal(4));
        try {
            drawing.run();
        } finally {
            svg.setGeomDoubleConverter(saved);
        }
    }

    void fill(Shape shape, Rgb colour) {
        fill(shape, colour, 1.0);
    }

    /** @param opacity 0 to 1 */
    void fill(Shape shape, Rgb colour, double opacity) {
        g.setColor(awt(colour, opacity));
        g.fill(shape);
        inventory.fill(new Inventory.FillMark(colour, layer()));
    }

    void stroke(Shape shape, Rgb colour, double widthPt) {
        g.setColor(awt(colour, 1.0));
        g.setStroke(new BasicStroke((float) (widthPt * type.unitsPerPt()), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(shape);
        inventory.line(new Inventory.LineMark(widthPt, colour, layer()));
    }

    /**
     * Sets one line of type with its baseline at {@code yU}.
     *
     * @param background the colour the type sits on, for the reversed-type check
     */
    void text(String text, double xU, double yU, double sizePt, boolean bold, Anchor anchor, Rgb colour, Rgb background) {
        java.awt.Font font = type.font(sizePt, bold);
        double width = type.width(text, sizePt, bold);
        double startX = anchor == Anchor.START ? xU : anchor == Anchor.MIDDLE ? xU - width / 2 : xU - width;
        AffineTransform saved = g.getTransform();
        g.scale(1.0 / Typesetter.TEXT_SCALE, 1.0 / Typesetter.TEXT_SCALE);
        g.setFont(font);
        g.setColor(awt(colour, 1.0));
        String line = directed(xmlSafe(text));
        float x = (float) (startX * Typesetter.TEXT_SCALE);
        float y = (float) (yU * Typesetter.TEXT_SCALE);
        if (!line.isEmpty() && !(g instanceof SVGGraphics2D)
                && Bidi.requiresBidi(line.toCharArray(), 0, line.length())) {
            // PDF outlines come from glyph vectors, which neither reorder nor join letters: TextLayout does both
            new TextLayout(line, font, g.getFontRenderContext()).draw(g, x, y);
        } else {
            g.drawString(line, x, y);
        }
        g.setTransform(saved);
        inventory.text(new Inventory.TextMark(text, font.getSize() / (type.unitsPerPt() * Typesetter.TEXT_SCALE), colour, background, layer()));
    }

    /**
     * A line whose first strong letter is right-to-left (Arabic, Hebrew) wrapped in a right-to-left embedding
     * (U+202B ... U+202C, Unicode Bidirectional Algorithm, UAX #9, section 2.1): its words and numbers are
     * ordered right to left as one block, which still starts at the line's left edge, so the layout's anchors
     * hold in SVG (where the browser orders and shapes the text), PNG and PDF alike. Other lines are unchanged
     * (the HTML dir="auto" rule, extended by {@link #runsRightToLeft}).
     */
    String directed(String text) {
        return runsRightToLeft(text) ? "\u202b" + text + "\u202c" : text;
    }

    /**
     * Whether a line is set right to left: its first strong letter is right-to-left, or the drawing is in a
     * right-to-left language and the line holds any right-to-left letter (a legend heading that starts with
     * the author's English unit and ends in Arabic words reads from the right).
     */
    boolean runsRightToLeft(String text) {
        if (rightToLeft && text.codePoints().anyMatch(Canvas::strongRightToLeft)) {
            return true;
        }
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            if (Character.getDirectionality(cp) == Character.DIRECTIONALITY_LEFT_TO_RIGHT) {
                return false;
            }
            if (strongRightToLeft(cp)) {
                return true;
            }
            i += Character.charCount(cp);
        }
        return false;
    }

    /** Marks the drawing as one in a right-to-left language (see {@link #runsRightToLeft}). */
    void rightToLeft(boolean on) {
        this.rightToLeft = on;
    }

    private static boolean strongRightToLeft(int cp) {
        byte direction = Character.getDirectionality(cp);
        return direction == Character.DIRECTIONALITY_RIGHT_TO_LEFT || direction == Character.DIRECTIONALITY_RIGHT_TO_LEFT_ARABIC;
    }

    /** Replaces characters XML 1.0 does not allow (C0 controls other than tab, line feed, return) by spaces. */
    static String xmlSafe(String text) {
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            if (ch < 0x20 && ch != '\t' && ch != '\n' && ch != '\r') {
                StringBuilder out = new StringBuilder(text);
                for (int j = i; j < out.length(); j++) {
                    char c = out.charAt(j);
                    if (c < 0x20 && c != '\t' && c != '\n' && c != '\r') {
                        out.setCharAt(j, ' ');
                    }
                }
                return out.toString();
            }
        }
        return text;
    }

    private String layer() {
        return groups.isEmpty() ? "" : groups.peekLast();
    }

    private static Color awt(Rgb colour, double opacity) {
        return new Color(colour.red(), colour.green(), colour.blue(), (int) Math.round(opacity * 255));
    }
}
