package aequa.statistics;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

import aequa.findings.Excerpt;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.findings.Severity;
import aequa.inputs.figures.CellStatus;
import aequa.inputs.figures.FigureCell;
import aequa.inputs.figures.FigureTable;
import aequa.project.KeyMatching;
import aequa.project.MissingFigures;

/**
 * Joins the cells a map uses (its indicator, and the denominator, events and margin indicators when set)
 * to the regions of the geometry, and writes the join report as findings:
 * <ul>
 *   <li>{@code join-match-low} (error, before the per-key findings): fewer regions than
 *       {@code checks: min-matched-percent} found a figure; the message counts them and the hint says how many
 *       unmatched keys would match with leading zeros, case and spaces ignored;</li>
 *   <li>{@code join-indicator-missing} (error): an indicator the map uses is not in the source;</li>
 *   <li>{@code join-key-unmatched} (warning): a key in the statistics matches no region, each listed,
 *       with a hint when it would match under relaxed key matching;</li>
 *   <li>{@code join-region-dropped} (warning): a key whose region was in the geometry file but left out
 *       (for example an outline enclosing no area), with the reason; not counted as unmatched;</li>
 *   <li>{@code join-relaxed-match} (note): under relaxed matching, each key that matched only in its
 *       relaxed form;</li>
 *   <li>{@code join-duplicate-key} (error): a second cell for the same region, indicator and period (the
 *       first is kept);</li>
 *   <li>{@code join-not-a-number} (error): a used cell that is neither a number nor a declared marker;</li>
 *   <li>{@code join-out-of-range} (error): a reported value outside the map's declared range;</li>
 *   <li>{@code join-key-too-long} (error): a row whose key is longer than {@link TextLengths#MAX_KEY_CHARS}
 *       characters, left out;</li>
 *   <li>{@code join-missing-figure} (warning or error, as {@code checks: missing-figures} says): a region
 *       with no row for the mapped indicator in a period; it is drawn as no data.</li>
 * </ul>
 * Cells are visited in source order, so findings come out in a deterministic order.
 */
final class FigureJoin {

    private record Slot(FigureRole role, String period, String regionKey) {
    }

    private final Map<Slot, FigureCell> cells;

    private FigureJoin(Map<Slot, FigureCell> cells) {
        this.cells = cells;
    }

    /** The joined cell of a region for a role and period; empty when the source has none. */
    Optional<FigureCell> cell(FigureRole role, String period, String regionKey) {
        return Optional.ofNullable(cells.get(new Slot(role, period, regionKey)));
    }

