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
 * side of the equator and contain no pole: never Albers across the equator), normal cylindrical
 * (equatorial belts), transverse and oblique cylindrical (north-south and slanting belts: only when the
 * data are at least {@value #ELONGATED} times longer than wide, since a cylinder along a great circle cannot
 * beat the azimuthal projection on a round area), and the world families too when the data reach 60 deg
 * from their centre. The azimuthal domain ends 135 deg from the
 * centre, so it can never show the whole world in one piece.
 *
 * <p>Tie-break: unconventional aspects must earn their place. Among the candidates whose score is within
 * {@value #CONVENTIONAL_MARGIN} (relative) plus {@value #CONVENTIONAL_MARGIN_DEG} deg of the best, the most
 * conventional wins: north-up normal aspects first (azimuthal, conic, normal cylindrical, Equal Earth), then
 * Mollweide and the transverse aspect, then oblique. For whole-world data the largest omega sits at a pole
 * for every world family and says little, so Equal Earth, whose straight parallels and flattened poles
 * readers find familiar (Savric, Patterson and Jenny 2018, section 1), wins unless Mollweide is clearly
 * better. Stability: a previous choice that is still allowed is kept unless the new
 * best scores at least {@value #STABILITY_MARGIN} (10 %) lower. Parameters are rounded to readable steps
 * ({@link #roundingStepDeg}).
 */
public final class ProjectionChooser {

    /** A new choice replaces the previous one only when its score is this fraction lower. */
    static final double STABILITY_MARGIN = 0.10;

    /** Relative margin within which a more conventional aspect is preferred. */
    static final double CONVENTIONAL_MARGIN = 0.10;

    /** Absolute margin, in degrees, added to {@link #CONVENTIONAL_MARGIN}. */
    static final double CONVENTIONAL_MARGIN_DEG = 0.1;

    /** Samples used while searching parameters; the final figures use all of the footprint's samples. */
    static final int SEARCH_SAMPLES = 240;

    /** Elongation from which the transverse and oblique cylindrical aspects are tried. */
    static final double ELONGATED = 1.5;

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
        List<Evaluated> evaluated = families.parallelStream().map(family -> {
            // normal conic and cylindrical maps distort alike all along a parallel (Snyder 1987, chapters 10
            // and 14), so their search needs one sample per latitude only
            boolean latitudeOnly = family == ProjectionFamily.ALBERS_CONIC || family == ProjectionFamily.CYLINDRICAL;
            Map<String, Double> values = new FamilySearch(family, footprint, latitudeOnly ? latitudes : search, forced, step).run();
            EqualAreaProjection projection = request.family().isPresent()
                    ? Projections.create(family, values) : FamilySearch.build(family, values);
            return projection == null ? null : new Evaluated(projection, OmegaScore.of(projection, footprint.samples()));
        }).filter(java.util.Objects::nonNull).collect(java.util.stream.Collectors.toCollection(ArrayList::new));
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
        String reason = ChoiceReason.sentence(chosen.projection, chosen.score, footprint, basis,
                runnersUp.isEmpty() ? null : runnersUp.get(0));
        return new ProjectionChoice(chosen.projection, chosen.score.omegaMaxDeg(), chosen.score.omegaMeanDeg(),
                chosen.score.worstLonDeg(), chosen.score.worstLatDeg(), runnersUp, reason);
    }

    /** The families the trade's rules allow for this footprint (see the class comment). */
    static List<ProjectionFamily> candidateFamilies(Footprint footprint) {
        double latRange = footprint.maxLatDeg() - footprint.minLatDeg();
        boolean aroundTheGlobe = footprint.lonSpanDeg() >= 240 && latRange >= 120;
        boolean farFromCentre = footprint.lonSpanDeg() < 240 && footprint.angularRadiusDeg() > 100;
        if (aroundTheGlobe || farFromCentre) {
            return List.of(ProjectionFamily.EQUAL_EARTH, ProjectionFamily.MOLLWEIDE);
        }
        List<ProjectionFamily> families = new ArrayList<>(List.of(ProjectionFamily.LAMBERT_AZIMUTHAL, ProjectionFamily.CYLINDRICAL));
        if (footprint.elongation() >= ELONGATED) {
            families.add(ProjectionFamily.CYLINDRICAL_TRANSVERSE);
            families.add(ProjectionFamily.CYLINDRICAL_OBLIQUE);
        }
        if (!footprint.crossesEquator() && !footprint.containsNorthPole() && !footprint.containsSouthPole()) {
            families.add(ProjectionFamily.ALBERS_CONIC);
        }
        if (footprint.angularRadiusDeg() >= 60) {
            families.add(ProjectionFamily.EQUAL_EARTH);
            families.add(ProjectionFamily.MOLLWEIDE);
        }
        return families;
    }

    /**
     * The step parameters are rounded to, from the data's narrower dimension (half the smaller of the latitude
     * range and the longitude span shortened by cos(mid latitude)): 0.5 deg from 15 deg up, 0.1 deg from
     * 3 deg, 0.01 deg from 0.3 deg, else 0.001 deg; fine enough that rounding costs little omega (omega grows
     * with the square of the narrow dimension), coarse enough to read.
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
        double limit = best.score.score() * (1 + CONVENTIONAL_MARGIN) + CONVENTIONAL_MARGIN_DEG;
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
