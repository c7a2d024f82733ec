package aequa.composite;

import java.util.List;

import aequa.projection.Footprint;
import aequa.projection.ProjectionChoice;

/**
 * One part of a map: the main part, or a detached part drawn in its own frame.
 *
 * @param id        {@code main}, or {@code part-1}, {@code part-2}, ... in the order the parts are listed
 * @param name      the name on the part's frame
 * @param keys      its regions' keys, in source order
 * @param main      whether this is the main part (drawn without a frame, setting the map's area scale)
 * @param areaScale the part's area scale relative to the main part's (1 keeps areas comparable)
 * @param corner    the corner the project file asks for ({@code top-left}, ...), or empty
 * @param areaKm2   the geodesic area of its regions
 * @param gapKm     its geodesic gap to the main part (0 for the main part, NaN for a listed part)
 * @param footprint where its regions lie
 * @param choice    its projection
 */
public record PartPlan(String id, String name, List<String> keys, boolean main, double areaScale, String corner,
                       double areaKm2, double gapKm, Footprint footprint, ProjectionChoice choice) {

    public PartPlan {
        keys = List.copyOf(keys);
    }
}
