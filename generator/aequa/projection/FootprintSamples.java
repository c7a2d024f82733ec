package aequa.projection;

import java.util.Arrays;

/**
 * Sample points of a footprint: first the interior points, each weighted by the area of the ellipsoid it
 * stands for (in steradians of the unit sphere), then boundary points with weight 0 (first the extreme
 * vertices: north-, south-, east- and westernmost; then an even stride through all vertices), which count for the maximum but not for the mean. Coordinates are
 * (lon, lat) in degrees, interleaved; longitudes in [-180, 180]. Immutable.
 */
public final class FootprintSamples {

    private final double[] lonLatDeg;
    private final double[] weights;
    private final int interiorCount;
    private final int extremeCount;
    /** These samples without repeated boundary points, made on first use ({@link #withoutRepeats()}). */
    private volatile FootprintSamples withoutRepeats;

    /**
     * Samples as {@link FootprintAnalysis} makes them, or as a cache stored them ({@link #lonLatDeg()},
     * {@link #weights()}, {@link #interiorCount()}, {@link #extremeCount()}): the arrays are copied.
     */
    public FootprintSamples(double[] lonLatDeg, double[] weights, int interiorCount, int extremeCount) {
        this.lonLatDeg = lonLatDeg.clone();
        this.weights = weights.clone();
        this.interiorCount = interiorCount;
        this.extremeCount = extremeCount;
    }

    /** Number of points, interior and boundary. */
    public int count() {
        return weights.length;
    }

    /** Number of interior (weighted) points; they come first. */
    public int interiorCount() {
        return interiorCount;
    }

    /** Number of extreme boundary points (north-, south-, east-, westernmost); they follow the interior points. */
    public int extremeCount() {
        return extremeCount;
    }

    /** A copy of the weights, in steradians of the unit sphere (0 for boundary points). */
    public double[] weights() {
        return weights.clone();
    }

    /** A copy of the interleaved (lon, lat) coordinates in degrees. */
    public double[] lonLatDeg() {
        return lonLatDeg.clone();
    }

    double lonDeg(int i) {
        return lonLatDeg[2 * i];
    }

    double latDeg(int i) {
        return lonLatDeg[2 * i + 1];
    }

    double weight(int i) {
        return weights[i];
    }

    /**
     * The same samples without the boundary points that repeat an earlier boundary point (a vertex shared by
     * neighbouring regions, a ring's closing point; {@link DistinctPoints}), in their order; the interior
     * points are all kept. Over these, the largest omega, the first sample that reaches it and the weighted
     * mean are those over all samples, for about half the work on a coverage. Made once per instance.
     */
    FootprintSamples withoutRepeats() {
        FootprintSamples made = withoutRepeats;
        if (made == null) {
            double[] xy = lonLatDeg.clone();
            int kept = DistinctPoints.keepFirst(xy, interiorCount, count() - interiorCount);
            int n = interiorCount + kept;
            made = n == count() ? this
                    : new FootprintSamples(Arrays.copyOf(xy, 2 * n), Arrays.copyOf(weights, n), interiorCount,
                            distinctExtremes());
            withoutRepeats = made;
        }
        return made;
    }

    private int distinctExtremes() {
        double[] extremes = Arrays.copyOfRange(lonLatDeg, 2 * interiorCount, 2 * (interiorCount + extremeCount));
        return DistinctPoints.keepFirst(extremes, 0, extremeCount);
    }

    /**
     * One point per latitude band: the samples' latitude range cut into {@code bands} equal bands, each band
     * represented by a point at the band's centre latitude weighted by the band's total interior weight, plus
     * the southernmost and northernmost sample latitudes (weight 0). Longitudes are set to the first sample's.
     * Only for projections whose distortion depends on latitude alone (normal conic and cylindrical aspects).
     */
    FootprintSamples byLatitude(int bands) {
        double south = Double.POSITIVE_INFINITY;
        double north = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < count(); i++) {
            south = Math.min(south, latDeg(i));
            north = Math.max(north, latDeg(i));
        }
        double height = Math.max(north - south, 1e-9) / bands;
        double[] bandWeight = new double[bands];
        boolean[] present = new boolean[bands];
        for (int i = 0; i < count(); i++) {
            int b = Math.min(bands - 1, (int) ((latDeg(i) - south) / height));
            present[b] = true;
            if (i < interiorCount) {
                bandWeight[b] += weight(i);
            }
        }
        double lon = count() > 0 ? lonDeg(0) : 0.0;
        double[] xy = new double[2 * (bands + 2)];
        double[] w = new double[bands + 2];
        int n = 0;
        for (int b = 0; b < bands; b++) {
            if (present[b] && bandWeight[b] > 0) {
                xy[2 * n] = lon;
                xy[2 * n + 1] = south + (b + 0.5) * height;
                w[n++] = bandWeight[b];
            }
        }
        int interior = n;
        for (double lat : new double[] {south, north}) {
            xy[2 * n] = lon;
            xy[2 * n + 1] = lat;
            n++;
        }
        return new FootprintSamples(Arrays.copyOf(xy, 2 * n), Arrays.copyOf(w, n), interior, 2);
    }

    /**
     * At most about {@code limit} points for a fast search: an even stride through the interior points (their
     * weights scaled up to keep the total), and every boundary point among the extremes plus an even
     * stride through the rest.
     */
    FootprintSamples thinned(int limit) {
        int boundaryCount = count() - interiorCount;
        if (count() <= limit) {
            return this;
        }
        int interiorKeep = Math.max(1, Math.min(interiorCount, limit / 2));
        int boundaryKeep = Math.max(1, Math.min(boundaryCount, limit - interiorKeep));
        double[] xy = new double[2 * (interiorKeep + boundaryKeep)];
        double[] w = new double[interiorKeep + boundaryKeep];
        int n = 0;
        double totalWeight = 0;
        double keptWeight = 0;
        for (int i = 0; i < interiorCount; i++) {
            totalWeight += weights[i];
        }
        for (int k = 0; k < interiorKeep && interiorCount > 0; k++) {
            int i = (int) ((long) k * interiorCount / interiorKeep);
            xy[2 * n] = lonLatDeg[2 * i];
            xy[2 * n + 1] = lonLatDeg[2 * i + 1];
            w[n] = weights[i];
            keptWeight += weights[i];
            n++;
        }
        double scale = keptWeight > 0 ? totalWeight / keptWeight : 1.0;
        for (int k = 0; k < n; k++) {
            w[k] *= scale;
        }
        int interiorKept = n;
        int extremes = Math.min(extremeCount, boundaryKeep);
        int rest = boundaryCount - extremeCount;
        for (int k = 0; k < boundaryKeep; k++) {
            int i = k < extremes ? interiorCount + k
                    : interiorCount + extremeCount + (int) ((long) (k - extremes) * rest / (boundaryKeep - extremes));
            xy[2 * n] = lonLatDeg[2 * i];
            xy[2 * n + 1] = lonLatDeg[2 * i + 1];
            n++;
        }
        return new FootprintSamples(Arrays.copyOf(xy, 2 * n), Arrays.copyOf(w, n), interiorKept, extremes);
    }
}
