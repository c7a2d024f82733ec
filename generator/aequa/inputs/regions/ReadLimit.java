package aequa.inputs.regions;

import java.util.Locale;

import aequa.findings.Finding;

/**
 * The bounds a region file must keep, so that a broken or hostile file ends in a finding instead of
 * exhausting the heap or the stack. The defaults are far beyond real boundary files: GeoJSON nests 7 levels
 * deep (RFC 7946, section 3.1.7: a FeatureCollection's MultiPolygon coordinates), names and keys are short,
 * and 20 million vertices is a GeoJSON file of about 500 MB. Each limit can be raised for one run with a
 * system property, {@code JAVA_OPTS='-Daequa.limit.NAME=N' ./aequa publish}; the property is read whenever
 * a file is read.
 */
public enum ReadLimit {

    /** Levels of nested JSON arrays and objects (enforced by Jackson's StreamReadConstraints). */
    NESTING_DEPTH("nesting-depth", 64, "levels of nested arrays and objects"),
    /** Characters in one JSON string or member name (enforced by Jackson's StreamReadConstraints). */
    STRING_CHARS("string-chars", 1_000_000, "characters in one text value"),
    /** Members of one feature's properties object. */
    PROPERTIES("properties", 10_000, "properties in one feature"),
    /** Positions in one ring. */
    RING_POSITIONS("ring-positions", 5_000_000, "positions in one ring"),
    /** Vertices in the whole file, all features together. */
    FILE_VERTICES("vertices", 20_000_000, "vertices in one file");

    private final String name;
    private final long defaultValue;
    private final String counted;

    ReadLimit(String name, long defaultValue, String counted) {
        this.name = name;
        this.defaultValue = defaultValue;
        this.counted = counted;
    }

    /** The system property that raises (or lowers) this limit. */
    public String property() {
        return "aequa.limit." + name;
    }

    /** The limit in force: the system property when it is a positive whole number, else the default. */
    public long value() {
        Long set = Long.getLong(property());
        return set == null || set <= 0 ? defaultValue : set;
    }

    /** {@link #value()} for limits handed to APIs that count in ints. */
    int intValue() {
        return (int) Math.min(Integer.MAX_VALUE, value());
    }

    /** The error for a file that goes beyond this limit at {@code place}; what follows depends on the limit. */
    Finding finding(String file, String place, String consequence) {
        return Finding.error("input-limit-exceeded", file, place,
                String.format(Locale.ROOT, "It goes beyond aequa's limit of %,d %s; %s.", value(), counted, consequence),
                "If the file is right, raise the limit for this run: JAVA_OPTS='-D" + property() + "=N' ./aequa publish"
                        + " (N above " + String.format(Locale.ROOT, "%,d", value()).replace(",", "") + ").");
    }
}
