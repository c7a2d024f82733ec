package aequa.composite;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.function.Supplier;
import java.util.stream.IntStream;

import org.locationtech.jts.geom.Point;

import aequa.ellipsoid.GeodesicDistance;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.project.InsetsSpec;
import aequa.project.ProjectFile;
import aequa.project.ProjectPlaces;
import aequa.projection.Footprint;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionChooser;
import aequa.projection.ProjectionRequest;

/**
 * Decides the parts of a map and a projection for each: with {@code insets: auto} the parts
 * {@link DetachedParts} finds, with a list the parts it names (everything else is the main part), with
 * {@code off} one part. The main part takes the map's projection request (forced settings, the previous
 * edition's choice); every other part gets the automatic choice for its own regions. A map whose projection
 * is forced gets no automatic parts, since a forced projection is a request for one projection.
 */
public final class CompositePlanner {

    /**
     * Chooses a part's projection: {@code compute} by default; the load step passes one that first asks its
     * geometry cache, keyed by the part's regions and the request. It may be called for several parts at once.
     */
    @FunctionalInterface
    public interface PartChooser {
        ProjectionChoice choose(List<String> keys, ProjectionRequest request, Supplier<ProjectionChoice> compute);
    }

    /** Where findings about a listed part point: the project file's places and the setting's JSON Pointer. */
    public record SettingPlace(ProjectPlaces places, String pointer) {
    }

    private CompositePlanner() {
    }

    /**
     * The parts, main part first; one part (holding every region) for a single map. Listed parts that hold no
     * region, or a key that is no region, are findings (errors) and the result is then empty.
     */
    public static List<PartPlan> plan(List<Region> regions, Map<String, Double> areaKm2ByKey, InsetsSpec insets,
                                      ProjectionRequest request, SettingPlace place, Findings findings) {
        return plan(regions, areaKm2ByKey, insets, request, place, findings, (keys, partRequest, compute) -> compute.get());
    }

    /** As {@link #plan(List, Map, InsetsSpec, ProjectionRequest, SettingPlace, Findings)}, choosing through {@code chooser}. */
    public static List<PartPlan> plan(List<Region> regions, Map<String, Double> areaKm2ByKey, InsetsSpec insets,
                                      ProjectionRequest request, SettingPlace place, Findings findings,
                                      PartChooser chooser) {
        Function<List<String>, Double> area = keys -> keys.stream().mapToDouble(areaKm2ByKey::get).sum();
        boolean forced = request.family().isPresent() || !request.forcedParameters().isEmpty();
        List<Group> groups = new ArrayList<>();
        Map<List<String>, DetachedParts.ChosenFor> madeAlready = Map.of();
        if (insets.listed()) {
            List<Group> listed = listedGroups(regions, insets, place, findings);
            if (listed == null) {
                return List.of();
            }
            groups.addAll(listed);
        } else if (!insets.off() && !forced && regions.size() > 1) {
            DetachedParts.Result found = DetachedParts.find(regions, areaKm2ByKey);
            madeAlready = found.automaticChoices();
            groups.add(new Group(found.main().keys(), "", 1, "", 0));
            for (DetachedParts.Group g : found.detached()) {
                groups.add(new Group(g.keys(), "", 1, "", g.gapKm()));
            }
        } else {
            groups.add(new Group(regions.stream().map(Region::key).toList(), "", 1, "", 0));
        }
        Map<String, Region> byKey = new HashMap<>();
        regions.forEach(r -> byKey.put(r.key(), r));
        // each part's footprint and choice stand alone, so the parts are chosen side by side; a part with an
        // automatic request takes the detection's own choice when one was made for the same regions in the same order
        Map<List<String>, DetachedParts.ChosenFor> known = madeAlready;
        List<Outcome> outcomes = IntStream.range(0, groups.size()).parallel().mapToObj(i -> {
            Group g = groups.get(i);
            ProjectionRequest partRequest = i == 0 ? request : ProjectionRequest.automatic();
            try {
                DetachedParts.ChosenFor made = partRequest.equals(ProjectionRequest.automatic()) ? known.get(g.keys) : null;
                if (made != null) {
                    return new Outcome(new DetachedParts.ChosenFor(made.footprint(),
                            chooser.choose(g.keys, partRequest, made::choice)), null);
                }
                Footprint footprint = Footprint.of(g.keys.stream().map(key -> byKey.get(key).lonLat()).toList());
                return new Outcome(new DetachedParts.ChosenFor(footprint,
                        chooser.choose(g.keys, partRequest, () -> ProjectionChooser.choose(footprint, partRequest))), null);
            } catch (RuntimeException e) {
                return new Outcome(null, e);
            }
        }).toList();
        List<DetachedParts.ChosenFor> chosen = new ArrayList<>();
        for (Outcome outcome : outcomes) {
            if (outcome.failure() != null) {
                throw outcome.failure(); // as thrown, whichever thread made the choice
            }
            chosen.add(outcome.chosen());
        }
        List<PartPlan> parts = new ArrayList<>();
        for (int i = 0; i < groups.size(); i++) {
            Group g = groups.get(i);
            List<Region> members = g.keys.stream().map(byKey::get).toList();
            Footprint footprint = chosen.get(i).footprint();
            String name = !g.name.isEmpty() ? g.name : i == 0 ? "Main map"
                    : defaultName(members, regions, areaKm2ByKey, g.gapKm, parts.get(0).footprint(), footprint);
            parts.add(new PartPlan(i == 0 ? "main" : "part-" + i, name, g.keys, i == 0, g.areaScale, g.corner,
                    area.apply(g.keys), g.gapKm, footprint, chosen.get(i).choice()));
        }
        return parts;
    }

