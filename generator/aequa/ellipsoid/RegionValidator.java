package aequa.ellipsoid;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.stream.IntStream;

import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.GeometryFixer;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;

/**
 * Checks regions as read and brings them into RFC 7946 form (section 3.1.6 orientation, section 3.1.9
 * antimeridian cutting), reporting every problem with the region's key. In order, per region:
 * <ol>
 * <li>a key already seen: error {@code region-key-duplicate}; the later region is left out;</li>
 * <li>no geometry (null or empty): warning {@code geometry-missing}; left out;</li>
 * <li>a coordinate outside [-180, 180] x [-90, 90] or not finite: error {@code coordinates-out-of-range};
 *     left out (a projected file read as lon/lat looks like this);</li>
 * <li>rings that jump across +-180 or encircle a pole: cut at the antimeridian and closed along the pole
 *     (the enclosed pole is the one nearer the ring, as the input's orientation cannot be trusted yet),
 *     note {@code antimeridian-cut} or {@code pole-ring-closed};</li>
 * <li>polygons or holes whose ring has fewer than three distinct positions (no area): left out, note
 *     {@code part-degenerate};</li>
 * <li>invalid polygons (self-intersections, bow-ties, spikes, holes outside shells): repaired with JTS
 *     GeometryFixer, which keeps every lobe (unlike buffer(0)), warning {@code geometry-repaired}; parts
 *     that collapse to nothing are dropped, and a region left with nothing is left out;</li>
 * <li>exterior rings clockwise or holes counter-clockwise: reversed, note {@code winding-normalised}.</li>
 * </ol>
 * Gaps and overlaps between neighbours are checked separately by {@link CoverageChecks}: reported, not changed.
 */
public final class RegionValidator {

    private static final AntimeridianCutter.Options GEOGRAPHIC = new AntimeridianCutter.Options(
            -90, 90, 0, Double.POSITIVE_INFINITY, AntimeridianCutter.PoleRule.NEARER_POLE);

    private RegionValidator() {
    }

    /**
     * @param file the source file as the user named it, for findings
     * @return the usable regions in input order, each a valid Polygon or MultiPolygon in RFC 7946 form
     */
    public static List<Region> validate(List<Region> regions, String file, Findings findings) {
        // duplicates depend on order, so they are found first; the regions are then checked in parallel
        // (each one alone) and their findings merged in input order, the same whatever the parallelism
        Set<String> keys = new HashSet<>();
        boolean[] duplicate = new boolean[regions.size()];
        for (int i = 0; i < regions.size(); i++) {
            duplicate[i] = !keys.add(regions.get(i).key());
        }
        List<Checked> checked = IntStream.range(0, regions.size()).parallel()
                .mapToObj(i -> check(regions.get(i), duplicate[i], file)).toList();
        List<Region> usable = new ArrayList<>(regions.size());
        for (Checked c : checked) {
            findings.addAll(c.findings());
            c.usable().ifPresent(usable::add);
        }
        return usable;
    }

    /** One region's outcome: the region in RFC 7946 form, or nothing, and what was found. */
    private record Checked(Optional<Region> usable, Findings findings) {
    }

    private static Checked check(Region region, boolean duplicate, String file) {
        Findings findings = new Findings();
        String place = "feature \"" + region.key() + "\"";
        if (duplicate) {
            findings.add(Finding.error("region-key-duplicate", file, place,
                    "Another feature has the same key; only the first one is used.",
                    "Give every region its own key, or merge the duplicates into one MultiPolygon."));
            return new Checked(Optional.empty(), findings);
        }
        Geometry geometry = region.lonLat();
        if (geometry.isEmpty()) {
            findings.add(Finding.warning("geometry-missing", file, place,
                    "The feature has no geometry (null or empty), so it cannot be drawn and was left out.",
                    "Add the region's outline, or remove the feature."));
            return new Checked(Optional.empty(), findings);
        }
        Coordinate outside = firstOutOfRange(geometry);
        if (outside != null) {
            findings.add(Finding.error("coordinates-out-of-range", file, place,
                    String.format(Locale.ROOT, "It has the position (%s, %s), outside longitude -180..180 and latitude -90..90.",
                            outside.x, outside.y),
                    "The file may be in a projected coordinate system; GeoJSON must be WGS 84 longitude/latitude (RFC 7946, section 4)."));
            return new Checked(Optional.empty(), findings);
        }
        Geometry repaired = repair(geometry, file, place, findings);
        return new Checked(repaired.isEmpty() ? Optional.empty()
                : Optional.of(region.withLonLat(repaired)), findings);
    }

