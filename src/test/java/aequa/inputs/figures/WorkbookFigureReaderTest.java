package aequa.inputs.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;

import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * Workbooks written by a general-purpose .xlsx writer (fastexcel 0.19.0, test scope) are read as the same data
 * written as CSV is read (the CSV reader is the reference: RFC 4180, tested in CsvRfc4180Test): same keys,
 * indicators, periods, statuses and values, whatever the workbook adds around the table (titles, merged
 * headings, notes) and whatever types its cells have (text, numbers, cached formula values, dates).
 */
class WorkbookFigureReaderTest {

    @TempDir
    Path dir;

    /** What the join sees of a table: key, indicator, period, status and value of each cell, in order. */
    private static List<String> joinView(FigureTable table) {
        return table.cells().stream()
                .map(c -> c.key() + "|" + c.indicator() + "|" + c.period() + "|" + c.status() + "|" + c.value()).toList();
    }

    private FigureTable read(String file, SourceSpecBuilder spec, Findings findings) {
        return FigureReaders.read(dir, spec.build(), findings);
    }

    /** A census-style sheet: merged title, subtitle, blank row, header on row 4, notes under the table. */
    private void writeCensusStyleWorkbook(Path file) throws IOException {
        try (OutputStream out = Files.newOutputStream(file)) {
            Workbook workbook = new Workbook(out, "aequa-test", "1.0");
            workbook.newWorksheet("Contents").value(0, 0, "See the next sheet.");
            Worksheet ws = workbook.newWorksheet("Counties");
            ws.value(0, 0, "Counties and equivalents per state, 2017");
            ws.range(0, 0, 0, 4).merge();
            ws.value(1, 0, "US Census Bureau cartographic boundary files");
            ws.value(3, 0, "GEOID");
            ws.value(3, 1, "NAME");
            ws.value(3, 2, "counties");
            ws.value(3, 3, "doubled");
            ws.value(3, 4, "as_of");
            Object[][] rows = {{"01", "Alabama", 67}, {"06", "California", 58}, {"11", "District of Columbia", "x"},
                    {"72", "Puerto Rico", ".."}, {"78", "United States Virgin Islands", "-"}};
            for (int r = 0; r < rows.length; r++) {
                int row = 4 + r;
                ws.value(row, 0, (String) rows[r][0]);
                ws.value(row, 1, (String) rows[r][1]);
                if (rows[r][2] instanceof Integer n) {
                    ws.value(row, 2, n);
                    ws.formula(row, 3, "C" + (row + 1) + "*2");
                } else {
                    ws.value(row, 2, (String) rows[r][2]);
                    ws.value(row, 3, (String) rows[r][2]);
                }
                ws.value(row, 4, LocalDate.of(2017, 1, 1));
                ws.style(row, 4).format("yyyy-mm-dd").set();
            }
            ws.value(10, 0, "Source: US Census Bureau, 2017. x = suppressed, .. = missing, - = not applicable.");
            ws.value(11, 0, "Puerto Rico counts municipios.");
            workbook.finish();
        }
        // fastexcel writes formulas without their computed values; store them as a spreadsheet program does
        // after calculation (ECMA-376 Part 1, section 18.3.1.4: the cell's <v> beside its <f>)
        cacheFormulaValues(file, "C5*2", "134");
        cacheFormulaValues(file, "C6*2", "116");
    }

    private static void cacheFormulaValues(Path xlsx, String formula, String value) throws IOException {
        ByteArrayOutputStream rewritten = new ByteArrayOutputStream();
        try (ZipFile in = new ZipFile(xlsx.toFile()); ZipOutputStream out = new ZipOutputStream(rewritten)) {
            for (ZipEntry entry : java.util.Collections.list(in.entries())) {
                byte[] bytes;
                try (var entryIn = in.getInputStream(entry)) {
                    bytes = entryIn.readAllBytes();
                }
                if (entry.getName().startsWith("xl/worksheets/")) {
                    String xml = new String(bytes, StandardCharsets.UTF_8);
                    bytes = xml.replace("<f>" + formula + "</f>", "<f>" + formula + "</f><v>" + value + "</v>").getBytes(StandardCharsets.UTF_8);
                }
                out.putNextEntry(new ZipEntry(entry.getName()));
                out.write(bytes);
                out.closeEntry();
            }
        }
        Files.write(xlsx, rewritten.toByteArray());
    }

    private static final String SAME_TABLE_CSV = String.join("\n",
            "GEOID,NAME,counties,doubled,as_of",
            "01,Alabama,67,134,2017-01-01",
            "06,California,58,116,2017-01-01",
            "11,District of Columbia,x,x,2017-01-01",
            "72,Puerto Rico,..,..,2017-01-01",
            "78,United States Virgin Islands,-,-,2017-01-01", "");

