package aequa.publish;

import java.io.BufferedOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.security.DigestOutputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

import org.locationtech.jts.io.WKBWriter;

import aequa.atlas.MapModel;
import aequa.atlas.MapPart;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.projection.EqualAreaProjection;

/**
 * The SHA-256 of everything in a {@link MapModel} that can change its pictures or pages, so an unchanged
 * map is recognised without drawing it. Doubles enter as their exact bits, geometry as WKB (OGC Simple
 * Features well-known binary, exact to the bit), text as length-prefixed UTF-8; all through one buffered
 * stream, because a map of thousands of regions must hash in milliseconds for the no-change rebuild to stay
 * cheap. Small nested records (spec, classification, ramp, audit, parts) enter as {@link CanonicalBytes},
 * never through {@code toString}.
 */
final class MapFingerprint {

    private MapFingerprint() {
    }

    static String of(MapModel map) {
        MessageDigest sha;
        try {
            sha = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("this Java has no SHA-256", e);
        }
        try (DataOutputStream out = new DataOutputStream(new BufferedOutputStream(
                new DigestOutputStream(OutputStream.nullOutputStream(), sha), 1 << 16))) {
            canonical(out, map.spec());
            canonical(out, map.periods());
            EqualAreaProjection projection = map.projection().projection();
            text(out, projection.family().configName());
            canonical(out, projection.parameters());
            text(out, projection.wkt2());
            out.writeDouble(map.projection().omegaMaxDeg());
            out.writeDouble(map.projection().omegaMeanDeg());
            canonical(out, map.projection().runnersUp());
            text(out, map.projection().reason());
            canonical(out, map.classification());
            canonical(out, map.ramp());
            canonical(out, map.areaAudit());
            canonical(out, map.notices());
            for (MapPart part : map.parts()) {
                canonical(out, java.util.Arrays.asList(part.id(), part.name(), part.keys(), part.areaScale(), part.frame(),
                        part.nameBandM(), part.nameLines(), part.scaleBandM(), part.print(), part.areaAudit()));
                text(out, part.projection().projection().wkt2());
                out.writeDouble(part.projection().omegaMaxDeg());
                out.writeDouble(part.projection().omegaMeanDeg());
            }
            WKBWriter wkb = new WKBWriter(2);
            for (MapRegion region : map.regions()) {
                text(out, region.key());
                text(out, region.name());
                out.writeDouble(region.geodesicAreaKm2());
                out.writeDouble(region.mapAreaRatio());
                out.writeInt(region.values().size());
                for (RegionValue v : region.values()) {
                    out.writeInt(v.status().ordinal());
                    out.writeDouble(v.value());
                    out.writeDouble(v.normalisedValue());
                    out.writeDouble(v.marginOfError());
                    out.writeBoolean(v.unreliable());
                    out.writeInt(v.classIndex());
                }
                wkb.write(region.planarM(), (buf, len) -> out.write(buf, 0, len));
            }
            wkb.write(map.outlinesM(), (buf, len) -> out.write(buf, 0, len));
        } catch (IOException e) {
            throw new UncheckedIOException("hashing in memory failed", e);
        }
        return HexFormat.of().formatHex(sha.digest());
    }

    private static void text(DataOutputStream out, String s) throws IOException {
        bytes(out, s.getBytes(StandardCharsets.UTF_8));
    }

    private static void canonical(DataOutputStream out, Object value) throws IOException {
        bytes(out, CanonicalBytes.of(value));
    }

    private static void bytes(DataOutputStream out, byte[] bytes) throws IOException {
        out.writeInt(bytes.length);
        out.write(bytes);
    }
}