    private static Geometry repair(Geometry geometry, String file, String place, Findings findings) {
        GeometryFactory factory = geometry.getFactory();
        List<Polygon> parts = new ArrayList<>();
        boolean cut = false;
        boolean poleClosed = false;
        int collapsed = 0;
        for (int i = 0; i < geometry.getNumGeometries(); i++) {
            Polygon part = (Polygon) geometry.getGeometryN(i);
            if (part.isEmpty()) {
                continue;
            }
            if (distinctPoints(part.getExteriorRing().getCoordinates()) < 3) {
                collapsed++;
                continue;
            }
            int holes = part.getNumInteriorRing();
            part = withoutCollapsedHoles(part);
            collapsed += holes - part.getNumInteriorRing();
            boolean aroundPole = encirclesPole(part.getExteriorRing().getCoordinates());
            if (aroundPole || anyRingJumps(part)) {
                cut = true;
                poleClosed |= aroundPole;
                parts.addAll(AntimeridianCutter.cut(part, GEOGRAPHIC, factory));
            } else {
                parts.add(part);
            }
        }
        if (cut) {
            findings.add(poleClosed
                    ? Finding.note("pole-ring-closed", file, place,
                            "A ring goes all the way round a pole; aequa closed it along the pole it encloses and cut it at the antimeridian.",
                            "Write polar regions cut at +-180 with an edge along the pole (RFC 7946, section 3.1.9).")
                    : Finding.note("antimeridian-cut", file, place,
                            "Rings jump across the antimeridian (+-180 deg); aequa cut them there.",
                            "Write regions that cross +-180 as a MultiPolygon cut at the antimeridian (RFC 7946, section 3.1.9)."));
        }
        if (collapsed > 0) {
            findings.add(Finding.note("part-degenerate", file, place,
                    collapsed == 1 ? "1 of its rings encloses no area (fewer than three distinct positions); aequa left it out."
                            : collapsed + " of its rings enclose no area (fewer than three distinct positions); aequa left them out.",
                    "Remove such slivers from the source."));
        }
        if (parts.isEmpty()) {
            return factory.createPolygon();
        }
        Geometry result = factory.buildGeometry(parts);
        IsValidOp validity = new IsValidOp(result);
        if (!validity.isValid()) {
            TopologyValidationError error = validity.getValidationError();
            result = GeometryFixer.fix(result);
            String consequence = result.isEmpty() ? " Nothing usable was left, so it was left out." : "";
            findings.add(Finding.warning("geometry-repaired", file, place,
                    String.format(Locale.ROOT, "Its outline is not a valid polygon (%s near %.6f, %.6f); aequa repaired it.%s",
                            error.getMessage().toLowerCase(Locale.ROOT), error.getCoordinate().x, error.getCoordinate().y, consequence),
                    "Check the outline near that point; a ring must not cross itself (OGC 06-103r4, section 6.1.11)."));
        } else if (!cut && wronglyWound(result)) {
            findings.add(Finding.note("winding-normalised", file, place,
                    "Its exterior rings run clockwise or its holes counter-clockwise; aequa reversed them.",
                    "RFC 7946, section 3.1.6: exterior rings counter-clockwise, holes clockwise."));
        }
        return oriented(result);
    }

