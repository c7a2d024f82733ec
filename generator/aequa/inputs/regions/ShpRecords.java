package aequa.inputs.regions;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.ArrayList;
import java.util.List;

/**
 * Streams the records of a Shapefile main file ({@code .shp}) as the ESRI Shapefile Technical Description
 * (July 1998) lays them out: a 100-byte header (file code 9994 and file length in 16-bit words, big-endian;
 * version 1000 and shape type, little-endian; the bounding box as four little-endian doubles), then records
 * of an 8-byte big-endian header (record number, content length in 16-bit words) and a little-endian content.
 *
 * <p>Only the shape types that hold areas are understood: Polygon (5), PolygonZ (15) and PolygonM (25). Their
 * content starts alike (type, box, NumParts, NumPoints, Parts[], Points[] as x, y doubles); the Z and M
 * arrays that follow are skipped through the content length. A record's content is read into memory one
 * record at a time; the file itself is never held whole.
 */
final class ShpRecords {

    static final int NULL_SHAPE = 0;
    static final int POLYGON = 5;
    static final int POLYGON_Z = 15;
    static final int POLYGON_M = 25;

    private static final int FILE_CODE = 9994;
    private static final int HEADER_BYTES = 100;

    /** The main file header (Technical Description, "The Main File Header", table 1). */
    record Header(int shapeType, long fileBytes, double minX, double minY, double maxX, double maxY) {
    }

    /**
     * One record: its number as stored, its shape type, and for a polygon its rings (parts) as
     * {@code x0, y0, x1, y1, ...} in the file's own coordinates; no rings for a null shape.
     */
    record ShapeRecord(int number, int shapeType, List<DoubleList> rings) {
    }

    /** The file is not a Shapefile or ends inside a record; {@code record} is 0 for the header. */
    static final class MalformedShp extends Exception {
        private static final long serialVersionUID = 1L;
        final int record;

        MalformedShp(int record, String message) {
            super(message);
            this.record = record;
        }
    }

    private final InputStream in;
    private final Header header;
    private long position = HEADER_BYTES;
    private int recordsRead;

    private ShpRecords(InputStream in, Header header) {
        this.in = in;
        this.header = header;
    }

    /** Reads and checks the 100-byte header; {@code in} should be buffered. */
    static ShpRecords open(InputStream in) throws IOException, MalformedShp {
        ByteBuffer bytes = ByteBuffer.wrap(readFully(in, HEADER_BYTES, 0));
        bytes.order(ByteOrder.BIG_ENDIAN);
        if (bytes.getInt(0) != FILE_CODE) {
            throw new MalformedShp(0, "its first four bytes are not the Shapefile file code 9994");
        }
        long fileBytes = 2L * Integer.toUnsignedLong(bytes.getInt(24));
        bytes.order(ByteOrder.LITTLE_ENDIAN);
        Header header = new Header(bytes.getInt(32), fileBytes, bytes.getDouble(36), bytes.getDouble(44),
                bytes.getDouble(52), bytes.getDouble(60));
        return new ShpRecords(in, header);
    }

    Header header() {
        return header;
    }

    /** How many records have been read so far. */
    int recordsRead() {
        return recordsRead;
    }

    /**
     * @return the next record, or null at the end of the file (the end of the stream, or the length the
     *         header gives, whichever comes first)
     */
    ShapeRecord next() throws IOException, MalformedShp {
        if (position >= header.fileBytes()) {
            return null;
        }
        int expected = recordsRead + 1;
        byte[] head = in.readNBytes(8);
        if (head.length == 0) {
            return null;
        }
        if (head.length < 8) {
            throw new MalformedShp(expected, "the file ends inside the header of record " + expected);
        }
        ByteBuffer big = ByteBuffer.wrap(head).order(ByteOrder.BIG_ENDIAN);
        int number = big.getInt(0);
        long contentBytes = 2L * Integer.toUnsignedLong(big.getInt(4));
        if (contentBytes < 4 || contentBytes > Integer.MAX_VALUE) {
            throw new MalformedShp(expected, "record " + expected + " gives an impossible content length of "
                    + contentBytes + " bytes");
        }
        ByteBuffer content = ByteBuffer.wrap(readFully(in, (int) contentBytes, expected)).order(ByteOrder.LITTLE_ENDIAN);
        position += 8 + contentBytes;
        recordsRead++;
        int type = content.getInt(0);
        if (type == NULL_SHAPE) {
            return new ShapeRecord(number, type, List.of());
        }
        if (type != POLYGON && type != POLYGON_Z && type != POLYGON_M) {
            return new ShapeRecord(number, type, List.of());
        }
        return new ShapeRecord(number, type, rings(content, expected));
    }

    /** Parts and points of a polygon record (Technical Description, "Polygon", byte positions table). */
    private static List<DoubleList> rings(ByteBuffer content, int record) throws MalformedShp {
        if (content.capacity() < 44) {
            throw new MalformedShp(record, "record " + record + " is too short for a polygon");
        }
        int numParts = content.getInt(36);
        int numPoints = content.getInt(40);
        long needed = 44L + 4L * numParts + 16L * numPoints;
        if (numParts < 0 || numPoints < 0 || needed > content.capacity()) {
            throw new MalformedShp(record, "record " + record + " declares " + numParts + " parts and " + numPoints
                    + " points, more than its " + content.capacity() + " bytes hold");
        }
        int[] starts = new int[numParts + 1];
        for (int p = 0; p < numParts; p++) {
            starts[p] = content.getInt(44 + 4 * p);
        }
        starts[numParts] = numPoints;
        int pointsAt = 44 + 4 * numParts;
        List<DoubleList> rings = new ArrayList<>(numParts);
        for (int p = 0; p < numParts; p++) {
            if (starts[p] < 0 || starts[p] > starts[p + 1]) {
                throw new MalformedShp(record, "record " + record + " has part indexes out of order");
            }
            DoubleList ring = new DoubleList(2 * (starts[p + 1] - starts[p]));
            for (int i = starts[p]; i < starts[p + 1]; i++) {
                ring.add(content.getDouble(pointsAt + 16 * i));
                ring.add(content.getDouble(pointsAt + 16 * i + 8));
            }
            rings.add(ring);
        }
        return rings;
    }

    private static byte[] readFully(InputStream in, int length, int record) throws IOException, MalformedShp {
        byte[] bytes = in.readNBytes(length);
        if (bytes.length < length) {
            throw new MalformedShp(record, record == 0 ? "the file is shorter than the 100-byte Shapefile header"
                    : "the file ends inside record " + record);
        }
        return bytes;
    }
}
