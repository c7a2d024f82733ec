package aequa.projection;

/**
 * How well a projection suits a footprint: Tissot's omega ({@link Distortion}) at every sample point, its
 * maximum and its area-weighted mean over the interior samples.
 *
 * <p>The score that the automatic choice minimises is {@code omegaMaxDeg + MEAN_WEIGHT * omegaMeanDeg}:
 * the maximum decides (it is the figure the caption discloses) and the mean, with a small weight, settles
 * near-ties, for example between world projections whose maxima all sit at the poles. With weight 0.01 the
 * mean can never cost the maximum more than 1 % of itself.
 *
 * @param omegaMaxDeg  largest omega over the samples inside the domain, in degrees
 * @param omegaMeanDeg area-weighted mean omega over the interior samples inside the domain, in degrees
 * @param worstLonDeg  longitude of the sample with the largest omega
 * @param worstLatDeg  latitude of that sample
 * @param outside      number of distinct samples outside the projection's domain (NaN omega)
 */
record OmegaScore(double omegaMaxDeg, double omegaMeanDeg, double worstLonDeg, double worstLatDeg, int outside) {

    /** Weight of the mean in {@link #score()}. */
    static final double MEAN_WEIGHT = 0.01;

    static OmegaScore of(EqualAreaProjection projection, FootprintSamples allSamples) {
        FootprintSamples samples = allSamples.withoutRepeats(); // same maximum, worst point and mean
        int n = samples.count();
        double[] lonLat = samples.lonLatDeg();
        double[] omega = new double[n];
        Distortion.omegaDeg(projection, lonLat, n, omega);
        double max = Double.NEGATIVE_INFINITY;
        int worst = -1;
        double weighted = 0;
        double weight = 0;
        int outside = 0;
        for (int i = 0; i < n; i++) {
            double w = omega[i];
            if (Double.isNaN(w)) {
                outside++;
                continue;
            }
            if (w > max) {
                max = w;
                worst = i;
            }
            if (i < samples.interiorCount()) {
                weighted += w * samples.weight(i);
                weight += samples.weight(i);
            }
        }
        if (worst < 0) {
            return new OmegaScore(Double.NaN, Double.NaN, Double.NaN, Double.NaN, outside);
        }
        double mean = weight > 0 ? weighted / weight : max;
        return new OmegaScore(max, mean, samples.lonDeg(worst), samples.latDeg(worst), outside);
    }

    /** The figure minimised: omegaMax + 0.01 omegaMean; infinite when any sample is off the domain. */
    double score() {
        if (outside > 0 || Double.isNaN(omegaMaxDeg)) {
            return Double.POSITIVE_INFINITY;
        }
        return omegaMaxDeg + MEAN_WEIGHT * omegaMeanDeg;
    }
}
