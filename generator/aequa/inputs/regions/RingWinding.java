package aequa.inputs.regions;

/**
 * Winds a lon/lat ring as RFC 7946 (section 3.1.6) wants it, exterior rings counter-clockwise and holes clockwise,
 * for sources whose format prescribes no winding. The planar orientation in lon/lat is only meaningful for a
 * ring that does not jump across the antimeridian (no step longer than 180 degrees of longitude); such rings,
 * which may also enclose a pole, are returned unchanged for the validator, which judges them on the sphere.
 */
final class RingWinding {

    private RingWinding() {
    }

    /** @param counterClockwise true for an exterior ring, false for a hole */
    static DoubleList wound(DoubleList ring, boolean counterClockwise) {
        for (int i = 2; i + 1 < ring.size(); i += 2) {
            if (Math.abs(ring.get(i) - ring.get(i - 2)) > 180) {
                return ring;
            }
        }
        double signedArea = ShapeRings.signedArea(ring);
        if (signedArea == 0 || signedArea > 0 == counterClockwise) {
            return ring;
        }
        return ShapeRings.reversed(ring);
    }
}
