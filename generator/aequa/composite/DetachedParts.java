package aequa.composite;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.function.Function;

import org.locationtech.jts.geom.Geometry;

import aequa.inputs.regions.Region;
import aequa.projection.Footprint;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionChooser;
import aequa.projection.ProjectionRequest;

/**
 * Finds the detached parts of a set of regions: groups of regions far from the main mass, which a single
 * projection would have to stretch to reach.
 *
 * <p>The rule, in four steps (thresholds chosen on real files; the figures they give on the US Census
 * Bureau's 2017 counties are in {@code CompositeRulesTest} and DEVELOPERS.md):
 * <ol>
 * <li><b>Near regions group together.</b> Regions less than {@value #LINK_SHARE} times the square root of the
 *     total area apart are grouped by single linkage ({@link RegionLinks}): 154 km for the United States, so
 *     the Hawaiian islands (117 km apart at most) form one group, and an offshore island county near its coast
 *     stays with the mainland. A region is never split: its own offshore islands always go with it.</li>
 * <li><b>The main mass</b> is the group with the largest geodesic area. A group is a candidate for a
 *     detached part when its geodesic gap to the main mass exceeds {@value #GAP_RATIO} times the square root
 *     of the main mass's area (the main mass's size): 420 km for the contiguous states. The main mass, with
 *     the groups that are not candidates, must hold at least {@value #MIN_MAIN_SHARE} of the total area (82 %
 *     for the United States); otherwise nothing is split off, since islands of like size with no main mass (an
 *     archipelago) are one map.</li>
 * <li><b>Candidates near each other form one part</b> when their gap is under {@value #MERGE_SHARE} of the
 *     smaller of their gaps to the main mass (an archipelago far away is one inset, not one per island).</li>
 * <li><b>A candidate is detached</b> when it lies far away, more than {@value #FAR_RATIO} times the main mass's
 *     size (Hawaii, 3,680 km from California; Puerto Rico, 1,500 km from Florida), or when it would cost the
 *     main map dearly: when the automatic projection for the main mass plus the candidate has a largest omega
 *     more than (1 + {@value #OMEGA_GROWTH}) times the main mass's own plus {@value #OMEGA_MARGIN_DEG} deg
 *     (Alaska, 820 km from Washington, takes the contiguous states' omega from 1.4 to 3.1 deg). Otherwise it
 *     stays in place on the main map (an island group off a coast that fits the same projection).</li>
 * </ol>
 * No part is split off when the whole set needs a world projection ({@link ProjectionChooser#worldOnly}),
 * since the whole globe has no main mass to move the rest around.
 */
final class DetachedParts {

    static final double LINK_SHARE = 0.05;
    static final double GAP_RATIO = 0.15;
    static final double FAR_RATIO = 0.5;
    static final double MERGE_SHARE = 0.25;
    static final double OMEGA_GROWTH = 0.5;
    static final double OMEGA_MARGIN_DEG = 0.5;
    static final double MIN_MAIN_SHARE = 0.5;

    /**
     * One group found.
     *
     * @param keys          its regions' keys, in source order
     * @param areaKm2       its geodesic area
     * @param gapKm         its geodesic gap to the main mass (0 for the main mass)
     * @param omegaWithDeg  the largest omega of the automatic projection for the main mass with this group added
     *                      (NaN for the main mass and for groups detached by their gap alone)
     */
    record Group(List<String> keys, double areaKm2, double gapKm, double omegaWithDeg) {
    }

    /**
     * @param main           the main mass (with every candidate that stayed)
     * @param detached       the detached parts, largest first
     * @param omegaMainDeg   the largest omega of the main mass's own automatic projection, before candidates
     *                       that stayed were added (NaN when no candidate needed the omega test)
     * @param linkKm         the grouping distance of step 1
     * @param detachGapKm    the gap of step 2
     * @param automaticChoices automatic projection choices already made, by the exact list of keys (in order)
     *                       they were made for: the main mass's (made for the omega test) when it is the main
     *                       part, and each detached part's own (made side by side with the omega test), so the
     *                       planner need not make them again
     */
    record Result(Group main, List<Group> detached, double omegaMainDeg, double linkKm, double detachGapKm,
                  Map<List<String>, ChosenFor> automaticChoices) {
    }

