package aequa.inputs.regions;

import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.geom.impl.PackedCoordinateSequenceFactory;

/**
 * The geometry factory every reader builds regions with: floating precision, SRID 4326 (WGS 84 lon/lat),
 * and packed double coordinates (16 bytes per 2-D vertex instead of a 40-byte object each), which keeps
 * the heap needed for a large boundary file close to the file's size.
 */
public final class RegionGeometries {

    /** Immutable and thread-safe, as all JTS geometry factories are. */
    public static final GeometryFactory FACTORY =
            new GeometryFactory(new PrecisionModel(), 4326, PackedCoordinateSequenceFactory.DOUBLE_FACTORY);

    private RegionGeometries() {
    }

    /** An empty polygon, standing for a feature whose geometry is null or was discarded. */
    public static Polygon empty() {
        return FACTORY.createPolygon();
    }
}
