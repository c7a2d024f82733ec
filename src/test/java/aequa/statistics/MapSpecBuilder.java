package aequa.statistics;

import java.util.List;

import aequa.project.MapDisplay;
import aequa.project.MapSpec;
import aequa.project.Measure;
import aequa.project.Normalisation;
import aequa.project.Words;

/** Builds {@link MapSpec}s for the statistics tests from the project file's words; null fields take the record's defaults. */
final class MapSpecBuilder {

    private final String indicator;
    private List<String> periods;
    private String measure;
    private String normalise;
    private String per;
    private Double multiplier;
    private String display;
    private String eventsColumn;
    private String marginColumn;
    private List<Double> range;

    private MapSpecBuilder(String indicator) {
        this.indicator = indicator;
    }

    static MapSpecBuilder mapOf(String indicator) {
        return new MapSpecBuilder(indicator);
    }

    MapSpecBuilder periods(String... values) { periods = List.of(values); return this; }
    MapSpecBuilder measure(String value) { measure = value; return this; }
    MapSpecBuilder normalise(String value) { normalise = value; return this; }
    MapSpecBuilder per(String value) { per = value; return this; }
    MapSpecBuilder multiplier(double value) { multiplier = value; return this; }
    MapSpecBuilder display(String value) { display = value; return this; }
    MapSpecBuilder eventsColumn(String value) { eventsColumn = value; return this; }
    MapSpecBuilder marginColumn(String value) { marginColumn = value; return this; }
    MapSpecBuilder range(double min, double max) { range = List.of(min, max); return this; }

    MapSpec build() {
        return MapSpec.builder("m").regions("regions").figures("figures").indicator(indicator).periods(periods)
                .measure(Words.of(Measure.class, measure)).normalise(Words.of(Normalisation.class, normalise)).per(per)
                .multiplier(multiplier).display(Words.of(MapDisplay.class, display)).eventsColumn(eventsColumn)
                .marginColumn(marginColumn).range(range).build();
    }
}
