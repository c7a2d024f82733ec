package aequa.inputs.figures;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

import org.dhatim.fastexcel.reader.ExcelReaderException;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.ReadingOptions;
import org.dhatim.fastexcel.reader.Row;
import org.dhatim.fastexcel.reader.Sheet;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;

import aequa.inputs.SqliteColumns;

/**
 * The columns of a figures file and their values, row by row, for guessing which one is the key: a delimited
 * text file's header (separator detected as {@link CsvFigureReader} does) or the first sheet of an {@code .xlsx}
 * workbook, whose header is taken to be the first row with two or more filled cells (a title row above it has
 * one), or the first table or view (by name) of a SQLite file. Values are text as the readers see them (leading
 * zeros of text cells kept); the file is read in memory.
 *
 * @param columns column name to its values in row order, columns in file order
 * @param table   the SQLite table or view that was read; empty for other kinds
 */
public record FigureColumns(Map<String, List<String>> columns, String table) {

    /** The file kinds this sampler reads, for a usage message. */
    public static final String KINDS = "delimited text (.csv, .tsv, .txt), a workbook (.xlsx) or SQLite (.sqlite, .db, .gpkg)";

    public FigureColumns {
        Map<String, List<String>> copy = new LinkedHashMap<>();
        columns.forEach((name, values) -> copy.put(name, Collections.unmodifiableList(new ArrayList<>(values))));
        columns = Collections.unmodifiableMap(copy);
    }

    /**
     * @return the columns, or empty when the file's kind is not one of {@link #KINDS}
     * @throws IOException when the file cannot be read, or is not UTF-8 text or an .xlsx workbook
     */
    public static Optional<FigureColumns> read(Path file) throws IOException {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".xlsx")) {
            return Optional.of(new FigureColumns(workbook(file), ""));
        }
        if (name.endsWith(".csv") || name.endsWith(".tsv") || name.endsWith(".txt")) {
            return Optional.of(new FigureColumns(text(file, name.endsWith(".tsv")), ""));
        }
        if (name.endsWith(".sqlite") || name.endsWith(".db") || name.endsWith(".gpkg")) {
            String table = SqliteColumns.firstName(file, "SELECT name FROM sqlite_master WHERE type IN ('table', 'view')"
                    + " AND name NOT LIKE 'sqlite%' AND name NOT LIKE 'gpkg%' AND name NOT LIKE 'rtree%' ORDER BY name")
                    .orElseThrow(() -> new IOException(file.getFileName() + " holds no table"));
            return Optional.of(new FigureColumns(SqliteColumns.read(file, table, java.util.Set.of()), table));
        }
        return Optional.empty();
    }

    private static Map<String, List<String>> text(Path file, boolean tabs) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        FieldSeparator separator = tabs ? FieldSeparator.TAB : SeparatorDetector.detect(text);
        CsvSchema schema = CsvSchema.emptySchema().withColumnSeparator(separator.character()).withQuoteChar('"');
        List<List<String>> rows = new ArrayList<>();
        try (MappingIterator<String[]> records = new CsvMapper().readerFor(String[].class)
                .with(CsvParser.Feature.WRAP_AS_ARRAY).with(schema).readValues(text)) {
            while (records.hasNextValue()) {
                rows.add(List.of(records.nextValue()));
            }
        }
        return columns(rows);
    }

    private static Map<String, List<String>> workbook(Path file) throws IOException {
        List<List<String>> rows = new ArrayList<>();
        try (ReadableWorkbook workbook = new ReadableWorkbook(file.toFile(), new ReadingOptions(true, false))) {
            Optional<Sheet> first = workbook.getFirstSheet() == null ? Optional.empty() : Optional.of(workbook.getFirstSheet());
            if (first.isEmpty()) {
                return Map.of();
            }
            WorkbookCells cells = new WorkbookCells(workbook.isDate1904());
            try (Stream<Row> sheetRows = first.get().openStream()) {
                for (Row row : (Iterable<Row>) sheetRows::iterator) {
                    List<String> texts = new ArrayList<>();
                    for (int c = 0; c < row.getCellCount(); c++) {
                        texts.add(cells.text(row.getCell(c)).trim());
                    }
                    if (!rows.isEmpty() || texts.stream().filter(t -> !t.isEmpty()).count() >= 2) {
                        rows.add(texts);
                    }
                }
            }
        } catch (ExcelReaderException | IllegalStateException e) {
            throw new IOException(file.getFileName() + " cannot be read as an .xlsx workbook: " + e.getMessage(), e);
        }
        return columns(rows);
    }

    /** The first row names the columns; later rows give their values (null where a row is short). */
    private static Map<String, List<String>> columns(List<List<String>> rows) {
        Map<String, List<String>> columns = new LinkedHashMap<>();
        if (rows.isEmpty()) {
            return columns;
        }
        List<String> header = rows.get(0);
        for (int c = 0; c < header.size(); c++) {
            String name = header.get(c).trim();
            if (name.isEmpty() || columns.containsKey(name)) {
                continue;
            }
            List<String> values = new ArrayList<>();
            for (List<String> row : rows.subList(1, rows.size())) {
                values.add(c < row.size() ? row.get(c) : null);
            }
            columns.put(name, values);
        }
        return columns;
    }
}
