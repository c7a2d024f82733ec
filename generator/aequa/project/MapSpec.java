package aequa.project;

import java.util.List;

/**
 * One map as the project file describes it.
 *
 * @param id          a short, URL-safe identifier; names the map's page and files
 * @param title       the map's title
 * @param regions     id of a geometry source
 * @param figures     id of a statistics source
 * @param indicator   the indicator (wide layout: its column) to map
 * @param periods     the periods to show; empty for the latest; several make small multiples with shared classes
 * @param measure     rate (already a rate or share), count (a number of things or people), or undeclared
 *                    (taken as a rate unless the values look like counts)
 * @param normalise   none, area (per km2 of geodesic area) or column (per {@code per})
 * @param per         the denominator column when normalising by column
 * @param multiplier  what the normalised value is multiplied by (for example 1000 for "per 1,000 people")
 * @param unit        the unit readers see, for example "clinics per 1,000 km2"
 * @param display     choropleth or circles (proportional symbols, for counts)
 * @param classes     the classification
 * @param colours     the colour ramp
 * @param projection  projection settings overriding the project-wide ones
 * @param eventsColumn the column holding the count a rate was built from, to flag unreliable rates
 * @param marginColumn the column holding the margin of error of each value
 * @param notes       notes shown under the map
 * @param source      the credit for the figures
 * @param asOf        the date or period the figures refer to, as readers should see it
 * @param range       the declared valid range {@code [min, max]} of the values as given (for example
 *                    {@code [0, 100]} for shares in percent), or empty for no check
 * @param insets      how detached parts are drawn; null to follow the region source's setting
 * @param outlines    a property of the regions to draw group outlines by (for example {@code state} on a
 *                    county map: the counties of one state dissolved into one outline over the fills), or empty
 * @param largestCircleMm the diameter of the largest circle of a circle map in print, millimetres
 *                    ({@value #MIN_CIRCLE_MM} to {@value #MAX_CIRCLE_MM}), or null for the size the map's
 *                    extent suggests
 * @param translations the map's own words in more languages, by language tag (see {@link Translations})
 */
public record MapSpec(String id, String title, String regions, String figures, String indicator, List<String> periods,
                      Measure measure, Normalisation normalise, String per, Double multiplier, String unit,
                      MapDisplay display, ClassesSpec classes, ColoursSpec colours, ProjectionSpec projection, String eventsColumn,
                      String marginColumn, String notes, String source, String asOf, List<Double> range,
                      InsetsSpec insets, String outlines, Double largestCircleMm, java.util.Map<String, MapTexts> translations) {

    /** Bounds of {@code largest-circle-mm}: a 2 mm circle is still seen, a 40 mm one covers a two-column map's width. */
    public static final double MIN_CIRCLE_MM = 2;
    public static final double MAX_CIRCLE_MM = 40;

    public MapSpec {
        outlines = outlines == null ? "" : outlines.strip();
        title = title == null ? id : title;
        periods = periods == null ? List.of() : List.copyOf(periods);
        measure = measure == null ? Measure.UNDECLARED : measure;
        normalise = normalise == null ? Normalisation.NONE : normalise;
        per = per == null ? "" : per;
        multiplier = multiplier == null ? 1.0 : multiplier;
        unit = unit == null ? "" : unit;
        display = display == null ? MapDisplay.CHOROPLETH : display;
        classes = classes == null ? ClassesSpec.DEFAULT : classes;
        colours = colours == null ? ColoursSpec.DEFAULT : colours;
        eventsColumn = eventsColumn == null ? "" : eventsColumn;
        marginColumn = marginColumn == null ? "" : marginColumn;
        notes = notes == null ? "" : notes;
        source = source == null ? "" : source;
        asOf = asOf == null ? "" : asOf;
        range = range == null ? List.of() : List.copyOf(range);
        translations = translations == null ? java.util.Map.of()
                : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(translations));
    }

    /** A map without translations of its own words (the record's shape before {@code translations}). */
    public MapSpec(String id, String title, String regions, String figures, String indicator, List<String> periods,
                   Measure measure, Normalisation normalise, String per, Double multiplier, String unit, MapDisplay display,
                   ClassesSpec classes, ColoursSpec colours, ProjectionSpec projection, String eventsColumn,
                   String marginColumn, String notes, String source, String asOf, List<Double> range,
                   InsetsSpec insets, String outlines, Double largestCircleMm) {
        this(id, title, regions, figures, indicator, periods, measure, normalise, per, multiplier, unit, display,
                classes, colours, projection, eventsColumn, marginColumn, notes, source, asOf, range, insets, outlines,
                largestCircleMm, null);
    }

    /**
     * This map with its own words (title, unit, notes, source, date) in the language {@code tag}, where the
     * project translates them; every other setting, and every word not translated, stays as written.
     */
    public MapSpec inLanguage(String tag) {
        return Translations.of(translations, tag).map(t -> new MapSpec(id, or(t.title(), title), regions, figures,
                indicator, periods, measure, normalise, per, multiplier, or(t.unit(), unit), display, classes, colours,
                projection, eventsColumn, marginColumn, or(t.notes(), notes), or(t.source(), source), or(t.asOf(), asOf),
                range, insets, outlines, largestCircleMm, translations)).orElse(this);
    }

    private static String or(String translated, String written) {
        return translated == null ? written : translated;
    }

    /** A map without outlines and with circles sized by the map (the record's shape before those settings). */
    public MapSpec(String id, String title, String regions, String figures, String indicator, List<String> periods,
                   Measure measure, Normalisation normalise, String per, Double multiplier, String unit, MapDisplay display,
                   ClassesSpec classes, ColoursSpec colours, ProjectionSpec projection, String eventsColumn,
                   String marginColumn, String notes, String source, String asOf, List<Double> range, InsetsSpec insets) {
        this(id, title, regions, figures, indicator, periods, measure, normalise, per, multiplier, unit, display,
                classes, colours, projection, eventsColumn, marginColumn, notes, source, asOf, range, insets, null, null);
    }

    /** A map that follows its region source's {@code insets} setting (the record's shape before insets). */
    public MapSpec(String id, String title, String regions, String figures, String indicator, List<String> periods,
                   Measure measure, Normalisation normalise, String per, Double multiplier, String unit, MapDisplay display,
                   ClassesSpec classes, ColoursSpec colours, ProjectionSpec projection, String eventsColumn,
                   String marginColumn, String notes, String source, String asOf, List<Double> range) {
        this(id, title, regions, figures, indicator, periods, measure, normalise, per, multiplier, unit, display,
                classes, colours, projection, eventsColumn, marginColumn, notes, source, asOf, range, null);
    }

    /** A map without a declared range (the record's shape before {@code range} was added). */
    public MapSpec(String id, String title, String regions, String figures, String indicator, List<String> periods,
                   Measure measure, Normalisation normalise, String per, Double multiplier, String unit, MapDisplay display,
                   ClassesSpec classes, ColoursSpec colours, ProjectionSpec projection, String eventsColumn,
                   String marginColumn, String notes, String source, String asOf) {
        this(id, title, regions, figures, indicator, periods, measure, normalise, per, multiplier, unit, display,
                classes, colours, projection, eventsColumn, marginColumn, notes, source, asOf, null, null);
    }
}
