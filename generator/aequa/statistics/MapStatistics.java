package aequa.statistics;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeMap;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.figures.FigureTable;
import aequa.inputs.figures.PeriodOrder;
import aequa.project.ChecksSpec;
import aequa.project.MapSpec;

/**
 * The front door of the statistics stage: from a map's settings, its statistics table and the regions of
 * its geometry, the figure of every region in every period, ready to classify.
 *
 * <p>Steps, each reporting into {@code findings}: parse the map's settings; choose the periods; join the
 * cells to the regions and write the join report ({@link FigureJoin}); build each region's figure,
 * normalised, with its margin and reliability flag ({@link Normaliser}); refuse counts on a choropleth
 * ({@link CountGuard}); note how many figures are unreliable. The result always covers every region and
 * period (no data where there is nothing to show); whether it may be published is for the caller to decide
 * from {@link Findings#hasErrors()}.
 */
public final class MapStatistics {

    private MapStatistics() {
    }

    /**
     * @param map      the map as the project file describes it
     * @param table    the map's statistics source, as read by {@code FigureReaders}
     * @param regions  the regions of the map's geometry with their geodesic areas; keys should be unique
     *                 (a repeated key keeps its first area)
     * @param checks   the project's thresholds (missing figures, unreliable rates)
     * @param findings receives the join report and every other problem
     */
    public static MapFigures compute(MapSpec map, FigureTable table, List<RegionArea> regions, ChecksSpec checks,
                                     Findings findings) {
        return compute(map, table, regions, java.util.Map.of(), checks, findings);
    }

    /**
     * As {@link #compute(MapSpec, FigureTable, List, ChecksSpec, Findings)}, knowing which regions of the geometry
     * file were left out and why, so a figure keyed to one is reported as such, not as matching no region.
     *
     * @param droppedRegions why each left-out region was left out, by key (for example "its outline encloses no area")
     */
    public static MapFigures compute(MapSpec map, FigureTable table, List<RegionArea> regions,
                                     java.util.Map<String, String> droppedRegions, ChecksSpec checks, Findings findings) {
        MapFigureSettings settings = MapFigureSettings.parse(map, checks, findings);
        List<String> periods = choosePeriods(settings, table, findings);
        FigureJoin join = FigureJoin.join(settings, table, periods, regions, droppedRegions, findings);
        Normaliser normaliser = new Normaliser(settings, table, findings);
        TreeMap<String, List<RegionFigure>> byRegion = new TreeMap<>();
        List<Double> reportedValues = new ArrayList<>();
        List<Double> reportedAreas = new ArrayList<>();
        int unreliable = 0;
        for (RegionArea region : regions) {
            if (byRegion.containsKey(region.key())) {
                continue;
            }
            List<RegionFigure> figures = new ArrayList<>(periods.size());
            for (String period : periods) {
                RegionFigure figure = normaliser.figure(join, period, region);
                figures.add(figure);
                if (figure.status() == FigureStatus.REPORTED) {
                    reportedValues.add(figure.value());
                    reportedAreas.add(region.geodesicAreaKm2());
                }
                unreliable += figure.unreliable() ? 1 : 0;
            }
            byRegion.put(region.key(), figures);
        }
        CountGuard.check(settings, reportedValues, reportedAreas, findings);
        if (unreliable > 0) {
            findings.add(Finding.note("figures-unreliable", table.file(), "",
                    String.format(Locale.ROOT, "%d of %d figures of map \"%s\" are flagged unreliable (%s);"
                            + " they are hatched on the map and marked in tables.", unreliable,
                            reportedValues.size(), settings.mapId(), thresholds(settings)),
                    ""));
        }
        return new MapFigures(settings.mapId(), periods, byRegion);
    }

    /**
     * The periods asked for, oldest first, each checked against the source; when none are asked for, the
     * latest period of the indicator; {@code [""]} for a source without periods.
     */
    static List<String> choosePeriods(MapFigureSettings settings, FigureTable table, Findings findings) {
        List<String> available = table.periods(settings.indicator());
        if (settings.periods().isEmpty()) {
            return available.isEmpty() ? List.of("") : List.of(available.get(available.size() - 1));
        }
        Set<String> chosen = new LinkedHashSet<>();
        for (String period : settings.periods()) {
            if (!available.isEmpty() && !available.contains(period)) {
                findings.add(Finding.error("join-period-missing", table.file(), "",
                        "Map \"" + settings.mapId() + "\" asks for period \"" + period + "\" of \""
                                + settings.indicator() + "\", which the statistics do not have.",
                        "The periods are: " + String.join(", ", available) + "."));
            }
            chosen.add(period);
        }
        List<String> sorted = new ArrayList<>(chosen);
        sorted.sort(PeriodOrder.OLDEST_FIRST);
        return sorted;
    }

    private static String thresholds(MapFigureSettings settings) {
        List<String> parts = new ArrayList<>();
        if (settings.fewestEvents() > 0 && !settings.eventsIndicator().isEmpty()) {
            parts.add(String.format(Locale.ROOT, "fewer than %s events", plain(settings.fewestEvents())));
        }
        if (settings.largestRelativeMargin() > 0 && !settings.marginIndicator().isEmpty()) {
            parts.add(String.format(Locale.ROOT, "margin of error above %s of the value",
                    plain(settings.largestRelativeMargin())));
        }
        return String.join(" or ", parts);
    }

    /** A number as a reader writes it: no ".0" on whole numbers, Locale.ROOT. */
    static String plain(double number) {
        return number == Math.rint(number) && Math.abs(number) < 1e15
                ? Long.toString((long) number) : Double.toString(number);
    }
}
