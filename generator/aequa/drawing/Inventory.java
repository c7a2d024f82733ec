package aequa.drawing;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import aequa.colour.Rgb;

/**
 * What a drawing put on the page, recorded while it was painted, for the print preflight: every piece of
 * type with its size and the colour behind it, every distinct line weight and every distinct fill colour,
 * each with the layer (top-level group id) it belongs to. Filled during one render only; not thread-safe.
 */
public final class Inventory {

    /** One piece of type. Sizes in points. */
    public record TextMark(String text, double sizePt, Rgb colour, Rgb background, String layer) {
    }

    /** A line weight in use. */
    public record LineMark(double widthPt, Rgb colour, String layer) {
    }

    /** A fill colour in use. */
    public record FillMark(Rgb colour, String layer) {
    }

    private final List<TextMark> texts = new ArrayList<>();
    private final Set<LineMark> lines = new LinkedHashSet<>();
    private final Set<FillMark> fills = new LinkedHashSet<>();

    void text(TextMark mark) {
        texts.add(mark);
    }

    void line(LineMark mark) {
        lines.add(mark);
    }

    void fill(FillMark mark) {
        fills.add(mark);
    }

    /** In drawing order. */
    public List<TextMark> texts() {
        return List.copyOf(texts);
    }

    /** Distinct, in order of first use. */
    public List<LineMark> lines() {
        return List.copyOf(lines);
    }

    /** Distinct, in order of first use. */
    public List<FillMark> fills() {
        return List.copyOf(fills);
    }
}
