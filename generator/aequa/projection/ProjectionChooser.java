package aequa.projection;

import java.util.List;

/** Chooses the equal-area projection for a footprint. */
public final class ProjectionChooser {

    private ProjectionChooser() {
    }

    public static ProjectionChoice choose(Footprint footprint, ProjectionRequest request) {
        EqualAreaProjection laea = Projections.lambertAzimuthal(footprint.centreLonDeg(), footprint.centreLatDeg());
        return new ProjectionChoice(laea, Double.NaN, Double.NaN, footprint.centreLonDeg(), footprint.centreLatDeg(),
                List.of(), "Lambert azimuthal equal-area centred on the data.");
    }
}
