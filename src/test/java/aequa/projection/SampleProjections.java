package aequa.projection;

import java.util.List;
import java.util.Map;

/** One projection of every family and aspect, for the property tests. */
final class SampleProjections {

    private SampleProjections() {
    }

    static List<EqualAreaProjection> everyFamilyAndAspect() {
        return List.of(
                Projections.create(ProjectionFamily.LAMBERT_AZIMUTHAL, Map.of("centre-lat", 90.0, "centre-lon", 0.0)),
                Projections.create(ProjectionFamily.LAMBERT_AZIMUTHAL, Map.of("centre-lat", -90.0, "centre-lon", 45.0)),
                Projections.create(ProjectionFamily.LAMBERT_AZIMUTHAL, Map.of("centre-lat", 0.0, "centre-lon", -60.0)),
                Projections.create(ProjectionFamily.LAMBERT_AZIMUTHAL, Map.of("centre-lat", 52.0, "centre-lon", 10.0)),
                Projections.create(ProjectionFamily.ALBERS_CONIC, Map.of("centre-lon", -96.0, "centre-lat", 23.0,
                        "standard-parallel-1", 29.5, "standard-parallel-2", 45.5)),
                Projections.create(ProjectionFamily.ALBERS_CONIC, Map.of("centre-lon", 132.0, "centre-lat", 0.0,
                        "standard-parallel-1", -18.0, "standard-parallel-2", -36.0)),
                Projections.create(ProjectionFamily.CYLINDRICAL, Map.of("centre-lon", 0.0, "standard-parallel-1", 0.0)),
                Projections.create(ProjectionFamily.CYLINDRICAL, Map.of("centre-lon", 150.0, "standard-parallel-1", 50.0)),
                Projections.create(ProjectionFamily.CYLINDRICAL_TRANSVERSE, Map.of("centre-lon", -70.0, "centre-lat", -30.0,
                        "standard-line-offset", 5.0)),
                Projections.create(ProjectionFamily.CYLINDRICAL_OBLIQUE, Map.of("centre-lon", 20.0, "centre-lat", 45.0,
                        "azimuth", 60.0, "standard-line-offset", 10.0)),
                Projections.create(ProjectionFamily.CYLINDRICAL_OBLIQUE, Map.of("centre-lon", -170.0, "centre-lat", -20.0,
                        "azimuth", -35.0, "standard-line-offset", 0.0)),
                Projections.create(ProjectionFamily.EQUAL_EARTH, Map.of("centre-lon", 0.0)),
                Projections.create(ProjectionFamily.EQUAL_EARTH, Map.of("centre-lon", 150.0)),
                Projections.create(ProjectionFamily.MOLLWEIDE, Map.of("centre-lon", 0.0)),
                Projections.create(ProjectionFamily.MOLLWEIDE, Map.of("centre-lon", -100.0)));
    }
}
