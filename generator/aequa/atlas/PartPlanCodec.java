package aequa.atlas;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

import aequa.composite.PartPlan;
import aequa.inputs.CacheFile;
import aequa.projection.Footprint;
import aequa.projection.FootprintSamples;
import aequa.projection.ProjectionChoice;

/**
 * The binary form of a map's parts ({@link PartPlan}s: the outcome of the detached-part search and of each
 * part's projection choice) in the {@link GeometryCache}, in the manner of {@link GeometryCodec}: doubles as
 * their exact bits, text length-prefixed, lists in their order; a plan read back equals the one written, so a
 * composite map drawn from the cache is byte-identical to one drawn without it.
 */
final class PartPlanCodec {

    private PartPlanCodec() {
    }

    static void writeParts(DataOutputStream out, List<PartPlan> parts) throws IOException {
        out.writeInt(parts.size());
        for (PartPlan part : parts) {
            CacheFile.writeText(out, part.id());
            CacheFile.writeText(out, part.name());
            out.writeInt(part.keys().size());
            for (String key : part.keys()) {
                CacheFile.writeText(out, key);
            }
            out.writeBoolean(part.main());
            out.writeDouble(part.areaScale());
            CacheFile.writeText(out, part.corner());
            out.writeDouble(part.areaKm2());
            out.writeDouble(part.gapKm());
            writeFootprint(out, part.footprint());
            GeometryCodec.writeChoice(out, part.choice());
        }
    }

    /**
     * What {@link #writeParts} wrote; empty when a part's projection cannot be {@code rebuilt} exactly as it
     * was stored (the plan is then made again).
     */
    static Optional<List<PartPlan>> readParts(DataInputStream in,
                                              Function<GeometryCodec.StoredChoice, Optional<ProjectionChoice>> rebuild)
            throws IOException {
        int count = in.readInt();
        List<PartPlan> parts = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            String id = CacheFile.readText(in);
            String name = CacheFile.readText(in);
            int keyCount = in.readInt();
            List<String> keys = new ArrayList<>();
            for (int k = 0; k < keyCount; k++) {
                keys.add(CacheFile.readText(in));
            }
            boolean main = in.readBoolean();
            double areaScale = in.readDouble();
            String corner = CacheFile.readText(in);
            double areaKm2 = in.readDouble();
            double gapKm = in.readDouble();
            Footprint footprint = readFootprint(in);
            Optional<ProjectionChoice> choice = rebuild.apply(GeometryCodec.readChoice(in));
            if (choice.isEmpty()) {
                return Optional.empty();
            }
            parts.add(new PartPlan(id, name, keys, main, areaScale, corner, areaKm2, gapKm, footprint, choice.get()));
        }
        return Optional.of(parts);
    }

    private static void writeFootprint(DataOutputStream out, Footprint f) throws IOException {
        for (double v : new double[] {f.centreLonDeg(), f.lonSpanDeg(), f.minLatDeg(), f.maxLatDeg()}) {
            out.writeDouble(v);
        }
        out.writeBoolean(f.containsNorthPole());
        out.writeBoolean(f.containsSouthPole());
        for (double v : new double[] {f.sphericalCentreLonDeg(), f.sphericalCentreLatDeg(), f.angularRadiusDeg(),
                f.elongation(), f.orientationDeg()}) {
            out.writeDouble(v);
        }
        FootprintSamples samples = f.samples();
        doubles(out, samples.lonLatDeg());
        doubles(out, samples.weights());
        out.writeInt(samples.interiorCount());
        out.writeInt(samples.extremeCount());
    }

    private static Footprint readFootprint(DataInputStream in) throws IOException {
        double centreLon = in.readDouble();
        double lonSpan = in.readDouble();
        double minLat = in.readDouble();
        double maxLat = in.readDouble();
        boolean north = in.readBoolean();
        boolean south = in.readBoolean();
        double sphericalLon = in.readDouble();
        double sphericalLat = in.readDouble();
        double radius = in.readDouble();
        double elongation = in.readDouble();
        double orientation = in.readDouble();
        double[] lonLat = doubles(in);
        double[] weights = doubles(in);
        if (lonLat.length != 2 * weights.length) {
            throw new IOException("footprint samples of unequal length");
        }
        FootprintSamples samples = new FootprintSamples(lonLat, weights, in.readInt(), in.readInt());
        return new Footprint(centreLon, lonSpan, minLat, maxLat, north, south, sphericalLon, sphericalLat, radius,
                elongation, orientation, samples);
    }

    private static void doubles(DataOutputStream out, double[] values) throws IOException {
        out.writeInt(values.length);
        for (double v : values) {
            out.writeDouble(v);
        }
    }

    private static double[] doubles(DataInputStream in) throws IOException {
        int length = in.readInt();
        if (length < 0) {
            throw new IOException("negative array length");
        }
        double[] values = new double[length];
        for (int i = 0; i < length; i++) {
            values[i] = in.readDouble();
        }
        return values;
    }
}
