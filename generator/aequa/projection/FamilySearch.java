package aequa.projection;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static aequa.projection.FamilyDefinitions.AZIMUTH;
import static aequa.projection.FamilyDefinitions.CENTRE_LAT;
import static aequa.projection.FamilyDefinitions.CENTRE_LON;
import static aequa.projection.FamilyDefinitions.STANDARD_LINE_OFFSET;
import static aequa.projection.FamilyDefinitions.STANDARD_PARALLEL_1;
import static aequa.projection.FamilyDefinitions.STANDARD_PARALLEL_2;

/**
 * Finds good parameters of one family for a footprint: starts from the trade's rules of thumb, improves
 * them with {@link NelderMead} on the {@link OmegaScore}, rounds them to the coarsest readable step
 * ({@link #READABLE_STEPS_DEG}: 0.5 deg for a continent, finer for a narrow country) that costs at most
 * {@link #ROUNDING_COST} of the score, polishing on that step's lattice. Forced parameters stay as given.
 *
 * <p>Starting values (common practice in the trade): azimuthal centre at the data's spherical centre (the
 * pole when the data contain it); Albers standard parallels at 1/6 and 5/6 of the latitude range (the rule
 * for conic projections that Snyder 1987, "Map Projections: A Working Manual", USGS Professional Paper 1395,
 * gives after Deetz and Adams 1934, "Elements of Map Projection"; cited from memory, page not checked here;
 * only a starting point, the search then moves both parallels); for the
 * cylindrical aspects, lines of true scale at distance s from the central line with cos s =
 * sqrt(cos d_min cos d_max), which balances the scale error k = cos s / cos d (Snyder 1987, eq. 10-2) between
 * the nearest and farthest data (d_min, d_max: the data's angular distances from the central line).
 * Parameters that cannot change omega (the central meridian of conic and normal cylindrical maps, the
 * latitude of the origin) are set from the data and not searched.
 */
final class FamilySearch {

    /** Most evaluations Nelder-Mead may spend per free parameter. */
    private static final int EVALUATIONS_PER_PARAMETER = 30;

    /** Most rounds of the lattice polish (each tries one step either way on every free parameter). */
    private static final int POLISH_ROUNDS = 4;

    /**
     * Readable steps the searched parameters are rounded to, coarsest first: the first whose rounded (and
     * polished) parameters cost at most {@link #ROUNDING_COST} of the unrounded optimum's score is kept.
     */
    static final double[] READABLE_STEPS_DEG = {0.5, 0.1, 0.05, 0.01, 0.005, 0.001};

    /** Largest share of the score that rounding to a readable step may cost (issue #16: 2 % of omega max). */
    static final double ROUNDING_COST = 0.02;

    /** Stop when the simplex's scores agree within this many degrees. */
    private static final double TOLERANCE_DEG = 1e-4;

    private final ProjectionFamily family;
    private final Footprint footprint;
    private final FootprintSamples samples;
    private final Map<String, Double> forced;
    private final double roundingStepDeg;

    FamilySearch(ProjectionFamily family, Footprint footprint, FootprintSamples samples, Map<String, Double> forced,
                 double roundingStepDeg) {
        this.family = family;
        this.footprint = footprint;
        this.samples = samples;
        this.forced = forced;
        this.roundingStepDeg = roundingStepDeg;
    }

    /** The best parameter values found, by key, rounded to the step (forced ones as given). */
    Map<String, Double> run() {
        Map<String, Double> values = startValues();
        values.putAll(forcedValues());
        List<String> free = new ArrayList<>();
        for (String key : searchedKeys()) {
            if (!forced.containsKey(key)) {
                free.add(key);
            }
        }
        if (free.isEmpty()) {
            return values;
        }
        double[] start = new double[free.size()];
        double[] steps = new double[free.size()];
        for (int i = 0; i < start.length; i++) {
            start[i] = values.get(free.get(i));
            steps[i] = initialStep(free.get(i));
        }
        double[] optimum = NelderMead.minimise(x -> score(values, free, x), start, steps,
                EVALUATIONS_PER_PARAMETER * free.size(), TOLERANCE_DEG);
        double affordable = score(values, free, optimum) * (1 + ROUNDING_COST);
        double[] best = null;
        for (double readableStepDeg : READABLE_STEPS_DEG) {
            best = roundedAndPolished(values, free, optimum, readableStepDeg);
            if (score(values, free, best) <= affordable) {
                break;
            }
        }
        for (int i = 0; i < best.length; i++) {
            values.put(free.get(i), best[i]);
        }
        return values;
    }

