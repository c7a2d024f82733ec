package aequa.planar;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.TopologyException;
import org.locationtech.jts.operation.overlayng.CoverageUnion;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;

/**
 * Dissolves groups of projected regions into their outlines, for an outline layer drawn over the fills (the
 * states over a county map). Each group's regions are unioned (JTS {@link CoverageUnion}, exact for regions
 * that share their borders vertex for vertex, as the coverage simplifier leaves them; JTS's robust overlay
 * union when they do not), and the outline is the union's boundary: borders inside a group disappear,
 * borders between groups and coasts remain. Groups are taken in the map's iteration order, so the result is
 * deterministic.
 */
public final class DissolvedOutlines {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private DissolvedOutlines() {
    }

    /** The outlines of every group, as one MultiLineString (empty when there are no regions). */
    public static Geometry of(Map<String, List<Geometry>> groups) {
        List<LineString> lines = new ArrayList<>();
        for (List<Geometry> members : groups.values()) {
            List<Geometry> drawn = members.stream().filter(g -> !g.isEmpty()).toList();
            if (drawn.isEmpty()) {
                continue;
            }
            Geometry union = union(drawn);
            Geometry boundary = union.getBoundary();
            for (int i = 0; i < boundary.getNumGeometries(); i++) {
                if (boundary.getGeometryN(i) instanceof LineString line && !line.isEmpty()) {
                    lines.add(line);
                }
            }
        }
        return GEOMETRY.createMultiLineString(lines.toArray(LineString[]::new));
    }

    /** The union of one group's regions. */
    static Geometry union(List<Geometry> regions) {
        Geometry collection = GEOMETRY.buildGeometry(regions);
        if (regions.size() == 1) {
            return regions.get(0);
        }
        try {
            Geometry union = CoverageUnion.union(collection);
            if (union.isValid()) {
                return union;
            }
        } catch (TopologyException | IllegalArgumentException e) {
            // not an exact coverage: the general union below handles overlaps and slivers
        }
        return OverlayNGRobust.union(regions);
    }
}
