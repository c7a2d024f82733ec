package aequa.publish;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.List;

import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.databind.SequenceWriter;
import com.fasterxml.jackson.dataformat.csv.CsvGenerator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;

/**
 * The figures of one map as a CSV file that opens safely in a spreadsheet.
 *
 * <p>Format: RFC 4180 (CRLF line ends, fields in double quotes, quotes doubled), UTF-8 without a byte
 * order mark, one row per region and period. Text cells are neutralised against CSV injection as the
 * OWASP "CSV Injection" page recommends: a cell beginning with {@code = + - @}, tab or carriage return
 * gets a leading single quote, and every text cell is quoted. Numeric cells are written by aequa from
 * doubles in plain notation (a minus sign only for negative numbers), so they cannot carry a formula.
 * Empty numeric cells mean "no figure"; the status column says why.
 */
public final class FiguresCsv {

    static final List<String> HEADER = List.of("key", "name", "period", "status", "value", "normalised_value",
            "class", "unreliable", "margin_of_error", "geodesic_area_km2");

    private static final CsvMapper MAPPER = CsvMapper.builder()
            .enable(CsvGenerator.Feature.ALWAYS_QUOTE_STRINGS)
            .enable(StreamWriteFeature.WRITE_BIGDECIMAL_AS_PLAIN)
            .build();

    private FiguresCsv() {
    }

    public static byte[] write(MapModel map) {
        StringWriter out = new StringWriter();
        CsvSchema schema = CsvSchema.emptySchema().withLineSeparator("\r\n");
        try (SequenceWriter rows = MAPPER.writerFor(Object[].class).with(schema).writeValues(out)) {
            rows.write(HEADER.toArray());
            for (MapRegion region : map.regions()) {
                for (int p = 0; p < map.periods().size() && p < region.values().size(); p++) {
                    RegionValue v = region.values().get(p);
                    rows.write(new Object[] {
                        neutralise(region.key()), neutralise(region.name()), neutralise(map.periods().get(p)),
                        statusText(v), number(v.value()), number(v.normalisedValue()),
                        v.classIndex() < 0 ? "" : BigDecimal.valueOf(v.classIndex() + 1L),
                        v.unreliable() ? "yes" : "no", number(v.marginOfError()), number(region.geodesicAreaKm2())});
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("CSV writing to memory failed", e);
        }
        return out.toString().getBytes(StandardCharsets.UTF_8);
    }

    /** The status word of the table and CSV: a reported zero is kept apart from "no data". */
    static String statusText(RegionValue v) {
        return switch (v.status()) {
            case REPORTED -> v.value() == 0 ? "zero" : "reported";
            case NO_DATA -> "no data";
            case SUPPRESSED -> "suppressed";
            case NOT_APPLICABLE -> "not applicable";
        };
    }

    /**
     * Prefixes a single quote when the text starts with a character a spreadsheet may read as a formula
     * (OWASP, "CSV Injection": {@code = + - @}, tab {@code 0x09}, carriage return {@code 0x0D}).
     */
    static String neutralise(String text) {
        if (text.isEmpty()) {
            return text;
        }
        char first = text.charAt(0);
        boolean risky = first == '=' || first == '+' || first == '-' || first == '@' || first == '\t' || first == '\r';
        return risky ? "'" + text : text;
    }

    private static Object number(double value) {
        if (!Double.isFinite(value)) {
            return "";
        }
        BigDecimal plain = BigDecimal.valueOf(value).stripTrailingZeros();
        return plain.scale() < 0 ? plain.setScale(0) : plain;
    }
}
