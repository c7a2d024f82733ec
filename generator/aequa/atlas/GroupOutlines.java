package aequa.atlas;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;

import org.locationtech.jts.geom.Geometry;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.planar.DissolvedOutlines;
import aequa.project.ProjectFile;
import aequa.project.ProjectPlaces;
import aequa.project.RegionSourceSpec;

/**
 * The outline layer a map's {@code outlines} setting asks for: its regions grouped by the value of one
 * property (the source's key and name properties count too), each group dissolved into one outline
 * ({@link DissolvedOutlines}). A property no region has is an error at the setting's line, naming the
 * properties there are; regions without a value are outlined alone, with one warning for all of them.
 */
final class GroupOutlines {

    private GroupOutlines() {
    }

    /**
     * The outlines on the map's plane, {@link MapModel#NO_OUTLINES} when the setting is empty, or null after an
     * error finding.
     *
     * @param drawnM each region's drawn geometry, by key
     */
    static Geometry of(String mapId, String property, String pointer, RegionSourceSpec source, List<Region> regions,
                       Map<String, Geometry> drawnM, ProjectPlaces places, Findings findings) {
        if (property.isEmpty()) {
            return MapModel.NO_OUTLINES;
        }
        TreeSet<String> known = new TreeSet<>();
        regions.forEach(r -> known.addAll(r.attributes().keySet()));
        known.add(source.key());
        if (!source.name().isEmpty() && !aequa.project.NamePattern.isPattern(source.name())) {
            known.add(source.name());
        }
        if (!known.contains(property)) {
            findings.add(Finding.error("outlines-unknown-property", ProjectFile.FILE_NAME, places.place(pointer),
                    String.format(Locale.ROOT, "Map '%s' draws outlines by '%s', which no region of %s has.", mapId,
                            property, source.file()),
                    "Name a property of the regions: " + String.join(", ", known) + "."));
            return null;
        }
        Map<String, List<Geometry>> groups = new LinkedHashMap<>();
        List<String> withoutValue = new ArrayList<>();
        for (Region r : sortedByKey(regions)) {
            String value = valueOf(r, property, source);
            if (value == null || value.isBlank()) {
                withoutValue.add(r.key());
                value = "\u0000" + r.key(); // outlined alone
            }
            Geometry drawn = drawnM.get(r.key());
            if (drawn != null) {
                groups.computeIfAbsent(value, v -> new ArrayList<>()).add(drawn);
            }
        }
        if (!withoutValue.isEmpty()) {
            findings.add(Finding.warning("outlines-missing-value", source.file(), "feature \"" + withoutValue.get(0) + "\"",
                    String.format(Locale.ROOT, "On map '%s', %,d %s no value for '%s', so %s outlined alone.", mapId,
                            withoutValue.size(), withoutValue.size() == 1 ? "region has" : "regions have", property,
                            withoutValue.size() == 1 ? "it is" : "each is"),
                    "Fill the property in the region file to outline those regions with their group."));
        }
        return DissolvedOutlines.of(groups);
    }

    private static String valueOf(Region r, String property, RegionSourceSpec source) {
        if (property.equals(source.key())) {
            return r.key();
        }
        if (property.equals(source.name()) && !r.attributes().containsKey(property)) {
            return r.name();
        }
        return r.attributes().get(property);
    }

    private static List<Region> sortedByKey(List<Region> regions) {
        Map<String, Region> byKey = new TreeMap<>();
        regions.forEach(r -> byKey.put(r.key(), r));
        return new ArrayList<>(byKey.values());
    }
}
