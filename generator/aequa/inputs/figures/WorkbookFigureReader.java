package aequa.inputs.figures;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

import org.dhatim.fastexcel.reader.Cell;
import org.dhatim.fastexcel.reader.CellRangeAddress;
import org.dhatim.fastexcel.reader.ExcelReaderException;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.ReadingOptions;
import org.dhatim.fastexcel.reader.Row;
import org.dhatim.fastexcel.reader.Sheet;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.TableLayout;

/**
 * Reads one sheet of a spreadsheet workbook (.xlsx, ECMA-376 Office Open XML) as a figures table, streaming its
 * rows with fastexcel-reader. The sheet is named or numbered from 1 ({@code sheet}; the first when unset). The
 * header is the row {@code header-row} names, or else the first row that names the key column and the columns
 * the layout needs; rows above it (titles) are skipped with a note. Empty header cells inside a merged range
 * take the range's text (a heading spread over several columns or rows). Below the header, the table ends at
 * the first row that is blank or has one filled cell only (a note such as "Source: ..."); the rows from there on
 * are skipped with a note. Cells are read by type ({@link WorkbookCells}); text cells go through the same
 * markers and number reading as CSV fields, through {@link TableShaper}.
 */
final class WorkbookFigureReader {

    /** How far down the header is looked for when {@code header-row} is not set. Our choice: title blocks are short. */
    private static final int HEADER_SEARCH_ROWS = 50;

    private final Path path;
    private final FigureSourceSettings settings;
    private final Findings findings;

    private WorkbookFigureReader(Path path, FigureSourceSettings settings, Findings findings) {
        this.path = path;
        this.settings = settings;
        this.findings = findings;
    }

    static FigureTable read(Path path, FigureSourceSettings settings, Findings findings) throws IOException {
        return new WorkbookFigureReader(path, settings, findings).read();
    }

    private FigureTable read() throws IOException {
        byte[] start;
        try (InputStream in = Files.newInputStream(path)) {
            start = in.readNBytes(8);
        }
        if (!ReadableWorkbook.isOOXMLZipHeader(start)) {
            findings.add(Finding.error("figures-workbook-unreadable", settings.file(), "",
                    ReadableWorkbook.isOLE2Header(start) ? "The file is an older binary workbook (.xls), not an .xlsx."
                            : "The file is not an .xlsx workbook (an .xlsx is a zip archive).",
                    "Open it in a spreadsheet program and save it as .xlsx (Excel Workbook)."));
            return empty();
        }
        try (ReadableWorkbook workbook = new ReadableWorkbook(path.toFile(), new ReadingOptions(true, false))) {
            Optional<Sheet> sheet = sheet(workbook);
            if (sheet.isEmpty()) {
                return empty();
            }
            WorkbookCells cells = new WorkbookCells(workbook.isDate1904());
            List<CellRangeAddress> merged = MergedRanges.of(path, sheet.get().getId());
            try (Stream<Row> rows = sheet.get().openStream()) {
                return readRows(rows.iterator(), "sheet \"" + sheet.get().getName() + "\"", cells, merged);
            }
        } catch (ExcelReaderException | IllegalStateException e) {
            findings.add(Finding.error("figures-workbook-unreadable", settings.file(), "",
                    "The workbook cannot be read: " + e.getMessage() + ".",
                    "Check that the file is an .xlsx workbook (older .xls files are not read); save it again as .xlsx."));
            return empty();
        }
    }

    private Optional<Sheet> sheet(ReadableWorkbook workbook) {
        List<Sheet> sheets = workbook.getSheets().toList();
        String wanted = settings.sheet();
        Optional<Sheet> found;
        if (wanted.isEmpty()) {
            found = sheets.stream().findFirst();
        } else if (wanted.matches("\\d{1,4}")) {
            int position = Integer.parseInt(wanted);
            found = position >= 1 && position <= sheets.size() ? Optional.of(sheets.get(position - 1)) : Optional.empty();
        } else {
            found = sheets.stream().filter(s -> s.getName().equals(wanted)).findFirst();
        }
        if (found.isEmpty()) {
            findings.add(Finding.error("figures-sheet-missing", settings.file(), "sheet \"" + wanted + "\"",
                    "The workbook has no sheet \"" + wanted + "\"; its sheets are "
                            + sheets.stream().map(s -> "\"" + s.getName() + "\"").toList() + ".",
                    "Set 'sheet' to one of these names, or to a position counted from 1."));
        }
        return found;
    }

