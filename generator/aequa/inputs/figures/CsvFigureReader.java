package aequa.inputs.figures;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;

import aequa.findings.Excerpt;
import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * Reads a delimited text file (RFC 4180, section 2) with Jackson's CSV parser: the first record is the
 * header; fields may be quoted with {@code "}, a quote inside a quoted field is doubled, quoted fields may
 * hold separators and line breaks; lines end with CRLF or LF, the last one optionally. Spaces are part of
 * a field (RFC 4180, section 2, rule 4); numbers and markers are compared after trimming.
 *
 * <p>The file must be UTF-8; a leading byte order mark U+FEFF (Unicode Standard, section 23.8) is dropped.
 * The whole file is decoded in memory, which suits statistics tables (a 100,000-row table is a few MB).
 */
final class CsvFigureReader {

    private static final byte[] UTF16_LE_BOM = {(byte) 0xFF, (byte) 0xFE};
    private static final byte[] UTF16_BE_BOM = {(byte) 0xFE, (byte) 0xFF};

    private CsvFigureReader() {
    }

    static FigureTable read(Path path, FigureSourceSettings settings, Findings findings) throws IOException {
        Optional<String> text = decode(Files.readAllBytes(path), settings, findings);
        if (text.isEmpty()) {
            return FigureTable.empty(settings.file(), settings.keyMatching());
        }
        FieldSeparator separator = settings.separator();
        if (separator == FieldSeparator.AUTO) {
            separator = path.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".tsv")
                    ? FieldSeparator.TAB : SeparatorDetector.detect(text.get());
        }
        CsvSchema schema = CsvSchema.emptySchema().withColumnSeparator(separator.character()).withQuoteChar('"');
        CsvMapper mapper = new CsvMapper();
        int row = 0;
        TableShaper shaper = null;
        try (MappingIterator<String[]> records = mapper.readerFor(String[].class)
                .with(CsvParser.Feature.WRAP_AS_ARRAY).with(schema).readValues(text.get())) {
            while (records.hasNextValue()) {
                String[] record = records.nextValue();
                row++;
                if (row == 1) {
                    Optional<TableShaper> started = TableShaper.start(settings, "", Arrays.asList(record), "row 1",
                            findings);
                    if (started.isEmpty()) {
                        return FigureTable.empty(settings.file(), settings.keyMatching());
                    }
                    shaper = started.get();
                } else {
                    List<SourceField> fields = new ArrayList<>(record.length);
                    for (String field : record) {
                        fields.add(SourceField.text(field));
                    }
                    shaper.accept(row, fields);
                }
            }
        } catch (JsonProcessingException malformed) {
            JsonLocation at = malformed.getLocation();
            String place = at == null ? "row " + (row + 1) : "line " + at.getLineNr() + ", character " + at.getColumnNr();
            findings.add(Finding.error("figures-csv-malformed", settings.file(), place,
                    "The file is not valid CSV here: " + Excerpt.quotedParts(malformed.getOriginalMessage()) + ".",
                    "A field containing a quote must be quoted as a whole, with the inner quote doubled (\"\"),"
                            + " as RFC 4180 requires; reading stopped here."));
        }
        if (shaper == null) {
            findings.add(Finding.error("figures-file-empty", settings.file(), "",
                    "The file has no header row.", "The first row must name the columns."));
            return FigureTable.empty(settings.file(), settings.keyMatching());
        }
        return shaper.finish();
    }

    /** The text of the file, without a leading U+FEFF; empty (after a finding) when it is not UTF-8. */
    private static Optional<String> decode(byte[] bytes, FigureSourceSettings settings, Findings findings) {
        if (startsWith(bytes, UTF16_LE_BOM) || startsWith(bytes, UTF16_BE_BOM)) {
            findings.add(Finding.error("figures-not-utf8", settings.file(), "",
                    "The file is encoded as UTF-16.", "Save it as UTF-8."));
            return Optional.empty();
        }
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length); // UTF-8 never gives more UTF-16 units than bytes
        CoderResult result = decoder.decode(in, out, true);
        if (result.isError()) {
            long badByte = in.position() + 1L; // the decoder stops at the first byte of the bad sequence
            findings.add(Finding.error("figures-not-utf8", settings.file(), "byte " + badByte,
                    "The file is not valid UTF-8 from byte " + badByte + " on.",
                    "Save it as UTF-8; other 8-bit encodings are not read, to keep names intact."));
            return Optional.empty();
        }
        decoder.flush(out);
        String text = out.flip().toString();
        return Optional.of(text.startsWith("\uFEFF") ? text.substring(1) : text);
    }

    private static boolean startsWith(byte[] bytes, byte[] prefix) {
        return bytes.length >= prefix.length && Arrays.equals(bytes, 0, prefix.length, prefix, 0, prefix.length);
    }
}
