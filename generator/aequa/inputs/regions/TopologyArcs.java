package aequa.inputs.regions;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * The arcs of a TopoJSON topology (TopoJSON Format Specification 1.0, section 2.2.1 "Transforms" and 2.3
 * "Arcs"), decoded into absolute positions, and the rings built from them (section 2.2.4: "arc indexes"). In a
 * quantised topology each arc's first position is relative to the origin and each later one to the position
 * before it (delta encoding), and a position is {@code x * scale + translate}; the arithmetic is done in the same
 * order as the reference decoder (npm topojson-client 3.1.0, {@code transform.js}), so both give the same doubles.
 */
final class TopologyArcs {

    /** One decoded arc: {@code x0, y0, x1, y1, ...}. */
    private final double[][] arcs;
    /** Per arc: how often the region being read walks it forward minus backward. */
    private final int[] netInRegion;
    private final List<Integer> touchedInRegion = new ArrayList<>();
    /** Per arc: how many regions walk it (net) forward, and backward; an arc walked twice net by one region counts 2. */
    private final int[] forwardRegions;
    private final int[] reverseRegions;

    private TopologyArcs(double[][] arcs) {
        this.arcs = arcs;
        this.netInRegion = new int[arcs.length];
        this.forwardRegions = new int[arcs.length];
        this.reverseRegions = new int[arcs.length];
    }

    /**
     * @param arcsNode      the topology's {@code arcs} array
     * @param transformNode the topology's {@code transform}, or a missing node for an unquantised topology
     * @return the decoded arcs, or empty when an arc is not an array of number pairs
     */
    static Optional<TopologyArcs> decode(JsonNode arcsNode, JsonNode transformNode) {
        boolean quantised = transformNode != null && transformNode.isObject();
        double kx = 1;
        double ky = 1;
        double dx = 0;
        double dy = 0;
        if (quantised) {
            kx = transformNode.path("scale").path(0).asDouble(Double.NaN);
            ky = transformNode.path("scale").path(1).asDouble(Double.NaN);
            dx = transformNode.path("translate").path(0).asDouble(Double.NaN);
            dy = transformNode.path("translate").path(1).asDouble(Double.NaN);
        }
        if (!arcsNode.isArray() || Double.isNaN(kx + ky + dx + dy)) {
            return Optional.empty();
        }
        double[][] arcs = new double[arcsNode.size()][];
        for (int a = 0; a < arcs.length; a++) {
            JsonNode arc = arcsNode.get(a);
            if (!arc.isArray()) {
                return Optional.empty();
            }
            double[] xy = new double[2 * arc.size()];
            double x0 = 0;
            double y0 = 0;
            for (int p = 0; p < arc.size(); p++) {
                JsonNode position = arc.get(p);
                if (!position.path(0).isNumber() || !position.path(1).isNumber()) {
                    return Optional.empty();
                }
                if (quantised) {
                    x0 += position.get(0).asDouble();
                    y0 += position.get(1).asDouble();
                    xy[2 * p] = x0 * kx + dx;
                    xy[2 * p + 1] = y0 * ky + dy;
                } else {
                    xy[2 * p] = position.get(0).asDouble();
                    xy[2 * p + 1] = position.get(1).asDouble();
                }
            }
            arcs[a] = xy;
        }
        return Optional.of(new TopologyArcs(arcs));
    }

    /**
     * Joins the arcs of one ring (section 2.2.4: a negative index {@code ~i} is arc {@code i} reversed; each arc
     * after the first starts where the one before ended, so that shared position is kept once, from the later
     * arc, as the reference decoder keeps it).
     *
     * @return the ring, or empty when an index names no arc
     */
    Optional<DoubleList> ring(JsonNode indexes) {
        DoubleList ring = new DoubleList(16);
        for (int k = 0; k < indexes.size(); k++) {
            JsonNode index = indexes.get(k);
            if (!index.canConvertToInt()) {
                return Optional.empty();
            }
            int i = index.asInt();
            boolean reversed = i < 0;
            int arc = reversed ? ~i : i;
            if (arc >= arcs.length) {
                return Optional.empty();
            }
            if (netInRegion[arc] == 0) {
                touchedInRegion.add(arc);
            }
            netInRegion[arc] += reversed ? -1 : 1;
            double[] xy = arcs[arc];
            int n = xy.length / 2;
            ring.removeLastPosition();
            for (int p = 0; p < n; p++) {
                int at = reversed ? n - 1 - p : p;
                ring.add(xy[2 * at]);
                ring.add(xy[2 * at + 1]);
            }
        }
        // a ring of one two-position arc: repeat the first position up to the four a ring needs, as the
        // reference decoder does (topojson-client 3.1.0, feature.js, ring()); the validator judges its area
        while (ring.size() > 0 && ring.size() < 8) {
            ring.add(ring.get(0));
            ring.add(ring.get(1));
        }
        return Optional.of(ring);
    }

    /** Ends the rings of one region: its net use of each arc is counted for {@link #usedAsCleanBorders()}. */
    void finishRegion() {
        for (int arc : touchedInRegion) {
            int net = netInRegion[arc];
            if (net > 0) {
                forwardRegions[arc] += net;
            } else if (net < 0) {
                reverseRegions[arc] -= net;
            }
            netInRegion[arc] = 0;
        }
        touchedInRegion.clear();
    }

    /**
     * Whether the regions finished so far share borders cleanly: every arc of non-zero length has at most one
     * region on each side, that is, walked (net) forward by at most one region and backward by at most one. A
     * region that walks an arc out and back (a spike of no area) does not count for that arc. Then a border is
     * one arc walked once by each neighbour, and no two regions can overlap along it.
     */
    boolean usedAsCleanBorders() {
        for (int a = 0; a < arcs.length; a++) {
            if ((forwardRegions[a] > 1 || reverseRegions[a] > 1) && !zeroLength(arcs[a])) {
                return false;
            }
        }
        return true;
    }

    private static boolean zeroLength(double[] xy) {
        for (int i = 2; i < xy.length; i++) {
            if (xy[i] != xy[i % 2]) {
                return false;
            }
        }
        return true;
    }
}