    static FigureJoin join(MapFigureSettings settings, FigureTable table, List<String> periods,
                           List<RegionArea> regions, Map<String, String> droppedRegions, Findings findings) {
        List<String> regionKeys = regions.stream().map(RegionArea::key).toList();
        KeyMatcher matcher = new KeyMatcher(regionKeys);
        Map<Slot, FigureCell> joined = new HashMap<>();
        Map<String, FigureCell> unmatched = new LinkedHashMap<>();
        Map<FigureCell, String> relaxedMatches = new LinkedHashMap<>();
        Set<String> relaxedKeysSeen = new HashSet<>();
        Set<Integer> duplicateRowsReported = new HashSet<>();
        Set<Integer> longKeyRowsReported = new HashSet<>();
        for (FigureRole role : FigureRole.values()) {
            String indicator = role.indicatorIn(settings);
            if (indicator.isEmpty()) {
                continue;
            }
            if (!table.hasIndicator(indicator)) {
                findings.add(Finding.error("join-indicator-missing", table.file(), "",
                        "Map \"" + settings.mapId() + "\" uses \"" + indicator + "\" as " + role.description()
                                + ", but the statistics have no such indicator.",
                        "The indicators are: " + String.join(", ", table.indicators()) + "."));
                continue;
            }
            for (String period : periods) {
                for (FigureCell cell : table.cells(indicator, period)) {
                    if (TextLengths.keyTooLong(cell.key())) {
                        if (longKeyRowsReported.add(cell.row())) {
                            findings.add(TextLengths.keyTooLongFinding("join-key-too-long", table.file(),
                                    "row " + cell.row(), cell.key(), "The row is left out."));
                        }
                        continue;
                    }
                    Optional<KeyMatcher.Match> match = matcher.match(cell.key(), table.keyMatching());
                    if (match.isEmpty()) {
                        if (role == FigureRole.VALUE) {
                            unmatched.putIfAbsent(cell.key(), cell);
                        }
                        continue;
                    }
                    String region = match.get().regionKey();
                    if (match.get().relaxed() && role == FigureRole.VALUE && relaxedKeysSeen.add(cell.key())) {
                        relaxedMatches.put(cell, region);
                    }
                    FigureCell first = joined.putIfAbsent(new Slot(role, period, region), cell);
                    if (first != null) {
                        if (duplicateRowsReported.add(cell.row())) {
                            reportDuplicate(table, settings, region, first, cell, findings);
                        }
                        continue;
                    }
                    checkCell(table, settings, role, cell, findings);
                }
            }
        }
        Map<String, FigureCell> ofDropped = new LinkedHashMap<>();
        unmatched.keySet().stream().filter(droppedRegions::containsKey).toList()
                .forEach(key -> ofDropped.put(key, unmatched.remove(key)));
        if (table.hasIndicator(settings.indicator())) {
            reportLowMatch(table, settings, matcher, regionKeys, joined, unmatched.keySet(), findings);
        }
        reportRelaxedMatches(table, relaxedMatches, findings);
        reportUnmatched(table, matcher, unmatched, findings);
        ofDropped.forEach((key, cell) -> findings.add(Finding.warning("join-region-dropped", table.file(), "row " + cell.row(),
                "The statistics key \"" + key + "\" belongs to a region of the geometry that was left out: "
                        + droppedRegions.get(key) + "; its figure is not shown.",
                "Fix that region's outline in the geometry file (its own finding says what is wrong).")));
        if (table.hasIndicator(settings.indicator())) {
            reportMissingRegions(table, settings, periods, regionKeys, joined, findings);
        }
        return new FigureJoin(joined);
    }

    private static void checkCell(FigureTable table, MapFigureSettings settings, FigureRole role, FigureCell cell,
                                  Findings findings) {
        if (cell.malformed()) {
            findings.add(Finding.error("join-not-a-number", table.file(), table.place(cell),
                    "The value \"" + Excerpt.of(cell.text()) + "\" for region \"" + cell.key() + "\" is not a number.",
                    cell.problem()));
        } else if (role == FigureRole.VALUE && cell.status() == CellStatus.REPORTED
                && (cell.value() < settings.rangeMin() || cell.value() > settings.rangeMax())) {
            findings.add(Finding.error("join-out-of-range", table.file(), table.place(cell),
                    "The value " + Excerpt.of(cell.text().strip()) + " for region \"" + cell.key()
                            + "\" is outside the range declared for map \"" + settings.mapId() + "\" ["
                            + MapStatistics.plain(settings.rangeMin()) + ", "
                            + MapStatistics.plain(settings.rangeMax()) + "].",
                    "Correct the value, or the map's range: if the declared range is wrong."));
        }
    }

    private static void reportDuplicate(FigureTable table, MapFigureSettings settings, String region,
                                        FigureCell first, FigureCell again, Findings findings) {
        String period = again.period().isEmpty() ? "" : " in period " + again.period();
        findings.add(Finding.error("join-duplicate-key", table.file(), table.place(again),
                "Region \"" + region + "\" has a second figure for \"" + again.indicator() + "\"" + period
                        + " (key \"" + again.key() + "\"); the first, at row " + first.row() + ", is used.",
                "Remove or merge the duplicate rows" + (table.keyMatching() == KeyMatching.RELAXED
                        ? "; with relaxed key matching, keys differing only in case, spaces or leading zeros"
                        + " are the same region." : ".")));
    }