    /** Whether an edge of any of the polygon's rings jumps more than 180 deg of longitude. */
    private static boolean anyRingJumps(Polygon polygon) {
        for (int r = -1; r < polygon.getNumInteriorRing(); r++) {
            if (GeodesicArea.jumpsAcrossAntimeridian((r < 0 ? polygon.getExteriorRing() : polygon.getInteriorRingN(r)).getCoordinateSequence())) {
                return true;
            }
        }
        return false;
    }

    /**
     * True when the ring's longitude, followed the short way round at every step, turns by a full circle. A
     * ring through a pole (written with an edge along it, as RFC 7946 has polar regions) does not count.
     */
    static boolean encirclesPole(Coordinate[] ring) {
        double turned = 0;
        for (int i = 0; i + 1 < ring.length; i++) {
            if (Math.abs(ring[i].y) >= 90 - AntimeridianCutter.SNAP_DEG) {
                return false;
            }
            double step = ring[i + 1].x - ring[i].x;
            if (Math.abs(ring[i + 1].x) == 180 && Math.abs(ring[i].x) == 180) {
                continue; // along the cut itself, or +180 to -180: no turn
            }
            turned += UnwrappedRing.shortWay(step);
        }
        return Math.abs(turned) > 180;
    }

    private static Polygon withoutCollapsedHoles(Polygon polygon) {
        List<LinearRing> holes = new ArrayList<>();
        for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
            if (distinctPoints(polygon.getInteriorRingN(h).getCoordinates()) >= 3) {
                holes.add(polygon.getInteriorRingN(h));
            }
        }
        if (holes.size() == polygon.getNumInteriorRing()) {
            return polygon;
        }
        return polygon.getFactory().createPolygon(polygon.getExteriorRing(), holes.toArray(new LinearRing[0]));
    }

    private static int distinctPoints(Coordinate[] ring) {
        return (int) java.util.Arrays.stream(ring).map(c -> new Coordinate(c.x, c.y)).distinct().limit(3).count();
    }

    private static Coordinate firstOutOfRange(Geometry geometry) {
        for (Coordinate c : geometry.getCoordinates()) {
            if (!(c.x >= -180 && c.x <= 180 && c.y >= -90 && c.y <= 90)) {
                return c;
            }
        }
        return null;
    }

    private static boolean wronglyWound(Geometry polygons) {
        for (int i = 0; i < polygons.getNumGeometries(); i++) {
            Polygon p = (Polygon) polygons.getGeometryN(i);
            if (!Orientation.isCCW(p.getExteriorRing().getCoordinateSequence())) {
                return true;
            }
            for (int h = 0; h < p.getNumInteriorRing(); h++) {
                if (Orientation.isCCW(p.getInteriorRingN(h).getCoordinateSequence())) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Exterior rings counter-clockwise, holes clockwise (RFC 7946, section 3.1.6); Polygon or MultiPolygon. */
    static Geometry oriented(Geometry polygons) {
        GeometryFactory factory = polygons.getFactory();
        List<Polygon> parts = new ArrayList<>();
        for (int i = 0; i < polygons.getNumGeometries(); i++) {
            Geometry g = polygons.getGeometryN(i);
            if (!(g instanceof Polygon) || g.isEmpty()) {
                continue;
            }
            Polygon p = (Polygon) g;
            LinearRing shell = wound(p.getExteriorRing(), true);
            LinearRing[] holes = new LinearRing[p.getNumInteriorRing()];
            for (int h = 0; h < holes.length; h++) {
                holes[h] = wound(p.getInteriorRingN(h), false);
            }
            parts.add(factory.createPolygon(shell, holes));
        }
        if (parts.isEmpty()) {
            return factory.createPolygon();
        }
        return parts.size() == 1 ? parts.get(0) : factory.createMultiPolygon(parts.toArray(new Polygon[0]));
    }

    private static LinearRing wound(LinearRing ring, boolean counterClockwise) {
        return Orientation.isCCW(ring.getCoordinateSequence()) == counterClockwise ? ring : ring.reverse();
    }
}
