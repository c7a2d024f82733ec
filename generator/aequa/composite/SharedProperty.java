package aequa.composite;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import aequa.inputs.regions.Region;

/**
 * Finds the property that names a group of regions, such as the {@code state} of a group of counties: one
 * that every region of the group has, whose values hold a letter (codes such as "02" name nothing), that
 * does not take one value for every region of the map (a country column says nothing about a part), and
 * that takes at most a few values in the group. Among those, the one with the fewest values in the group
 * wins, then the one with the fewest values over the map (the coarsest grouping), then the property name.
 */
final class SharedProperty {

    private SharedProperty() {
    }

    /**
     * The values of the best property in {@code group}, in the order of the group's regions (pass them
     * largest first); empty when no property qualifies.
     */
    static List<String> values(List<Region> group, List<Region> all, int maxValues) {
        if (group.isEmpty()) {
            return List.of();
        }
        List<String> best = List.of();
        String bestProperty = null;
        int bestOverall = Integer.MAX_VALUE;
        List<String> properties = new ArrayList<>(group.get(0).attributes().keySet());
        properties.sort(Comparator.naturalOrder());
        for (String property : properties) {
            Set<String> inGroup = new LinkedHashSet<>();
            boolean usable = true;
            for (Region r : group) {
                String value = r.attributes().get(property);
                if (value == null || value.isBlank() || value.chars().noneMatch(Character::isLetter)) {
                    usable = false;
                    break;
                }
                inGroup.add(value.strip());
            }
            if (!usable || inGroup.size() > maxValues) {
                continue;
            }
            int overall = distinct(all, property);
            if (overall <= 1) {
                continue;
            }
            boolean better = bestProperty == null || inGroup.size() < best.size()
                    || inGroup.size() == best.size() && overall < bestOverall;
            if (better) {
                best = List.copyOf(inGroup);
                bestProperty = property;
                bestOverall = overall;
            }
        }
        return best;
    }

    /** How many values {@code property} takes over {@code regions}, counting missing as one value. */
    private static int distinct(List<Region> regions, String property) {
        Set<String> values = new HashSet<>();
        for (Region r : regions) {
            values.add(String.valueOf(r.attributes().get(property)));
        }
        return values.size();
    }
}