    /** The one-line summary of a join that half failed; see {@code checks: min-matched-percent}. */
    private static void reportLowMatch(FigureTable table, MapFigureSettings settings, KeyMatcher matcher,
                                       List<String> regionKeys, Map<Slot, FigureCell> joined,
                                       Set<String> unmatchedKeys, Findings findings) {
        Set<String> regions = new TreeSet<>(regionKeys);
        Set<String> matched = new HashSet<>();
        joined.keySet().stream().filter(slot -> slot.role() == FigureRole.VALUE).forEach(slot -> matched.add(slot.regionKey()));
        double percent = regions.isEmpty() ? 100 : 100.0 * matched.size() / regions.size();
        if (percent >= settings.minMatchedPercent()) {
            return;
        }
        long relaxable = table.keyMatching() == KeyMatching.EXACT
                ? unmatchedKeys.stream().filter(key -> matcher.relaxedCandidate(key).isPresent()).count() : 0;
        String hint = relaxable > 0
                ? String.format(Locale.ROOT, "%,d statistics keys match a region if leading zeros, case and spaces"
                        + " are ignored: set key-matching: relaxed for this source, or correct the keys.", relaxable)
                : "Check that 'key' names the column that holds the geometry's keys, and compare a few keys by hand;"
                        + " lower checks: min-matched-percent only if the gaps are real.";
        findings.add(Finding.error("join-match-low", table.file(), "",
                String.format(Locale.ROOT, "%,d of %,d regions of map \"%s\" matched a figure (%.1f %%); at least"
                        + " %s %% must.", matched.size(), regions.size(), settings.mapId(), percent,
                        MapStatistics.plain(settings.minMatchedPercent())),
                hint));
    }

    private static void reportRelaxedMatches(FigureTable table, Map<FigureCell, String> relaxedMatches,
                                             Findings findings) {
        relaxedMatches.forEach((cell, region) -> findings.add(Finding.note("join-relaxed-match", table.file(),
                "row " + cell.row(),
                "The statistics key \"" + cell.key() + "\" was matched to region \"" + region
                        + "\" ignoring case, whitespace and leading zeros.",
                "Correct the key to match exactly if this is not the same region.")));
    }

    private static void reportUnmatched(FigureTable table, KeyMatcher matcher, Map<String, FigureCell> unmatched,
                                        Findings findings) {
        unmatched.forEach((key, cell) -> {
            String hint;
            Optional<String> candidate = matcher.relaxedCandidate(key);
            if (candidate.isPresent() && table.keyMatching() == KeyMatching.EXACT) {
                hint = "It matches region \"" + candidate.get() + "\" if case, whitespace and leading zeros are"
                        + " ignored; correct the key, or set key-matching: relaxed for this source.";
            } else if (matcher.relaxedFormIsAmbiguous(key)) {
                hint = "Ignoring case, whitespace and leading zeros it matches several regions; correct the key.";
            } else {
                hint = "Check the key against the geometry's keys; the figure is not shown.";
            }
            findings.add(Finding.warning("join-key-unmatched", table.file(), "row " + cell.row(),
                    "The statistics key \"" + key + "\" matches no region of the geometry.", hint));
        });
    }

    private static void reportMissingRegions(FigureTable table, MapFigureSettings settings, List<String> periods,
                                             List<String> regionKeys, Map<Slot, FigureCell> joined,
                                             Findings findings) {
        Severity severity = settings.missingFigures() == MissingFigures.ERROR ? Severity.ERROR : Severity.WARNING;
        for (String region : new TreeSet<>(regionKeys)) {
            List<String> without = new ArrayList<>();
            for (String period : periods) {
                if (!joined.containsKey(new Slot(FigureRole.VALUE, period, region))) {
                    without.add(period);
                }
            }
            if (without.isEmpty()) {
                continue;
            }
            String when = without.size() == 1 && without.get(0).isEmpty() ? ""
                    : " in period" + (without.size() == 1 ? " " : "s ") + String.join(", ", without);
            findings.add(new Finding(severity, "join-missing-figure", table.file(), "",
                    "Region \"" + region + "\" has no figure for \"" + settings.indicator() + "\"" + when
                            + (severity == Severity.WARNING ? "; it is drawn as no data." : "."),
                    severity == Severity.ERROR
                            ? "Add the region's row, or set checks: missing-figures: warning to draw it as no data."
                            : "Add the region's row, or mark it with a missing-value marker to say so on purpose."));
        }
    }
}
