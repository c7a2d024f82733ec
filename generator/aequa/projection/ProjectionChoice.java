package aequa.projection;

import java.util.List;

/**
 * The projection chosen for a map, with the evidence for the choice: angular distortion (Tissot's omega,
 * the maximum angular deformation at a point) over the data's footprint, the runners-up and the reason.
 *
 * @param projection   the chosen projection
 * @param omegaMaxDeg  the largest omega over the footprint's sample points, in degrees
 * @param omegaMeanDeg the area-weighted mean omega over the footprint, in degrees
 * @param worstLonDeg  longitude of the sample point where omega is largest
 * @param worstLatDeg  latitude of that point
 * @param runnersUp    the best other candidates, best first
 * @param why          why this projection was chosen, as facts the wording stage words for readers
 * @param spread       how omega is spread over the mapped area, for readers ({@link DistortionSpread})
 */
public record ProjectionChoice(EqualAreaProjection projection, double omegaMaxDeg, double omegaMeanDeg,
                               double worstLonDeg, double worstLatDeg, List<Candidate> runnersUp, ChoiceReason why,
                               DistortionSpread spread) {

    public ProjectionChoice {
        runnersUp = List.copyOf(runnersUp);
    }

    /** A choice whose spread was not measured ({@link DistortionSpread#UNKNOWN}). */
    public ProjectionChoice(EqualAreaProjection projection, double omegaMaxDeg, double omegaMeanDeg,
                            double worstLonDeg, double worstLatDeg, List<Candidate> runnersUp, ChoiceReason why) {
        this(projection, omegaMaxDeg, omegaMeanDeg, worstLonDeg, worstLatDeg, runnersUp, why, DistortionSpread.UNKNOWN);
    }

    /** Why this projection was chosen, in one English sentence (report.json, the terminal). */
    public String reason() {
        return ChoiceReason.sentence(this);
    }

    /** A candidate that was evaluated and not chosen. */
    public record Candidate(ProjectionFamily family, List<ProjectionParameter> parameters,
                            double omegaMaxDeg, double omegaMeanDeg) {
        public Candidate {
            parameters = List.copyOf(parameters);
        }
    }
}
