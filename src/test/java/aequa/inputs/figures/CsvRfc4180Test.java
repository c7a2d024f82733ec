package aequa.inputs.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * The rules of RFC 4180 ("Common Format and MIME Type for Comma-Separated Values (CSV) Files", 2005),
 * section 2, each read through the front door. Rule numbers are the RFC's.
 */
class CsvRfc4180Test {

    @TempDir
    Path dir;

    private FigureTable read(String csv, Findings findings) throws IOException {
        Files.writeString(dir.resolve("t.csv"), csv, StandardCharsets.UTF_8);
        return FigureReaders.read(dir, SourceSpecBuilder.file("t.csv").delimiter(",").build(), findings);
    }

    private static FigureCell only(FigureTable table, String indicator, String key) {
        List<FigureCell> cells = table.cells(indicator, "").stream().filter(c -> c.key().equals(key)).toList();
        assertEquals(1, cells.size(), "cells of " + key + "/" + indicator);
        return cells.get(0);
    }

    @Test
    void rule1_recordsEndWithCrlf() throws IOException {
        // RFC 4180 2.1: "aaa,bbb,ccc CRLF zzz,yyy,xxx CRLF"
        Findings findings = new Findings();
        FigureTable table = read("key,a,b\r\naaa,1,2\r\nzzz,3,4\r\n", findings);
        assertEquals(List.of(), findings.list());
        assertEquals(3.0, only(table, "a", "zzz").value());
        assertEquals("4", only(table, "b", "zzz").text(), "no CR left in the last field");
    }

    @Test
    void rule2_lastRecordWithoutLineBreak() throws IOException {
        // RFC 4180 2.2: "aaa,bbb,ccc CRLF zzz,yyy,xxx" (no break at the end)
        Findings findings = new Findings();
        FigureTable table = read("key,a\r\naaa,1\r\nzzz,2", findings);
        assertEquals(2.0, only(table, "a", "zzz").value());
        assertEquals(List.of(), findings.list());
    }

    @Test
    void rule3_headerNamesTheColumns() throws IOException {
        // RFC 4180 2.3: the first line may be a header with the same format; aequa requires it
        Findings findings = new Findings();
        FigureTable table = read("field_name,field_name2\r\naaa,5\r\n", findings);
        assertTrue(table.cells().isEmpty(), "no key column 'key' in this header");
        assertEquals("figures-column-missing", findings.list().get(0).code());
        assertEquals("row 1", findings.list().get(0).place());
    }

    @Test
    void rule4_spacesArePartOfAField() throws IOException {
        // RFC 4180 2.4: "Spaces are considered part of a field and should not be ignored."
        FigureTable table = read("key,a\r\n aaa , 7 \r\n", new Findings());
        FigureCell cell = only(table, "a", " aaa ");
        assertEquals(" 7 ", cell.text());
        assertEquals(7.0, cell.value(), "numbers are read after trimming");
    }

    @Test
    void rule5_fieldsMayBeQuoted() throws IOException {
        // RFC 4180 2.5: "aaa","bbb","ccc" CRLF zzz,yyy,xxx
        FigureTable table = read("\"key\",\"a\"\r\n\"aaa\",\"12\"\r\nzzz,13\r\n", new Findings());
        assertEquals(12.0, only(table, "a", "aaa").value());
        assertEquals(13.0, only(table, "a", "zzz").value());
    }

    @Test
    void rule6_quotedFieldsHoldLineBreaksAndSeparators() throws IOException {
        // RFC 4180 2.6: "aaa","b CRLF bb","ccc" and a comma inside quotes
        Findings findings = new Findings();
        FigureTable table = read("key,name,a\r\naaa,\"b\r\nbb\",1\r\nzzz,\"x, y\",2\r\n", findings);
        assertEquals("b\r\nbb", only(table, "name", "aaa").text());
        assertEquals("x, y", only(table, "name", "zzz").text());
        assertEquals(2.0, only(table, "a", "zzz").value());
        // rows count records as a spreadsheet does, not physical lines: zzz is the third record
        assertEquals(3, only(table, "a", "zzz").row());
        assertEquals(List.of(), findings.list());
    }

    @Test
    void rule7_doubledQuoteInsideQuotedField() throws IOException {
        // RFC 4180 2.7: "aaa","b""bb","ccc"
        FigureTable table = read("key,name\r\n\"aaa\",\"b\"\"bb\"\r\n", new Findings());
        assertEquals("b\"bb", only(table, "name", "aaa").text());
    }

    @Test
    void quoteInsideAField_reportedWithItsLine() throws IOException {
        // RFC 4180 2.5: "If fields are not enclosed with double quotes, then double quotes may not appear
        // inside the fields"; a quoted field followed by more text breaks rule 7.
        Findings findings = new Findings();
        read("key,a\nA,1\nB,\"2\"x\n", findings);
        Finding finding = findings.list().get(0);
        assertEquals("figures-csv-malformed", finding.code());
        assertTrue(finding.place().startsWith("line 3"), finding.place());
    }

    @Test
    void raggedRowIsReadWithAWarning() throws IOException {
        // RFC 4180 2.4: "Each line should contain the same number of fields throughout the file."
        Findings findings = new Findings();
        FigureTable table = read("key,a,b\nA,1\n", findings);
        assertEquals("figures-row-ragged", findings.list().get(0).code());
        assertEquals("row 2", findings.list().get(0).place());
        assertEquals(CellStatus.NO_DATA, only(table, "b", "A").status());
    }
}
