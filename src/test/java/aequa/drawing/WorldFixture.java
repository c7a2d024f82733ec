package aequa.drawing;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Polygon;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.project.ClassMethod;
import aequa.classes.Classification;
import aequa.projection.EqualAreaProjection;
import aequa.projection.ProjectionFamily;
import aequa.projection.Projections;
import aequa.statistics.FigureStatus;

/**
 * A world map for the globe outline and graticule: a test-only spherical Lambert cylindrical equal-area
 * projection (Snyder 1987, USGS PP 1395, eqs. 10-1 and 10-2 with k0 = 1: x = R (lon - lon0), y = R sin(lat)),
 * which is equal-area on the sphere, and a few invented lon/lat "continents".
 */
final class WorldFixture {

    private WorldFixture() {
    }

    /** The world fixture's projection: Equal Earth on WGS 84, a world family (drawn with globe and graticule). */
    static EqualAreaProjection world() {
        return Projections.create(ProjectionFamily.EQUAL_EARTH, java.util.Map.of("centre-lon", 0.0));
    }

    static MapModel model() {
        EqualAreaProjection projection = world();
        double[][] boxes = {{-120, 20, -70, 60}, {-75, -50, -40, 10}, {-10, 35, 40, 65}, {-15, -30, 45, 30}, {60, 10, 140, 55}, {115, -40, 150, -15}};
        List<MapRegion> regions = new ArrayList<>();
        List<Double> limits = List.of(10.0, 20.0, 30.0, 40.0);
        int[] counts = new int[3];
        for (int b = 0; b < boxes.length; b++) {
            double[] box = boxes[b];
            List<Coordinate> ring = new ArrayList<>();
            double[] xy = new double[2];
            double[][] corners = {{box[0], box[1]}, {box[2], box[1]}, {box[2], box[3]}, {box[0], box[3]}, {box[0], box[1]}};
            for (int e = 0; e < 4; e++) {
                for (int s = 0; s < 20; s++) {
                    double t = s / 20.0;
                    double[] ll = {corners[e][0] + t * (corners[e + 1][0] - corners[e][0]), corners[e][1] + t * (corners[e + 1][1] - corners[e][1])};
                    projection.forward(ll, 0, xy, 0, 1);
                    ring.add(new Coordinate(xy[0], xy[1]));
                }
            }
            ring.add(new Coordinate(ring.get(0)));
            Polygon polygon = MapFixtures.FACTORY.createPolygon(ring.toArray(new Coordinate[0]));
            double value = 12 + 5 * b;
            int cls = Math.min(2, (int) ((value - 10) / 10));
            counts[cls]++;
            regions.add(new MapRegion("W" + b, "Land " + (char) ('A' + b), polygon.getArea() / 1e6, 1.0, polygon,
                    List.of(new RegionValue(FigureStatus.REPORTED, value, value, Double.NaN, false, cls))));
        }
        Classification classes = new Classification(ClassMethod.EQUAL_INTERVAL, limits, List.of(counts[0], counts[1], counts[2]));
        return MapFixtures.model("choropleth", List.of("2024"), regions, classes, MapFixtures.ramp(3), projection);
    }
}