    /** An automatic choice and the footprint it was made for. */
    record ChosenFor(Footprint footprint, ProjectionChoice choice) {
    }

    private DetachedParts() {
    }

    /** The parts of {@code regions}; only a main mass holding every region when they need a world projection. */
    static Result find(List<Region> regions, Map<String, Double> areaKm2ByKey) {
        List<Geometry> lonLat = regions.stream().map(Region::lonLat).toList();
        double totalKm2 = regions.stream().mapToDouble(r -> areaKm2ByKey.get(r.key())).sum();
        // the whole set's footprint (for the world test) is analysed while step 1 links the regions; the
        // links are dropped when the set needs a world projection
        ForkJoinTask<Footprint> whole = ForkJoinPool.commonPool().submit(() -> Footprint.of(lonLat));
        double linkKm = LINK_SHARE * Math.sqrt(totalKm2);
        int[] groupOf = RegionLinks.groups(lonLat, linkKm * 1000);
        if (ProjectionChooser.worldOnly(whole.join())) {
            return new Result(new Group(keys(regions), totalKm2, 0, Double.NaN), List.of(), Double.NaN, 0, 0, Map.of());
        }
        int groupCount = 0;
        for (int g : groupOf) {
            groupCount = Math.max(groupCount, g + 1);
        }
        List<List<Region>> groups = new ArrayList<>();
        for (int g = 0; g < groupCount; g++) {
            groups.add(new ArrayList<>());
        }
        for (int r = 0; r < regions.size(); r++) {
            groups.get(groupOf[r]).add(regions.get(r));
        }
        Function<List<Region>, Double> area = members -> members.stream().mapToDouble(r -> areaKm2ByKey.get(r.key())).sum();
        // the largest group; ties go to the group met first in the file
        List<Region> main = groups.stream().max(Comparator.comparingDouble(area::apply)).orElseThrow();
        double mainKm2 = area.apply(main);
        double detachGapKm = GAP_RATIO * Math.sqrt(mainKm2);
        PointCloud mainCloud = PointCloud.of(main.stream().map(Region::lonLat).toList());

        List<Candidate> candidates = new ArrayList<>();
        List<Region> mainMass = new ArrayList<>(main);
        for (List<Region> group : groups) {
            if (group == main) {
                continue;
            }
            PointCloud cloud = PointCloud.of(group.stream().map(Region::lonLat).toList());
            double gapKm = cloud.gapKm(mainCloud);
            if (gapKm > detachGapKm) {
                candidates.add(new Candidate(new ArrayList<>(group), cloud, gapKm));
            } else {
                mainMass.addAll(group);
            }
        }
        double mainMassKm2 = area.apply(mainMass);
        if (mainMassKm2 < MIN_MAIN_SHARE * totalKm2) {
            return new Result(new Group(keys(regions), totalKm2, 0, Double.NaN), List.of(), Double.NaN, linkKm, detachGapKm,
                    Map.of());
        }
        mergeNearCandidates(candidates);

        double farKm = FAR_RATIO * Math.sqrt(mainKm2);
        List<Region> mainInOrder = inSourceOrder(regions, mainMass);
        // step 4's automatic choices (the main mass alone, and with each candidate that is not far) and every
        // candidate's own choice (the part's projection should it be detached; a far one always is, a near one
        // that stays costs one choice for a group far smaller than the main mass) are independent: they are
        // made side by side, and their results are read in this fixed order
        boolean omegaTest = !candidates.stream().allMatch(c -> c.gapKm > farKm);
        List<List<Region>> choices = new ArrayList<>();
        choices.add(omegaTest ? mainInOrder : List.of());
        for (Candidate c : candidates) {
            choices.add(c.gapKm <= farKm ? inSourceOrder(regions, mainInOrder, c.regions) : List.of());
            choices.add(c.regions);
        }
        List<ChosenFor> chosen = choices.parallelStream().map(DetachedParts::automaticChoice).toList();
        double omegaMain = omegaTest ? chosen.get(0).choice().omegaMaxDeg() : Double.NaN;
        Map<List<String>, ChosenFor> automaticChoices = new HashMap<>();
        List<Group> detached = new ArrayList<>();
        List<Region> stayed = new ArrayList<>();
        for (int i = 0; i < candidates.size(); i++) {
            Candidate c = candidates.get(i);
            double omegaWith = c.gapKm <= farKm ? chosen.get(2 * i + 1).choice().omegaMaxDeg() : Double.NaN;
            if (c.gapKm > farKm || omegaWith > omegaMain * (1 + OMEGA_GROWTH) + OMEGA_MARGIN_DEG) {
                detached.add(new Group(keys(c.regions), area.apply(c.regions), c.gapKm, omegaWith));
                automaticChoices.put(keys(c.regions), chosen.get(2 * i + 2));
            } else {
                stayed.addAll(c.regions);
            }
        }
        detached.sort(Comparator.comparingDouble(Group::areaKm2).reversed().thenComparing(g -> g.keys().get(0)));
        List<Region> finalMain = inSourceOrder(regions, mainInOrder, stayed);
        if (omegaTest && stayed.isEmpty()) {
            automaticChoices.put(keys(finalMain), chosen.get(0));
        }
        return new Result(new Group(keys(finalMain), area.apply(finalMain), 0, Double.NaN), detached, omegaMain,
                linkKm, detachGapKm, Map.copyOf(automaticChoices));
    }

