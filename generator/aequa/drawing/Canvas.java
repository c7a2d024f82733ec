package aequa.drawing;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
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
        g.drawString(xmlSafe(text), (float) (startX * Typesetter.TEXT_SCALE), (float) (yU * Typesetter.TEXT_SCALE));
        g.setTransform(saved);
        inventory.text(new Inventory.TextMark(text, font.getSize() / (type.unitsPerPt() * Typesetter.TEXT_SCALE), colour, background, layer()));
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