    /** Up to this many region names, or values of a shared property, make a part's default name. */
    static final int NAMED_REGIONS = 2;

    private static final String[] COMPASS = {"north", "north-east", "east", "south-east", "south", "south-west", "west", "north-west"};

    /**
     * A detached part's default name, from the regions' own names where the data has them: the values of the
     * property that best describes the part (one that every region of the part has, written with letters, not
     * the same for the whole map, taking at most {@value #NAMED_REGIONS} values in the part; the fewest values
     * win), for example "Alaska" from the counties' {@code state}; else its regions' names when it has at most
     * {@value #NAMED_REGIONS}; else the largest region's name and how many more it holds ("Juneau and 28
     * more"); and only when the regions have no names (their keys stand in), where it lies: "29 regions, 820 km
     * north-west" (the gap, and the compass point of the geodesic from the main part's centre). Names are
     * listed largest area first.
     */
    static String defaultName(List<Region> members, List<Region> all, Map<String, Double> areaKm2ByKey, double gapKm,
                              Footprint main, Footprint part) {
        List<Region> largestFirst = members.stream().sorted(Comparator.comparingDouble((Region r) -> -areaKm2ByKey.get(r.key()))
                .thenComparing(Region::key)).toList();
        List<String> shared = SharedProperty.values(largestFirst, all, NAMED_REGIONS);
        if (!shared.isEmpty()) {
            return String.join(" and ", shared);
        }
        if (members.size() <= NAMED_REGIONS) {
            return String.join(" and ", largestFirst.stream().map(Region::name).toList());
        }
        Region largest = largestFirst.get(0);
        if (!largest.name().equals(largest.key())) {
            return String.format(Locale.ROOT, "%s and %,d more", largest.name(), members.size() - 1);
        }
        double azimuth = GeodesicDistance.azimuthDeg(main.sphericalCentreLonDeg(), main.sphericalCentreLatDeg(),
                part.sphericalCentreLonDeg(), part.sphericalCentreLatDeg());
        String direction = COMPASS[(int) Math.floorMod(Math.round(azimuth / 45), 8)];
        if (Double.isNaN(gapKm)) {
            return String.format(Locale.ROOT, "%d regions to the %s", members.size(), direction);
        }
        return String.format(Locale.ROOT, "%d regions, %,d km %s", members.size(), Math.round(gapKm / 10) * 10, direction);
    }

