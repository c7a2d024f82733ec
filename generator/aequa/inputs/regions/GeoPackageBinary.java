package aequa.inputs.regions;

/**
 * The GeoPackageBinary header that precedes the WKB of every geometry in a GeoPackage feature table
 * (OGC 12-128r18, GeoPackage 1.3, clause 2.1.3.1.1 and Table 6):
 * <pre>
 * bytes 0-1  magic "GP" (0x47 0x50)
 * byte  2    version, 0 = version 1
 * byte  3    flags: bits 7-6 reserved, bit 5 X extended type, bit 4 Y empty geometry,
 *            bits 3-1 E envelope contents (0 none, 1 xy = 32 bytes, 2 xyz = 48, 3 xym = 48, 4 xyzm = 64,
 *            5-7 invalid), bit 0 B byte order of srs_id and envelope (1 little endian, 0 big endian)
 * bytes 4-7  srs_id, int32 in byte order B
 * bytes 8-   envelope doubles in byte order B, then the standard WKB geometry (ISO 13249-3 / OGC 06-103r4)
 * </pre>
 *
 * @param empty     the Y flag: the geometry is empty
 * @param wkbOffset where the WKB starts in the blob
 */
record GeoPackageBinary(boolean empty, int wkbOffset) {

    private static final int[] ENVELOPE_BYTES = {0, 32, 48, 48, 64};

    /**
     * Parses the header of a geometry blob.
     *
     * @return the header, or null when the blob is not GeoPackageBinary (wrong magic, unknown version,
     *         invalid envelope code, extended type, or too short)
     */
    static GeoPackageBinary parse(byte[] blob) {
        if (blob.length < 8 || blob[0] != 0x47 || blob[1] != 0x50 || blob[2] != 0) {
            return null;
        }
        int flags = blob[3] & 0xFF;
        boolean extended = (flags & 0b0010_0000) != 0;
        boolean empty = (flags & 0b0001_0000) != 0;
        int envelopeCode = (flags >> 1) & 0b111;
        if (extended || envelopeCode >= ENVELOPE_BYTES.length) {
            return null;
        }
        // bytes 4-7 (srs_id) are not read: the layer's srs_id in gpkg_geometry_columns decides the CRS
        int offset = 8 + ENVELOPE_BYTES[envelopeCode];
        if (blob.length < offset) {
            return null;
        }
        return new GeoPackageBinary(empty, offset);
    }
}