    /** The optimum rounded to {@code stepDeg}, then moved one step at a time on that lattice while that helps. */
    private double[] roundedAndPolished(Map<String, Double> values, List<String> free, double[] optimum, double stepDeg) {
        double[] best = new double[optimum.length];
        for (int i = 0; i < best.length; i++) {
            best[i] = round(free.get(i), optimum[i], stepDeg);
        }
        double bestScore = score(values, free, best);
        boolean improved = true;
        for (int round = 0; round < POLISH_ROUNDS && improved; round++) {
            improved = false;
            for (int i = 0; i < best.length; i++) {
                for (double direction : new double[] {-1, 1}) {
                    double[] trial = best.clone();
                    trial[i] = round(free.get(i), trial[i] + direction * stepDeg, stepDeg);
                    double s = score(values, free, trial);
                    if (s < bestScore - 1e-12) {
                        best = trial;
                        bestScore = s;
                        improved = true;
                    }
                }
            }
        }
        return best;
    }

    /** Builds the projection, or returns null when the values are not allowed for this family. */
    static EqualAreaProjection build(ProjectionFamily family, Map<String, Double> values) {
        try {
            return Projections.create(family, values);
        } catch (IllegalArgumentException e) {
            return null;
        }
    }

    private double score(Map<String, Double> fixed, List<String> free, double[] x) {
        Map<String, Double> values = new HashMap<>(fixed);
        for (int i = 0; i < x.length; i++) {
            values.put(free.get(i), normalised(free.get(i), x[i]));
        }
        if (!allowed(values)) {
            return Double.POSITIVE_INFINITY;
        }
        EqualAreaProjection projection = build(family, values);
        return projection == null ? Double.POSITIVE_INFINITY : OmegaScore.of(projection, samples).score();
    }

    /** Family-specific limits beyond the parameter ranges: Albers stays in the data's hemisphere. */
    private boolean allowed(Map<String, Double> values) {
        if (family != ProjectionFamily.ALBERS_CONIC) {
            return true;
        }
        double side = footprint.maxLatDeg() + footprint.minLatDeg() >= 0 ? 1.0 : -1.0;
        double p1 = values.get(STANDARD_PARALLEL_1) * side;
        double p2 = values.get(STANDARD_PARALLEL_2) * side;
        return p1 >= 0 && p2 >= 0 && p1 + p2 > 0.5 && p1 <= 90 && p2 <= 90;
    }

    private List<String> searchedKeys() {
        switch (family) {
            case LAMBERT_AZIMUTHAL:
                return List.of(CENTRE_LON, CENTRE_LAT);
            case ALBERS_CONIC:
                return List.of(STANDARD_PARALLEL_1, STANDARD_PARALLEL_2);
            case CYLINDRICAL:
                return List.of(STANDARD_PARALLEL_1);
            case CYLINDRICAL_TRANSVERSE:
                return List.of(CENTRE_LON, STANDARD_LINE_OFFSET);
            case CYLINDRICAL_OBLIQUE:
                return List.of(CENTRE_LON, CENTRE_LAT, AZIMUTH, STANDARD_LINE_OFFSET);
            default:
                return footprint.lonSpanDeg() >= 359.9 ? List.of() : List.of(CENTRE_LON);
        }
    }