    @Test
    void censusStyleSheetJoinsAsTheSameTableInCsv() throws IOException {
        writeCensusStyleWorkbook(dir.resolve("counties.xlsx"));
        Files.writeString(dir.resolve("counties.csv"), SAME_TABLE_CSV);
        SourceSpecBuilder csv = SourceSpecBuilder.file("counties.csv").key("GEOID").periodColumn("as_of")
                .suppressed("x").notApplicable("-");
        SourceSpecBuilder xlsx = SourceSpecBuilder.file("counties.xlsx").key("GEOID").periodColumn("as_of")
                .suppressed("x").notApplicable("-").sheet("Counties");
        Findings csvFindings = new Findings();
        Findings xlsxFindings = new Findings();
        FigureTable expected = read("counties.csv", csv, csvFindings);
        FigureTable actual = read("counties.xlsx", xlsx, xlsxFindings);
        assertEquals(joinView(expected), joinView(actual));
        assertTrue(joinView(actual).contains("01|counties|2017-01-01|REPORTED|67.0"), "text key keeps its zero; date is the period");
        assertTrue(joinView(actual).contains("06|doubled|2017-01-01|REPORTED|116.0"), "formula read by its cached value");
        // the same by position (sheet 2), the header found on row 4 below the merged title
        assertEquals(joinView(expected), joinView(read("counties.xlsx", xlsx.sheet("2"), new Findings())));
        List<String> notes = xlsxFindings.list().stream().map(f -> f.code() + " @ " + f.place()).toList();
        assertTrue(notes.contains("figures-title-rows-skipped @ sheet \"Counties\", rows 1-3"), notes.toString());
        assertTrue(notes.contains("figures-notes-skipped @ sheet \"Counties\", row 11"), notes.toString());
        // the only other findings are the NAME column's text, as in CSV (a wide table reads every column)
        assertEquals(csvFindings.list().size(), xlsxFindings.list().size() - 2);
    }

    @Test
    void headerRowCanBeSetAndMergedHeadingsAreResolved() throws IOException {
        try (OutputStream out = Files.newOutputStream(dir.resolve("merged.xlsx"))) {
            Workbook workbook = new Workbook(out, "aequa-test", "1.0");
            Worksheet ws = workbook.newWorksheet("Data");
            ws.value(0, 0, "code"); // a heading over two rows
            ws.range(0, 0, 1, 0).merge();
            ws.value(0, 1, "population"); // a heading over two columns, years below
            ws.range(0, 1, 0, 2).merge();
            ws.value(1, 1, "2020");
            ws.value(1, 2, "2021");
            ws.value(2, 0, "007");
            ws.value(2, 1, 1500);
            ws.value(2, 2, 1510.5);
            workbook.finish();
        }
        Findings findings = new Findings();
        FigureTable table = read("merged.xlsx", SourceSpecBuilder.file("merged.xlsx").key("code").headerRow(2), findings);
        assertEquals(List.of("007|2020||REPORTED|1500.0", "007|2021||REPORTED|1510.5"), joinView(table));
        // found automatically, the first row already names the key: the merged "population" fills both columns
        Findings auto = new Findings();
        read("merged.xlsx", SourceSpecBuilder.file("merged.xlsx").key("code"), auto);
        assertTrue(auto.list().stream().anyMatch(f -> f.code().equals("figures-column-duplicate")
                && f.message().contains("population")), auto.list().toString());
    }

    @Test
    void longLayoutReadsAsCsvDoes() throws IOException {
        try (OutputStream out = Files.newOutputStream(dir.resolve("long.xlsx"))) {
            Workbook workbook = new Workbook(out, "aequa-test", "1.0");
            Worksheet ws = workbook.newWorksheet("Long");
            String[] header = {"code", "indicator", "period", "value"};
            for (int c = 0; c < 4; c++) {
                ws.value(0, c, header[c]);
            }
            Object[][] rows = {{"01", "clinics", 2024, 12}, {"01", "clinics", 2025, "x"}, {"02", "clinics", 2024, 3.25}};
            for (int r = 0; r < rows.length; r++) {
                ws.value(r + 1, 0, (String) rows[r][0]);
                ws.value(r + 1, 1, (String) rows[r][1]);
                ws.value(r + 1, 2, (Integer) rows[r][2]);
                if (rows[r][3] instanceof Number n) {
                    ws.value(r + 1, 3, n);
                } else {
                    ws.value(r + 1, 3, (String) rows[r][3]);
                }
            }
            workbook.finish();
        }
        Files.writeString(dir.resolve("long.csv"), "code,indicator,period,value\n01,clinics,2024,12\n01,clinics,2025,x\n02,clinics,2024,3.25\n");
        SourceSpecBuilder csv = SourceSpecBuilder.file("long.csv").key("code").layout("long").periodColumn("period").suppressed("x");
        SourceSpecBuilder xlsx = SourceSpecBuilder.file("long.xlsx").key("code").layout("long").periodColumn("period").suppressed("x");
        Findings findings = new Findings();
        assertEquals(joinView(read("long.csv", csv, new Findings())), joinView(read("long.xlsx", xlsx, findings)));
        assertEquals(List.of(), findings.list());
    }

    @Test
    void problemsNameTheSheetRowAndAHint() throws IOException {
        writeCensusStyleWorkbook(dir.resolve("counties.xlsx"));
        Findings noSheet = new Findings();
        read("counties.xlsx", SourceSpecBuilder.file("counties.xlsx").key("GEOID").sheet("Figures"), noSheet);
        Finding missing = noSheet.list().get(0);
        assertEquals("figures-sheet-missing", missing.code());
        assertTrue(missing.message().contains("\"Contents\", \"Counties\""), missing.message());
        Findings noHeader = new Findings();
        read("counties.xlsx", SourceSpecBuilder.file("counties.xlsx").key("FIPS").sheet("Counties"), noHeader);
        assertEquals("figures-header-missing", noHeader.list().get(0).code());
        assertTrue(noHeader.list().get(0).hint().contains("header-row"));
        Files.writeString(dir.resolve("fake.xlsx"), "not a zip");
        Findings broken = new Findings();
        read("fake.xlsx", SourceSpecBuilder.file("fake.xlsx"), broken);
        assertEquals("figures-workbook-unreadable", broken.list().get(0).code());
    }
}
