package aequa.statistics;

import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * The figures of one map: for every region of the geometry, one {@link RegionFigure} per period.
 *
 * @param mapId    the map's id
 * @param periods  the periods shown, oldest first; {@code [""]} when the source has no period column
 * @param byRegion every region key of the geometry, sorted, to its figures in the order of {@code periods}
 */
public record MapFigures(String mapId, List<String> periods, SortedMap<String, List<RegionFigure>> byRegion) {

    public MapFigures {
        periods = List.copyOf(periods);
        TreeMap<String, List<RegionFigure>> copy = new TreeMap<>();
        for (Map.Entry<String, List<RegionFigure>> entry : byRegion.entrySet()) {
            if (entry.getValue().size() != periods.size()) {
                throw new IllegalArgumentException("Region " + entry.getKey() + " has " + entry.getValue().size()
                        + " figures for " + periods.size() + " periods");
            }
            copy.put(entry.getKey(), List.copyOf(entry.getValue()));
        }
        byRegion = Collections.unmodifiableSortedMap(copy);
    }

    /** The figures of {@code regionKey}, one per period; throws for a key that is not a region. */
    public List<RegionFigure> figures(String regionKey) {
        List<RegionFigure> figures = byRegion.get(regionKey);
        if (figures == null) {
            throw new IllegalArgumentException("No region " + regionKey);
        }
        return figures;
    }
}
