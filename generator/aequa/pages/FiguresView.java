package aequa.pages;

import java.util.List;

/**
 * A map's figures as a table that needs no JavaScript. All numbers are already formatted for readers.
 *
 * @param id         the map's file-safe id
 * @param title      the map's title
 * @param unit       the unit of the normalised value
 * @param periods    the periods, oldest first; each row has one cell per period
 * @param rows       one row per region, sorted by key
 * @param mapHref    link back to the map's page, relative to this page
 * @param csvHref    link to the CSV download, relative to this page
 * @param hasMargins whether any figure has a margin of error (the table then shows a column for it)
 * @param hasParts   whether the map is drawn in parts (the table then names each region's part)
 */
public record FiguresView(String id, String title, String unit, List<String> periods, List<Row> rows,
                          String mapHref, String csvHref, boolean hasMargins, boolean hasParts) {

    public FiguresView {
        periods = List.copyOf(periods);
        rows = List.copyOf(rows);
    }

    /** The table of a map on one projection. */
    public FiguresView(String id, String title, String unit, List<String> periods, List<Row> rows,
                       String mapHref, String csvHref, boolean hasMargins) {
        this(id, title, unit, periods, rows, mapHref, csvHref, hasMargins, false);
    }

    /**
     * @param key     the join key
     * @param name    the region's name
     * @param areaKm2 the geodesic area, formatted
     * @param cells   one per period
     * @param part    the name of the map part the region is drawn in (empty for a map on one projection)
     */
    public record Row(String key, String name, String areaKm2, List<Cell> cells, String part) {
        public Row {
            cells = List.copyOf(cells);
        }
    }

    /**
     * @param status      {@code reported}, {@code zero}, {@code no data}, {@code suppressed} or {@code not applicable}
     *                    (the CSV's word, also the cell's class name)
     * @param statusLabel the status in the page's language
     * @param value       the figure as given, formatted, or empty unless reported
     * @param normalised  the value mapped, formatted, or empty unless reported
     * @param classNumber the class, 1 = lowest, or empty
     * @param unreliable  whether the figure rests on too few events or too wide a margin
     * @param margin      the figure's margin of error, formatted, or empty when the source gives none
     */
    public record Cell(String status, String statusLabel, String value, String normalised, String classNumber, boolean unreliable,
                       String margin) {
    }
}
