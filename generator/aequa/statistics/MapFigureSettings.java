package aequa.statistics;

import java.util.List;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.ChecksSpec;
import aequa.project.MapDisplay;
import aequa.project.MapSpec;
import aequa.project.Measure;
import aequa.project.MissingFigures;
import aequa.project.Normalisation;
import aequa.project.ProjectFile;

/**
 * The parts of a {@link MapSpec} and {@link ChecksSpec} the statistics stage uses (their modes are enums
 * already, read where the project file is read), with contradictions reported as error findings on the project file.
 *
 * @param mapId                the map's id
 * @param indicator            the indicator mapped
 * @param periods              the periods asked for; empty for the latest
 * @param measure              rate, count, or undeclared
 * @param normalisation        none, per km2, or per a denominator
 * @param denominator          the denominator indicator, for {@link Normalisation#COLUMN} (never blank then:
 *                             the project file's checks report a missing {@code per}); else empty
 * @param multiplier           what a normalised value is multiplied by (positive, finite)
 * @param display              choropleth or circles
 * @param eventsIndicator      the indicator holding the number of events behind each rate, or empty
 * @param marginIndicator      the indicator holding each value's margin of error, or empty
 * @param rangeMin             the declared smallest valid value as given; -infinity when none
 * @param rangeMax             the declared largest valid value as given; +infinity when none
 * @param missingFigures       what a region without a figure is
 * @param fewestEvents         a rate built from fewer events is unreliable; 0 turns the check off
 * @param largestRelativeMargin a value whose margin / |value| exceeds this is unreliable; 0 turns it off
 * @param minMatchedPercent    the smallest share of regions, in percent, that must find a figure; 0 turns it off
 */
public record MapFigureSettings(String mapId, String indicator, List<String> periods, Measure measure,
                                Normalisation normalisation, String denominator, double multiplier,
                                MapDisplay display, String eventsIndicator, String marginIndicator,
                                double rangeMin, double rangeMax, MissingFigures missingFigures,
                                double fewestEvents, double largestRelativeMargin, double minMatchedPercent) {

    public MapFigureSettings {
        periods = List.copyOf(periods);
    }

    public static MapFigureSettings parse(MapSpec map, ChecksSpec checks, Findings findings) {
        String where = "map \"" + map.id() + "\", ";
        Measure measure = map.measure();
        Normalisation normalisation = map.normalise();
        MapDisplay display = map.display();
        MissingFigures missing = checks.missingFigures();
        double multiplier = map.multiplier();
        if (!(multiplier > 0) || Double.isInfinite(multiplier)) {
            findings.add(Finding.error("project-unknown-value", ProjectFile.FILE_NAME, where + "multiplier",
                    "The multiplier must be a positive number, not " + multiplier + ".",
                    "For example 1000 for \"per 1,000 people\"."));
            multiplier = 1.0;
        } else if (multiplier != 1.0 && normalisation == Normalisation.NONE) {
            findings.add(Finding.warning("project-unused-setting", ProjectFile.FILE_NAME, where + "multiplier",
                    "The multiplier is ignored because the map does not normalise its figures.",
                    "Remove it, or set normalise: area or normalise: column."));
        }
        double rangeMin = Double.NEGATIVE_INFINITY;
        double rangeMax = Double.POSITIVE_INFINITY;
        List<Double> range = map.range();
        if (!range.isEmpty()) {
            if (range.size() == 2 && range.get(0) != null && range.get(1) != null && range.get(0) <= range.get(1)) {
                rangeMin = range.get(0);
                rangeMax = range.get(1);
            } else {
                findings.add(Finding.error("project-unknown-value", ProjectFile.FILE_NAME, where + "range",
                        "The range must be two numbers, smallest first; it is " + range + ".",
                        "For example range: [0, 100] for shares in percent."));
            }
        }
        return new MapFigureSettings(map.id(), map.indicator(), map.periods(), measure, normalisation,
                normalisation == Normalisation.COLUMN ? map.per() : "", multiplier, display, map.eventsColumn(),
                map.marginColumn(), rangeMin, rangeMax, missing, checks.unreliableBelow(), checks.marginAbove(),
                checks.minMatchedPercent());
    }
}
