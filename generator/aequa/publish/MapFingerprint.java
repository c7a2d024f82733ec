package aequa.publish;

import org.locationtech.jts.io.WKBWriter;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.projection.EqualAreaProjection;

/**
 * The SHA-256 of everything in a {@link MapModel} that can change its pictures or pages, so an unchanged
 * map is recognised without drawing it. Geometry enters as WKB (ISO 13249-3 / OGC Simple Features well-known
 * binary), exact to the bit; values through the records' {@code toString}, which prints doubles exactly
 * ({@link Double#toString(double)} round-trips).
 */
final class MapFingerprint {

    private MapFingerprint() {
    }

    static String of(MapModel map) {
        Sha256 sha = new Sha256();
        sha.add(map.spec().toString());
        sha.add(map.periods().toString());
        EqualAreaProjection projection = map.projection().projection();
        sha.add(projection.family().configName()).add(projection.parameters().toString()).add(projection.wkt2());
        sha.add(Double.toString(map.projection().omegaMaxDeg())).add(Double.toString(map.projection().omegaMeanDeg()));
        sha.add(map.projection().runnersUp().toString()).add(map.projection().reason());
        sha.add(map.classification().toString()).add(map.ramp().toString()).add(map.areaAudit().toString());
        sha.add(map.notices().toString());
        WKBWriter wkb = new WKBWriter(2);
        for (MapRegion region : map.regions()) {
            sha.add(region.key()).add(region.name());
            sha.add(Double.toString(region.geodesicAreaKm2())).add(Double.toString(region.mapAreaRatio()));
            sha.add(region.values().toString());
            sha.add(wkb.write(region.planarM()));
        }
        return sha.hex();
    }
}
