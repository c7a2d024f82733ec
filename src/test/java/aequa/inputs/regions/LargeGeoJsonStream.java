package aequa.inputs.regions;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;

import aequa.findings.Findings;
import aequa.project.RegionSourceSpec;

/**
 * A GeoJSON FeatureCollection of a given size made on the fly (so no file of that size is written): square
 * cells of 1,000 vertices each, coordinates with six decimals as boundary files carry them. {@link #main}
 * reads one through the region reader and prints what it kept; {@code LargeGeoJsonTest} runs it in a JVM
 * with a small heap.
 */
final class LargeGeoJsonStream extends InputStream {

    static final int VERTICES_PER_CELL = 1000;

    private final long targetBytes;
    private long produced;
    private int cell;
    private byte[] chunk = "{\"type\":\"FeatureCollection\",\"features\":[".getBytes(StandardCharsets.US_ASCII);
    private int position;
    private boolean ended;

    LargeGeoJsonStream(long targetBytes) {
        this.targetBytes = targetBytes;
    }

    @Override
    public int read() {
        byte[] one = new byte[1];
        return read(one, 0, 1) < 0 ? -1 : one[0] & 0xFF;
    }

    @Override
    public int read(byte[] buffer, int offset, int length) {
        if (position == chunk.length && !next()) {
            return -1;
        }
        int n = Math.min(length, chunk.length - position);
        System.arraycopy(chunk, position, buffer, offset, n);
        position += n;
        produced += n;
        return n;
    }

    /** The number of cells written so far. */
    int cells() {
        return cell;
    }

    private boolean next() {
        if (ended) {
            return false;
        }
        position = 0;
        if (produced >= targetBytes) {
            chunk = "]}".getBytes(StandardCharsets.US_ASCII);
            ended = true;
            return true;
        }
        long lonMicro = -170_000_000L + (cell % 300) * 1_100_000L;
        long latMicro = -80_000_000L + (cell / 300 % 140) * 1_100_000L;
        StringBuilder feature = new StringBuilder(cell == 0 ? "" : ",")
                .append("{\"type\":\"Feature\",\"properties\":{\"code\":\"c").append(cell)
                .append("\"},\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[");
        int side = VERTICES_PER_CELL / 4;
        long stepMicro = 1_000_000L / side;
        for (int i = 0; i < VERTICES_PER_CELL; i++) {
            int edge = i / side;
            long t = (i % side) * stepMicro;
            long x = edge == 0 ? t : edge == 1 ? 1_000_000L : edge == 2 ? 1_000_000L - t : 0;
            long y = edge == 0 ? 0 : edge == 1 ? t : edge == 2 ? 1_000_000L : 1_000_000L - t;
            position(feature, lonMicro + x, latMicro + y).append(',');
        }
        position(feature, lonMicro, latMicro).append("]]}}");
        chunk = feature.toString().getBytes(StandardCharsets.US_ASCII);
        cell++;
        return true;
    }

    /** Appends {@code [lon,lat]} from millionths of a degree, with six decimals (String.format is too slow here). */
    private static StringBuilder position(StringBuilder out, long lonMicro, long latMicro) {
        return decimal(decimal(out.append('['), lonMicro).append(','), latMicro).append(']');
    }

    private static StringBuilder decimal(StringBuilder out, long micro) {
        long magnitude = Math.abs(micro);
        String fraction = Long.toString(1_000_000L + magnitude % 1_000_000L).substring(1);
        return out.append(micro < 0 ? "-" : "").append(magnitude / 1_000_000L).append('.').append(fraction);
    }

    /** Reads a stream of {@code args[0]} bytes through the GeoJSON reader; prints "regions N vertices M findings F". */
    public static void main(String[] args) {
        LargeGeoJsonStream in = new LargeGeoJsonStream(Long.parseLong(args[0]));
        Findings findings = new Findings();
        var regions = new GeoJsonRegionReader("large.geojson", new RegionSourceSpec("large.geojson", "code", null, null), findings)
                .read(in);
        long vertices = regions.stream().mapToLong(r -> r.lonLat().getNumPoints()).sum();
        System.out.println("bytes " + in.produced + " regions " + regions.size() + " vertices " + vertices
                + " findings " + findings.list().size());
    }
}
