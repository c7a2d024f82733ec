package aequa.atlas;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.util.AffineTransformation;

import aequa.classes.Classification;
import aequa.colour.ColourRamp;
import aequa.planar.AreaAudit;
import aequa.project.MapSpec;
import aequa.projection.ProjectionChoice;

/**
 * Everything needed to draw and describe one map; immutable.
 *
 * @param spec           the map as the project file describes it (title, unit, notes, source, date, display)
 * @param periods        the periods shown, oldest first; more than one makes small multiples with shared classes
 * @param projection     the chosen projection and the evidence for it
 * @param regions        the regions, sorted by key
 * @param classification classes shared by all periods (computed from the pooled values)
 * @param ramp           the class fills
 * @param areaAudit      the area proof
 * @param notices        what the checks found about this map (figures matching no region, dropped islands):
 *                       for the author and the method page, never printed in the graphic
 * @param parts          the parts of a composite map, main part first; empty for a map on one projection (then
 *                       {@code projection} is the map's; for a composite map it is the main part's)
 * @param outlinesM      the outlines of the groups the map's {@code outlines} setting names (lines on the map's
 *                       plane, metres, drawn over the fills); empty when the map has none
 */
public record MapModel(MapSpec spec, List<String> periods, ProjectionChoice projection, List<MapRegion> regions,
                       Classification classification, ColourRamp ramp, AreaAudit areaAudit, List<String> notices,
                       List<MapPart> parts, Geometry outlinesM) {

    public MapModel {
        java.util.Objects.requireNonNull(outlinesM, "outlinesM");
        periods = List.copyOf(periods);
        regions = List.copyOf(regions);
        notices = List.copyOf(notices);
        parts = List.copyOf(parts);
    }

    /** A map without group outlines. */
    public MapModel(MapSpec spec, List<String> periods, ProjectionChoice projection, List<MapRegion> regions,
                    Classification classification, ColourRamp ramp, AreaAudit areaAudit, List<String> notices,
                    List<MapPart> parts) {
        this(spec, periods, projection, regions, classification, ramp, areaAudit, notices, parts, NO_OUTLINES);
    }

    /** The empty outline layer. */
    public static final Geometry NO_OUTLINES = new org.locationtech.jts.geom.GeometryFactory().createMultiLineString();

    /** A map on one projection. */
    public MapModel(MapSpec spec, List<String> periods, ProjectionChoice projection, List<MapRegion> regions,
                    Classification classification, ColourRamp ramp, AreaAudit areaAudit, List<String> notices) {
        this(spec, periods, projection, regions, classification, ramp, areaAudit, notices, List.of());
    }

    /** This map with its own words (title, unit, notes, source, date) in the language {@code tag}. */
    public MapModel inLanguage(String tag) {
        MapSpec translated = spec.inLanguage(tag);
        return translated == spec ? this
                : new MapModel(translated, periods, projection, regions, classification, ramp, areaAudit, notices, parts, outlinesM);
    }

    /**
     * This map as print draws it: a composite map's framed parts moved to their print places (a narrow print
     * sets the frames' names larger against the map, so its frames are laid out for it), with their print frames.
     * A translation, so every drawn area stays as audited. The map itself when print moves nothing.
     */
    public MapModel forPrint() {
        if (parts.stream().allMatch(p -> !p.movedInPrint() && p.frame().equals(p.print().frame()))) {
            return this;
        }
        Map<String, MapPart> movedByKey = new HashMap<>();
        parts.stream().filter(MapPart::movedInPrint).forEach(p -> p.keys().forEach(k -> movedByKey.put(k, p)));
        List<MapRegion> moved = regions.stream().map(r -> {
            MapPart part = movedByKey.get(r.key());
            return part == null ? r : new MapRegion(r.key(), r.name(), r.geodesicAreaKm2(), r.mapAreaRatio(),
                    moved(r.planarM(), part), r.values());
        }).toList();
        // a group outline lies in one part: in the frame of a framed part that print moves, or else where it is
        List<Geometry> outlines = new ArrayList<>();
        for (int i = 0; i < outlinesM.getNumGeometries(); i++) {
            Geometry line = outlinesM.getGeometryN(i);
            Coordinate c = line.getEnvelopeInternal().centre();
            MapPart part = c == null ? null : parts.stream()
                    .filter(p -> p.movedInPrint() && p.frame().contains(c.x, c.y)).findFirst().orElse(null);
            outlines.add(part == null ? line : moved(line, part));
        }
        Geometry movedOutlines = outlines.isEmpty() ? outlinesM : outlinesM.getFactory().buildGeometry(outlines);
        return new MapModel(spec, periods, projection, moved, classification, ramp, areaAudit, notices,
                parts.stream().map(MapPart::inPrint).toList(), movedOutlines);
    }

    private static Geometry moved(Geometry g, MapPart part) {
        return AffineTransformation.translationInstance(part.print().dxM(), part.print().dyM()).transform(g);
    }

    /** Whether the map is drawn in parts, each on its own projection. */
    public boolean composite() {
        return !parts.isEmpty();
    }

    /** Whether some part is drawn at another area scale than the main part (then areas compare only within a part). */
    public boolean mixedAreaScales() {
        return parts.stream().anyMatch(p -> p.areaScale() != 1);
    }

    public String id() {
        return spec.id();
    }
}