    private Map<String, Double> startValues() {
        Map<String, Double> v = new HashMap<>();
        double centreLon = round(CENTRE_LON, footprint.centreLonDeg());
        double midLat = round(CENTRE_LAT, footprint.midLatDeg());
        double range = footprint.maxLatDeg() - footprint.minLatDeg();
        v.put(CENTRE_LON, centreLon);
        v.put(CENTRE_LAT, midLat);
        switch (family) {
            case LAMBERT_AZIMUTHAL:
                if (footprint.containsNorthPole() != footprint.containsSouthPole()) {
                    v.put(CENTRE_LAT, footprint.containsNorthPole() ? 90.0 : -90.0);
                } else {
                    v.put(CENTRE_LON, footprint.sphericalCentreLonDeg());
                    v.put(CENTRE_LAT, footprint.sphericalCentreLatDeg());
                }
                break;
            case ALBERS_CONIC:
                v.put(STANDARD_PARALLEL_1, footprint.minLatDeg() + range / 6);
                v.put(STANDARD_PARALLEL_2, footprint.minLatDeg() + 5 * range / 6);
                break;
            case CYLINDRICAL: {
                double nearest = footprint.crossesEquator() ? 0 : Math.min(Math.abs(footprint.minLatDeg()), Math.abs(footprint.maxLatDeg()));
                double farthest = Math.min(80, Math.max(Math.abs(footprint.minLatDeg()), Math.abs(footprint.maxLatDeg())));
                v.put(STANDARD_PARALLEL_1, balancedOffsetDeg(nearest, farthest));
                break;
            }
            case CYLINDRICAL_TRANSVERSE:
            case CYLINDRICAL_OBLIQUE: {
                double azimuth = family == ProjectionFamily.CYLINDRICAL_TRANSVERSE ? 0.0 : normalised(AZIMUTH, footprint.orientationDeg());
                v.put(CENTRE_LON, footprint.sphericalCentreLonDeg());
                v.put(CENTRE_LAT, family == ProjectionFamily.CYLINDRICAL_TRANSVERSE ? midLat : footprint.sphericalCentreLatDeg());
                v.put(AZIMUTH, azimuth);
                v.put(STANDARD_LINE_OFFSET, balancedOffsetDeg(0, Math.min(80, farthestFromLine(v.get(CENTRE_LON),
                        v.get(CENTRE_LAT), azimuth))));
                break;
            }
            default:
                break;
        }
        return v;
    }

    private Map<String, Double> forcedValues() {
        Map<String, Double> v = new HashMap<>();
        for (ParameterDefinition d : FamilyDefinitions.of(family)) {
            if (forced.containsKey(d.key())) {
                v.put(d.key(), forced.get(d.key()));
            }
        }
        return v;
    }

    /** s with cos s = sqrt(cos a cos b): equal and opposite scale errors at distances a and b (degrees). */
    static double balancedOffsetDeg(double nearestDeg, double farthestDeg) {
        return Math.toDegrees(Math.acos(Math.sqrt(Math.cos(Math.toRadians(nearestDeg)) * Math.cos(Math.toRadians(farthestDeg)))));
    }

    /** Largest angular distance, in degrees, of a sample from the great circle through a point with an azimuth. */
    private double farthestFromLine(double lonDeg, double latDeg, double azimuthDeg) {
        SphereRotation rotation = SphereRotation.centredOn(lonDeg, latDeg, azimuthDeg);
        double[] f = new double[2];
        double farthest = 0;
        for (int i = 0; i < samples.count(); i++) {
            rotation.forward(Math.toRadians(samples.lonDeg(i)), Math.toRadians(samples.latDeg(i)), f);
            farthest = Math.max(farthest, Math.abs(Math.toDegrees(f[1])));
        }
        return farthest;
    }

    private double initialStep(String key) {
        double size = Math.max(footprint.maxLatDeg() - footprint.minLatDeg(), Math.min(footprint.lonSpanDeg(), 180.0) / 2);
        switch (key) {
            case AZIMUTH:
                return 15.0;
            case STANDARD_LINE_OFFSET:
            case STANDARD_PARALLEL_1:
            case STANDARD_PARALLEL_2:
                return Math.max(size / 8, 5 * roundingStepDeg);
            default:
                return Math.max(size / 6, 5 * roundingStepDeg);
        }
    }

    /** Longitudes wrap into [-180, 180], azimuths into [-90, 90] (the same line, drawn north-up). */
    private static double normalised(String key, double value) {
        if (CENTRE_LON.equals(key)) {
            return Longitudes.normalize(value) == -180.0 && value > 0 ? 180.0 : Longitudes.normalize(value);
        }
        if (AZIMUTH.equals(key)) {
            return value - 180.0 * Math.round(value / 180.0);
        }
        return value;
    }

    private double round(String key, double value) {
        return round(key, value, roundingStepDeg);
    }

    private static double round(String key, double value, double stepDeg) {
        double perDegree = Math.rint(1.0 / stepDeg);   // steps are whole fractions of a degree: 1/2, 1/10, ... 1/1000
        return normalised(key, Math.round(normalised(key, value) * perDegree) / perDegree);
    }
}
