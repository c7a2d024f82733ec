package aequa.project;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

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
                      InsetsSpec insets, String outlines, Double largestCircleMm, Map<String, MapTexts> translations) {

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
        translations = translations == null ? Map.of() : Collections.unmodifiableMap(new LinkedHashMap<>(translations));
    }

    /**
     * This map with its own words (title, unit, notes, source, date) in the language {@code tag}, where the
     * project translates them; every other setting, and every word not translated, stays as written.
     */
    public MapSpec inLanguage(String tag) {
        return Translations.of(translations, tag).map(t -> toBuilder().title(or(t.title(), title)).unit(or(t.unit(), unit))
                .notes(or(t.notes(), notes)).source(or(t.source(), source)).asOf(or(t.asOf(), asOf)).build()).orElse(this);
    }

    private static String or(String translated, String written) {
        return translated == null ? written : translated;
    }

    /**
     * A builder for a map with identifier {@code id} and every other setting unset, so the canonical constructor
     * gives it its default (the project file's reader calls that constructor directly).
     */
    public static Builder builder(String id) {
        return new Builder().id(id);
    }

    /** A builder holding every setting of this map, to make a copy that differs in a few. */
    public Builder toBuilder() {
        Builder b = new Builder();
        b.id = id;
        b.title = title;
        b.regions = regions;
        b.figures = figures;
        b.indicator = indicator;
        b.periods = periods;
        b.measure = measure;
        b.normalise = normalise;
        b.per = per;
        b.multiplier = multiplier;
        b.unit = unit;
        b.display = display;
        b.classes = classes;
        b.colours = colours;
        b.projection = projection;
        b.eventsColumn = eventsColumn;
        b.marginColumn = marginColumn;
        b.notes = notes;
        b.source = source;
        b.asOf = asOf;
        b.range = range;
        b.insets = insets;
        b.outlines = outlines;
        b.largestCircleMm = largestCircleMm;
        b.translations = translations;
        return b;
    }

    /**
     * Makes a {@link MapSpec} in code, setting by setting; a setting left unset (or set to null) takes the
     * default the canonical constructor gives it. Not thread-safe; {@link #build()} may be called again.
     */
    public static final class Builder {
        private String id;
        private String title;
        private String regions;
        private String figures;
        private String indicator;
        private List<String> periods;
        private Measure measure;
        private Normalisation normalise;
        private String per;
        private Double multiplier;
        private String unit;
        private MapDisplay display;
        private ClassesSpec classes;
        private ColoursSpec colours;
        private ProjectionSpec projection;
        private String eventsColumn;
        private String marginColumn;
        private String notes;
        private String source;
        private String asOf;
        private List<Double> range;
        private InsetsSpec insets;
        private String outlines;
        private Double largestCircleMm;
        private Map<String, MapTexts> translations;

        private Builder() {
        }

        public Builder id(String value) { id = value; return this; }
        public Builder title(String value) { title = value; return this; }
        public Builder regions(String value) { regions = value; return this; }
        public Builder figures(String value) { figures = value; return this; }
        public Builder indicator(String value) { indicator = value; return this; }
        public Builder periods(List<String> value) { periods = value; return this; }
        public Builder measure(Measure value) { measure = value; return this; }
        public Builder normalise(Normalisation value) { normalise = value; return this; }
        public Builder per(String value) { per = value; return this; }
        public Builder multiplier(Double value) { multiplier = value; return this; }
        public Builder unit(String value) { unit = value; return this; }
        public Builder display(MapDisplay value) { display = value; return this; }
        public Builder classes(ClassesSpec value) { classes = value; return this; }
        public Builder colours(ColoursSpec value) { colours = value; return this; }
        public Builder projection(ProjectionSpec value) { projection = value; return this; }
        public Builder eventsColumn(String value) { eventsColumn = value; return this; }
        public Builder marginColumn(String value) { marginColumn = value; return this; }
        public Builder notes(String value) { notes = value; return this; }
        public Builder source(String value) { source = value; return this; }
        public Builder asOf(String value) { asOf = value; return this; }
        public Builder range(List<Double> value) { range = value; return this; }
        public Builder insets(InsetsSpec value) { insets = value; return this; }
        public Builder outlines(String value) { outlines = value; return this; }
        public Builder largestCircleMm(Double value) { largestCircleMm = value; return this; }
        public Builder translations(Map<String, MapTexts> value) { translations = value; return this; }

        /** The map, with the canonical constructor's defaults for the settings left null. */
        public MapSpec build() {
            return new MapSpec(id, title, regions, figures, indicator, periods,
                    measure, normalise, per, multiplier, unit, display, classes, colours, projection,
                    eventsColumn, marginColumn, notes, source, asOf, range, insets, outlines, largestCircleMm, translations);
        }
    }
}
