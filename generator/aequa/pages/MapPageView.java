package aequa.pages;

import java.util.List;

/**
 * One map's page.
 *
 * @param id          the map's file-safe id (also the id of its HTML elements)
 * @param title       the map's title
 * @param unit        what the colours measure
 * @param asOf        the date the figures refer to
 * @param caption     the HTML caption: projection, datum, source and date in one or two sentences
 * @param summary     the text alternative of the map: what it shows, its classes and extremes
 * @param svg         aequa's own web SVG of the map; inserted unescaped, so it must never contain user text
 *                    that the drawing stage did not escape
 * @param notes       the map's notes, or empty
 * @param source      the credit for the figures, or empty
 * @param legend      the classes, for the HTML legend that repeats the one drawn in the SVG (empty for circles)
 * @param circleKey   for a map of proportional circles, the sentence that says what their areas show; else empty
 * @param downloads   the files readers can take away
 * @param figuresHref link to the map's data table, relative to this page
 */
public record MapPageView(String id, String title, String unit, String asOf, String caption, String summary,
                          String svg, String notes, String source, List<LegendRow> legend, String circleKey,
                          List<Download> downloads, String figuresHref) {

    public MapPageView {
        legend = List.copyOf(legend);
        downloads = List.copyOf(downloads);
    }

    /**
     * @param label what the file is ("Print SVG")
     * @param href  its link, relative to the page
     * @param kind  the media type, for the link's {@code type} attribute
     */
    public record Download(String label, String href, String kind) {
    }

    /**
     * @param fill  the swatch colour, {@code #rrggbb}
     * @param range the class range as readers see it ("10 to under 20")
     * @param count how many regions fall in it
     */
    public record LegendRow(String fill, String range, int count) {
    }
}