    /** The regions of {@code all} that are in one of {@code subsets}, in the order of {@code all}. */
    @SafeVarargs
    private static List<Region> inSourceOrder(List<Region> all, List<Region>... subsets) {
        Set<String> wanted = new HashSet<>();
        for (List<Region> subset : subsets) {
            subset.forEach(r -> wanted.add(r.key()));
        }
        return all.stream().filter(r -> wanted.contains(r.key())).toList();
    }

    /** Step 3: single linkage among the candidates, in a fixed order. */
    private static void mergeNearCandidates(List<Candidate> candidates) {
        boolean merged = true;
        while (merged) {
            merged = false;
            search:
            for (int i = 0; i < candidates.size(); i++) {
                for (int j = i + 1; j < candidates.size(); j++) {
                    Candidate a = candidates.get(i);
                    Candidate b = candidates.get(j);
                    if (a.cloud.gapKm(b.cloud) < MERGE_SHARE * Math.min(a.gapKm, b.gapKm)) {
                        a.regions.addAll(b.regions);
                        a.cloud = PointCloud.of(a.regions.stream().map(Region::lonLat).toList());
                        a.gapKm = Math.min(a.gapKm, b.gapKm);
                        candidates.remove(j);
                        merged = true;
                        break search;
                    }
                }
            }
        }
    }

    /** The automatic projection choice for the regions, as the main map would get it; null for no regions (no choice asked). */
    private static ChosenFor automaticChoice(List<Region> regions) {
        if (regions.isEmpty()) {
            return null;
        }
        Footprint footprint = Footprint.of(regions.stream().map(Region::lonLat).toList());
        return new ChosenFor(footprint, ProjectionChooser.choose(footprint, ProjectionRequest.automatic()));
    }

    private static List<String> keys(List<Region> regions) {
        return regions.stream().map(Region::key).toList();
    }

    private static final class Candidate {
        final List<Region> regions;
        PointCloud cloud;
        double gapKm;

        Candidate(List<Region> regions, PointCloud cloud, double gapKm) {
            this.regions = regions;
            this.cloud = cloud;
            this.gapKm = gapKm;
        }
    }
}