    /** The listed parts after the main part (the regions no part lists), or null after an error finding. */
    private static List<Group> listedGroups(List<Region> regions, InsetsSpec insets, SettingPlace place, Findings findings) {
        Set<String> known = new LinkedHashSet<>(regions.stream().map(Region::key).toList());
        Map<String, Integer> partOf = new HashMap<>();
        List<Group> parts = new ArrayList<>();
        boolean broken = false;
        for (int i = 0; i < insets.parts().size(); i++) {
            InsetsSpec.InsetPartSpec spec = insets.parts().get(i);
            String at = place.pointer() + "/" + i;
            Set<String> keys = new LinkedHashSet<>();
            boolean unknownKey = false;
            for (int k = 0; k < spec.regions().size(); k++) {
                String key = spec.regions().get(k);
                if (!known.contains(key)) {
                    error(findings, place, "insets-unknown-key", at + "/regions/" + k,
                            "Inset part " + (i + 1) + " lists '" + key + "', which is no region of the map.",
                            "Use the keys of the region source (the property named by its 'key').");
                    unknownKey = true;
                    broken = true;
                } else {
                    keys.add(key);
                }
            }
            if (!spec.box().isEmpty()) {
                for (Region r : regions) {
                    if (inBox(r, spec.box())) {
                        keys.add(r.key());
                    }
                }
            }
            for (String key : keys) {
                Integer other = partOf.putIfAbsent(key, i);
                if (other != null && other != i) {
                    error(findings, place, "insets-key-twice", at,
                            "The region '" + key + "' falls in inset parts " + (other + 1) + " and " + (i + 1) + ".",
                            "A region belongs to one part only; shrink a box or remove the key from one part.");
                    broken = true;
                }
            }
            if (keys.isEmpty() && !unknownKey && !(spec.regions().isEmpty() && spec.box().isEmpty())) {
                error(findings, place, "insets-empty-part", at, "Inset part " + (i + 1) + " holds no region of the map.",
                        "Check its keys, or widen its box: a region is in a box when a point inside it is.");
                broken = true;
            }
            List<String> inOrder = regions.stream().map(Region::key).filter(keys::contains).toList();
            parts.add(new Group(inOrder, spec.name(), spec.scale(), spec.corner(), Double.NaN));
        }
        List<String> main = regions.stream().map(Region::key).filter(k -> !partOf.containsKey(k)).toList();
        if (main.isEmpty()) {
            error(findings, place, "insets-no-main-part", place.pointer(), "The inset parts hold every region, leaving no main map.",
                    "Leave the main mass out of the list: the regions no part names make the main map.");
            broken = true;
        }
        if (broken) {
            return null;
        }
        List<Group> groups = new ArrayList<>();
        groups.add(new Group(main, "", 1, "", 0));
        groups.addAll(parts);
        return groups;
    }

    /** Whether a point inside the region lies in {@code [west, south, east, north]} (west > east crosses 180). */
    private static boolean inBox(Region region, List<Double> box) {
        if (region.lonLat().isEmpty()) {
            return false;
        }
        Point p = region.lonLat().getInteriorPoint();
        double west = box.get(0);
        double east = box.get(2);
        boolean lonIn = west <= east ? p.getX() >= west && p.getX() <= east : p.getX() >= west || p.getX() <= east;
        return lonIn && p.getY() >= box.get(1) && p.getY() <= box.get(3);
    }

    private static void error(Findings findings, SettingPlace place, String code, String pointer, String message, String hint) {
        findings.add(Finding.error(code, ProjectFile.FILE_NAME, place.places().place(pointer), message, hint));
    }

    private record Group(List<String> keys, String name, double areaScale, String corner, double gapKm) {
    }

    /** A part's choice, or the exception making it threw (for example forced parameters out of range). */
    private record Outcome(DetachedParts.ChosenFor chosen, RuntimeException failure) {
    }
}
