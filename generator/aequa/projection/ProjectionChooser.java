package aequa.projection;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Chooses the equal-area projection for a footprint: the candidate families the trade's rules allow, each
 * tuned by {@link FamilySearch}, judged by Tissot's omega over the footprint ({@link OmegaScore}).
 *
 * <p>Rules (common practice): a world family (Equal Earth, Mollweide) when the data span most of the globe
 * (at least 240 deg of longitude and 120 deg of latitude, or more than 100 deg from their centre); else
 * the regional families: Lambert azimuthal (round and polar extents), Albers (only when the data lie on one
 * side of the equator: never Albers across the equator; for data within {@value #NEAR_POLE_DEG} deg of a
 * pole also the limiting conic with one standard parallel at the pole, the better of the two kept), normal cylindrical
 * (equatorial belts), transverse and oblique cylindrical (north-south and slanting belts: only when the
 * data are at least {@value #ELONGATED} times longer than wide, since a cylinder along a great circle cannot
 * beat the azimuthal projection on a round area), and the world families too when the data reach 60 deg
 * from their centre. The azimuthal domain ends 135 deg from the
 * centre, so it can never show the whole world in one piece.
 *
 * <p>Tie-break, a stated trade: unconventional aspects must earn their place, but only by a fixed margin.
 * Among the candidates whose score is within {@value #CONVENTIONAL_MARGIN} (relative, no absolute allowance)
 * of the best, the most conventional wins: north-up normal aspects first (azimuthal, conic, normal
 * cylindrical, Equal Earth), then Mollweide and the transverse aspect, then oblique. Beyond the margin the
 * best wins whatever its aspect, and the reason sentence gives both figures. Measured on Natural Earth
 * 1:110m (ProjectionTailTest): an absolute allowance of 0.1 deg, as earlier versions had, kept a transverse
 * cylinder for Chile at 1.5 times the oblique one's omega and an azimuthal map for Malawi and Vanuatu at 1.6
 * to 3.3 times the transverse one's. For whole-world data the largest omega sits at a pole
 * for every world family and says little, so Equal Earth, whose straight parallels and flattened poles
 * readers find familiar (Savric, Patterson and Jenny 2018, section 1), wins unless Mollweide is clearly
 * better. Stability: a previous choice that is still allowed is kept unless the new
 * best scores at least {@value #STABILITY_MARGIN} (10 %) lower. Parameters are rounded to the coarsest readable
 * step that costs at most 2 % of the score ({@link FamilySearch}).
 */
public final class ProjectionChooser {

    /**
     * A new choice replaces the previous one only when its score is this fraction lower. Tuned, no published
     * source: large enough that a monthly update of the same regions keeps its projection (re-derived by
     * ProjectionChooserTest, which grows a footprint and checks the previous parameters stay).
     */
    static final double STABILITY_MARGIN = 0.10;

    /** Relative margin within which a more conventional aspect is preferred (see the class comment). */
    static final double CONVENTIONAL_MARGIN = 0.10;

    /**
     * Samples used while searching parameters; the final figures use all of the footprint's samples. Tuned for
     * speed, no published source: ProjectionTailTest checks that the choices made with it come within 5 % of a
     * brute-force search on Natural Earth countries, and ChooserBenchmark times it.
     */
    static final int SEARCH_SAMPLES = 240;

    /**
     * Elongation (long over short axis of the footprint) from which the transverse and oblique cylindrical
     * aspects are tried. A rule of thumb of this chooser (no published source, and no test re-derives it):
     * a footprint less elongated than this is left to the azimuthal and conic candidates, which saves the
     * time of searching the cylinders; ProjectionTailTest checks the resulting choices against a brute force.
     */
    static final double ELONGATED = 1.5;

    /**
     * Data this close to a pole (degrees of latitude) also try the Albers conic with a standard parallel at the
     * pole: for Antarctica it has half the polar azimuthal's omega (ProjectionTailTest).
     */
    static final double NEAR_POLE_DEG = 30.0;

    private static final int RUNNERS_UP = 4;

    private ProjectionChooser() {
    }

    /**
     * The choice for {@code footprint}. A forced family is the only candidate, forced parameters are kept
     * as given, the others are optimised.
     *
     * @throws IllegalArgumentException if forced parameters are invalid for the forced family (the project
     *                                  loader reports them to the user first)
     */
    public static ProjectionChoice choose(Footprint footprint, ProjectionRequest request) {
        Map<String, Double> forced = request.forcedParameters();
        List<ProjectionFamily> families = request.family().map(List::of).orElseGet(() -> candidateFamilies(footprint));
        double step = roundingStepDeg(footprint);
        FootprintSamples search = footprint.samples().thinned(SEARCH_SAMPLES);
        FootprintSamples latitudes = footprint.samples().byLatitude(SEARCH_SAMPLES);
        // the families are searched and scored in parallel, each alone; the list keeps their order
        List<Evaluated> evaluated = families.parallelStream()
                .map(family -> bestOfFamily(family, footprint, request, forced, step, search, latitudes))
                .filter(java.util.Objects::nonNull).collect(java.util.stream.Collectors.toCollection(ArrayList::new));
        evaluated.sort(Comparator.comparingDouble((Evaluated e) -> e.score.score()).thenComparing(e -> e.projection.family()));
        Evaluated chosen = mostConventionalNearBest(evaluated);
        ChoiceReason.Basis basis = request.family().isPresent() ? ChoiceReason.Basis.FORCED : ChoiceReason.Basis.AUTOMATIC;
        Evaluated previous = previous(request, footprint);
        if (previous != null && !previous.projection.parameters().equals(chosen.projection.parameters())
                && chosen.score.score() > (1 - STABILITY_MARGIN) * previous.score.score()) {
            chosen = previous;
            basis = ChoiceReason.Basis.KEPT_PREVIOUS;
        }
        List<ProjectionChoice.Candidate> runnersUp = new ArrayList<>();
        for (Evaluated e : evaluated) {
            if (e != chosen && runnersUp.size() < RUNNERS_UP) {
                runnersUp.add(new ProjectionChoice.Candidate(e.projection.family(), e.projection.parameters(),
                        e.score.omegaMaxDeg(), e.score.omegaMeanDeg()));
            }
        }
        ChoiceReason reason = ChoiceReason.of(chosen.projection, chosen.score.omegaMaxDeg(), footprint, basis,
                runnersUp.isEmpty() ? null : runnersUp.get(0));
        return new ProjectionChoice(chosen.projection, chosen.score.omegaMaxDeg(), chosen.score.omegaMeanDeg(),
                chosen.score.worstLonDeg(), chosen.score.worstLatDeg(), runnersUp, reason,
                DistortionSpread.of(chosen.projection, footprint, chosen.score.worstLonDeg(), chosen.score.worstLatDeg()));
    }

    /** The best of one family for the footprint, or null when no allowed values were found. */
    private static Evaluated bestOfFamily(ProjectionFamily family, Footprint footprint, ProjectionRequest request,
                                          Map<String, Double> forced, double step, FootprintSamples search,
                                          FootprintSamples latitudes) {
        // normal conic and cylindrical maps distort alike all along a parallel (Snyder 1987, chapters 10
        // and 14), so their search needs one sample per latitude only
        boolean latitudeOnly = family == ProjectionFamily.ALBERS_CONIC || family == ProjectionFamily.CYLINDRICAL;
        FootprintSamples samples = latitudeOnly ? latitudes : search;
        Evaluated best = evaluate(family, new FamilySearch(family, footprint, samples, forced, step).run(), request, footprint);
        if (family == ProjectionFamily.ALBERS_CONIC && nearPole(footprint) && !forced.containsKey(FamilyDefinitions.STANDARD_PARALLEL_1)) {
            // the limiting conic: one standard parallel at the pole, the other searched
            Map<String, Double> atPole = new java.util.HashMap<>(forced);
            atPole.put(FamilyDefinitions.STANDARD_PARALLEL_1, footprint.midLatDeg() >= 0 ? 90.0 : -90.0);
            Evaluated limiting = evaluate(family, new FamilySearch(family, footprint, samples, atPole, step).run(), request, footprint);
            if (best == null || limiting != null && limiting.score.score() < best.score.score()) {
                best = limiting;
            }
        }
        return best;
    }

    /** The family with these values, scored on all of the footprint's samples; null when the values are not allowed. */
    private static Evaluated evaluate(ProjectionFamily family, Map<String, Double> values, ProjectionRequest request,
                                      Footprint footprint) {
        EqualAreaProjection projection = request.family().isPresent()
                ? Projections.create(family, values) : FamilySearch.build(family, values);
        return projection == null ? null : new Evaluated(projection, OmegaScore.of(projection, footprint.samples()));
    }

    /** Whether the data contain a pole or reach within {@value #NEAR_POLE_DEG} deg of latitude of one. */
    static boolean nearPole(Footprint footprint) {
        return footprint.containsNorthPole() || footprint.containsSouthPole()
                || Math.max(Math.abs(footprint.minLatDeg()), Math.abs(footprint.maxLatDeg())) >= 90 - NEAR_POLE_DEG;
    }

    /** The families the trade's rules allow for this footprint (see the class comment). */
    static List<ProjectionFamily> candidateFamilies(Footprint footprint) {
        if (worldOnly(footprint)) {
            return List.of(ProjectionFamily.EQUAL_EARTH, ProjectionFamily.MOLLWEIDE);
        }
        List<ProjectionFamily> families = new ArrayList<>(List.of(ProjectionFamily.LAMBERT_AZIMUTHAL, ProjectionFamily.CYLINDRICAL));
        if (footprint.elongation() >= ELONGATED) {
            families.add(ProjectionFamily.CYLINDRICAL_TRANSVERSE);
            families.add(ProjectionFamily.CYLINDRICAL_OBLIQUE);
        }
        if (!footprint.crossesEquator() && !(footprint.containsNorthPole() && footprint.containsSouthPole())) {
            families.add(ProjectionFamily.ALBERS_CONIC);
        }
        if (footprint.angularRadiusDeg() >= 60) {
            families.add(ProjectionFamily.EQUAL_EARTH);
            families.add(ProjectionFamily.MOLLWEIDE);
        }
        return families;
    }

    /** Whether the data span so much of the globe that only the world families are candidates (class comment). */
    public static boolean worldOnly(Footprint footprint) {
        double latRange = footprint.maxLatDeg() - footprint.minLatDeg();
        boolean aroundTheGlobe = footprint.lonSpanDeg() >= 240 && latRange >= 120;
        boolean farFromCentre = footprint.lonSpanDeg() < 240 && footprint.angularRadiusDeg() > 100;
        return aroundTheGlobe || farFromCentre;
    }

    /**
     * The step for the parameters that are set from the data rather than searched (the central meridian of
     * conic and normal cylindrical maps) and the scale of the search's first moves, from the data's narrower
     * dimension (half the smaller of the latitude range and the longitude span shortened by cos(mid latitude)):
     * 0.5 deg from 15 deg up, 0.1 deg from 3 deg, 0.01 deg from 0.3 deg, else 0.001 deg. The searched
     * parameters are rounded by cost instead ({@link FamilySearch#READABLE_STEPS_DEG}).
     */
    static double roundingStepDeg(Footprint footprint) {
        double midLat = Math.toRadians(footprint.midLatDeg());
        double size = Math.min(footprint.maxLatDeg() - footprint.minLatDeg(), footprint.lonSpanDeg() * Math.cos(midLat)) / 2;
        if (size >= 15) {
            return 0.5;
        }
        if (size >= 3) {
            return 0.1;
        }
        return size >= 0.3 ? 0.01 : 0.001;
    }

    /** 0 for north-up normal aspects, 1 for transverse, 2 for oblique. */
    static int conventionality(ProjectionFamily family) {
        switch (family) {
            case CYLINDRICAL_TRANSVERSE:
            case MOLLWEIDE:
                return 1;
            case CYLINDRICAL_OBLIQUE:
                return 2;
            default:
                return 0;
        }
    }

    private static Evaluated mostConventionalNearBest(List<Evaluated> sorted) {
        Evaluated best = sorted.get(0);
        double limit = best.score.score() * (1 + CONVENTIONAL_MARGIN);
        Evaluated chosen = best;
        for (Evaluated e : sorted) {
            if (e.score.score() <= limit && conventionality(e.projection.family()) < conventionality(chosen.projection.family())) {
                chosen = e;
            }
        }
        return chosen;
    }

    /** The previous choice evaluated on this footprint, or null when there is none or it conflicts with the request. */
    private static Evaluated previous(ProjectionRequest request, Footprint footprint) {
        if (request.previous().isEmpty()) {
            return null;
        }
        ProjectionRequest.Previous previous = request.previous().get();
        if (request.family().isPresent() && request.family().get() != previous.family()) {
            return null;
        }
        for (Map.Entry<String, Double> e : request.forcedParameters().entrySet()) {
            if (FamilyDefinitions.find(previous.family(), e.getKey()) != null
                    && !Objects.equals(previous.parameters().get(e.getKey()), e.getValue())) {
                return null;
            }
        }
        EqualAreaProjection projection = FamilySearch.build(previous.family(), previous.parameters());
        if (projection == null) {
            return null;
        }
        OmegaScore score = OmegaScore.of(projection, footprint.samples());
        return Double.isFinite(score.score()) ? new Evaluated(projection, score) : null;
    }

    private static final class Evaluated {
        final EqualAreaProjection projection;
        final OmegaScore score;

        Evaluated(EqualAreaProjection projection, OmegaScore score) {
            this.projection = projection;
            this.score = score;
        }
    }
}
