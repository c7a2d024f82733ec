package aequa.planar;

import java.util.List;

import org.locationtech.jts.geom.Geometry;

/**
 * Builds a map's {@link AreaAudit}: the largest |planar / geodesic - 1| over its regions. A region whose
 * ratio is NaN (no geodesic area, or NaN coordinates) counts as an infinite error, so a broken region can
 * never pass the audit silently.
 */
public final class AreaAuditor {

    private static final double M2_PER_KM2 = 1e6;

    private AreaAuditor() {
    }

    /** The check for one region; {@code planarM} is the projected geometry before simplification. */
    public static RegionAreaCheck check(String key, double geodesicAreaKm2, Geometry planarM) {
        return new RegionAreaCheck(key, geodesicAreaKm2, planarM.getArea() / M2_PER_KM2);
    }

    /**
     * @param checks    the map's regions, in a stable order (ties keep the first)
     * @param tolerance the largest relative error the project allows (ChecksSpec.areaTolerance)
     */
    public static AreaAudit audit(List<RegionAreaCheck> checks, double tolerance) {
        return audit(checks, tolerance, List.of(), List.of());
    }

    /**
     * As {@link #audit(List, double)}, with the regions the projection could not draw whole
     * ({@link ProjectionDomain}), which fail the audit whatever the tolerance.
     */
    public static AreaAudit audit(List<RegionAreaCheck> checks, double tolerance, List<String> clippedKeys,
                                  List<String> aroundPoleKeys) {
        double worst = 0;
        String worstKey = "";
        for (RegionAreaCheck check : checks) {
            double ratio = check.mapAreaRatio();
            double error = Double.isNaN(ratio) ? Double.POSITIVE_INFINITY : Math.abs(ratio - 1);
            if (error > worst) {
                worst = error;
                worstKey = check.key();
            }
        }
        return new AreaAudit(worst, worstKey, tolerance, clippedKeys, aroundPoleKeys);
    }
}