    private FigureTable readRows(Iterator<Row> rows, String where, WorkbookCells cells, List<CellRangeAddress> merged) {
        Map<Long, String> seenTexts = new HashMap<>(); // (row, column) -> text, for rows up to the header
        TableShaper shaper = null;
        int headerRow = 0;
        int width = 0;
        int endRow = 0;
        int endFilled = 0;
        int skippedAfterEnd = 0;
        while (rows.hasNext()) {
            Row row = rows.next();
            int rowNumber = row.getRowNum();
            if (shaper == null) {
                List<String> texts = headerTexts(row, cells, merged, seenTexts);
                boolean isHeader = settings.headerRow() > 0 ? rowNumber == settings.headerRow() : namesTheColumns(texts);
                if (isHeader) {
                    Optional<TableShaper> started = TableShaper.start(settings, where, texts, where + ", row " + rowNumber, findings);
                    if (started.isEmpty()) {
                        return empty();
                    }
                    shaper = started.get();
                    headerRow = rowNumber;
                    width = texts.size();
                } else if (settings.headerRow() == 0 && rowNumber >= HEADER_SEARCH_ROWS) {
                    break;
                }
                continue;
            }
            int filled = filledCells(row);
            if (endRow > 0 || filled <= 1) {
                if (endRow == 0) {
                    endRow = rowNumber;
                }
                if (filled > 0) {
                    skippedAfterEnd++;
                    endFilled = endFilled == 0 ? rowNumber : endFilled;
                }
                continue;
            }
            List<SourceField> fields = new ArrayList<>(width); // cells right of the header's last name are not read
            for (int c = 0; c < width; c++) {
                fields.add(cells.field(c < row.getCellCount() ? row.getCell(c) : null));
            }
            shaper.accept(rowNumber, fields);
        }
        if (shaper == null) {
            findings.add(Finding.error("figures-header-missing", settings.file(), where,
                    settings.headerRow() > 0 ? "The sheet has no row " + settings.headerRow() + "."
                            : "No row among the first " + HEADER_SEARCH_ROWS + " names the key column \"" + settings.keyColumn() + "\""
                                    + (settings.layout() == TableLayout.LONG ? " and the indicator and value columns" : "") + ".",
                    "Set 'header-row' to the row that holds the column names, or 'key' to the name of the key column."));
            return empty();
        }
        if (headerRow > 1) {
            findings.add(Finding.note("figures-title-rows-skipped", settings.file(), where + ", rows 1-" + (headerRow - 1),
                    "The column names are in row " + headerRow + "; the rows above it were read as a title and skipped.",
                    "Set 'header-row' if the column names are elsewhere."));
        }
        if (skippedAfterEnd > 0) {
            findings.add(Finding.note("figures-notes-skipped", settings.file(), where + ", row " + endFilled,
                    "The table ends before row " + endRow + "; the " + skippedAfterEnd + " filled row(s) from there on were read as notes and skipped.",
                    "If they are data, remove the blank row above them and fill at least two of their cells"
                            + " (write a missing-value marker, such as .., where a figure is missing)."));
        }
        return shaper.finish();
    }

    /**
     * The row's texts by column, an empty cell inside a merged range taking the text of the range's first cell
     * (from this row or one above it).
     */
    private static List<String> headerTexts(Row row, WorkbookCells cells, List<CellRangeAddress> merged, Map<Long, String> seen) {
        int r = row.getRowNum() - 1; // CellRangeAddress counts rows from 0
        List<String> texts = new ArrayList<>(row.getCellCount());
        for (int c = 0; c < row.getCellCount(); c++) {
            String text = cells.text(row.getCell(c)).trim();
            if (text.isEmpty()) {
                for (CellRangeAddress range : merged) {
                    if (range.isInRange(r, c)) {
                        text = seen.getOrDefault(cellId(range.getFirstRow(), range.getFirstColumn()), "");
                    }
                }
            }
            seen.put(cellId(r, c), text);
            texts.add(text);
        }
        // a range may reach to the right of the row's last stored cell
        for (CellRangeAddress range : merged) {
            if (range.containsRow(r)) {
                for (int c = texts.size(); c <= range.getLastColumn(); c++) {
                    texts.add(range.containsColumn(c) ? seen.getOrDefault(cellId(range.getFirstRow(), range.getFirstColumn()), "") : "");
                }
            }
        }
        return texts;
    }

    private static long cellId(int row, int column) {
        return ((long) row << 20) | column;
    }

    /** Whether the row names the key column and the columns the layout needs. */
    private boolean namesTheColumns(List<String> texts) {
        boolean ok = texts.contains(settings.keyColumn());
        if (!settings.periodColumn().isEmpty()) {
            ok &= texts.contains(settings.periodColumn());
        }
        if (settings.layout() == TableLayout.LONG) {
            ok &= texts.contains(settings.indicatorColumn()) && texts.contains(settings.valueColumn());
        } else {
            ok &= texts.stream().filter(t -> !t.isEmpty()).count() >= 2;
        }
        return ok;
    }

    private static int filledCells(Row row) {
        int filled = 0;
        for (Cell cell : row) {
            if (cell != null && cell.getRawValue() != null && !cell.getRawValue().isBlank()) {
                filled++;
            }
        }
        return filled;
    }

    private FigureTable empty() {
        return FigureTable.empty(settings.file(), settings.keyMatching());
    }
}
