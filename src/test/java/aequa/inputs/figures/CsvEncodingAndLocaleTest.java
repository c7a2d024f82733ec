package aequa.inputs.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Findings;
import aequa.project.FigureSourceSpec;

/** Encodings, separators, number conventions and status markers. */
class CsvEncodingAndLocaleTest {

    @TempDir
    Path dir;

    private FigureTable read(byte[] bytes, FigureSourceSpec spec, Findings findings) throws IOException {
        Files.write(dir.resolve(spec.file()), bytes);
        return FigureReaders.read(dir, spec, findings);
    }

    private static byte[] utf8(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    private static FigureCell cell(FigureTable table, String indicator, String key) {
        return table.cells(indicator, "").stream().filter(c -> c.key().equals(key)).findFirst().orElseThrow();
    }

    @Test
    void byteOrderMarkIsDropped() throws IOException {
        // The Unicode Standard, section 23.8: U+FEFF at the start of a UTF-8 stream is a signature
        // (encoded EF BB BF), not part of the text. Without dropping it the first column would be "\uFEFFkey".
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        bytes.write(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF});
        bytes.write(utf8("key,rate\nA,1.5\n"));
        Findings findings = new Findings();
        FigureTable table = read(bytes.toByteArray(), SourceSpecBuilder.file("bom.csv").build(), findings);
        assertEquals(List.of(), findings.list());
        assertEquals(1.5, cell(table, "rate", "A").value());
    }

    @Test
    void sameFileWithoutBomReadsAlike() throws IOException {
        FigureTable table = read(utf8("key,rate\nA,1.5\n"), SourceSpecBuilder.file("plain.csv").build(), new Findings());
        assertEquals(1.5, cell(table, "rate", "A").value());
    }

    @Test
    void latin1BytesAreReportedWithTheirOffset() throws IOException {
        // "key,name\nA,Sé\n" in ISO-8859-1: é is the single byte 0xE9 at offset 12 (byte 13 counting from 1),
        // which is not valid UTF-8 (RFC 3629, section 3: 0xE9 must start a three-byte sequence).
        byte[] latin1 = "key,name\nA,Sé\n".getBytes(StandardCharsets.ISO_8859_1);
        Findings findings = new Findings();
        read(latin1, SourceSpecBuilder.file("latin1.csv").build(), findings);
        assertEquals("figures-not-utf8", findings.list().get(0).code());
        assertEquals("byte 13", findings.list().get(0).place());
    }

    @Test
    void utf16IsRefused() throws IOException {
        // UTF-16LE signature FF FE (The Unicode Standard, section 23.8, table 23-6)
        Findings findings = new Findings();
        read(new byte[] {(byte) 0xFF, (byte) 0xFE, 'k', 0}, SourceSpecBuilder.file("u16.csv").build(), findings);
        assertEquals("figures-not-utf8", findings.list().get(0).code());
    }

    @Test
    void semicolonAndDecimalCommaDetected() throws IOException {
        // Common practice in several European locales: ';' separates fields because ',' is the decimal
        // mark, and '.' groups thousands. The separator is detected (delimiter left empty).
        String csv = "key;name;rate;people\nA;\"Nord; Ost\";12,5;1.234.567\nB;Süd;-0,25;999\n";
        Findings findings = new Findings();
        FigureTable table = read(utf8(csv), SourceSpecBuilder.file("eu.csv").decimal(",").thousands(".").build(),
                findings);
        assertEquals(List.of(), findings.list());
        assertEquals(12.5, cell(table, "rate", "A").value());
        assertEquals(1_234_567.0, cell(table, "people", "A").value());
        assertEquals(-0.25, cell(table, "rate", "B").value());
        assertEquals("Nord; Ost", cell(table, "name", "A").text());
    }

    @Test
    void tabSeparatedDetected() throws IOException {
        FigureTable table = read(utf8("key\trate\nA\t3\n"), SourceSpecBuilder.file("t.txt").build(), new Findings());
        assertEquals(3.0, cell(table, "rate", "A").value());
    }

    @Test
    void barSeparatedDetected() throws IOException {
        FigureTable table = read(utf8("key|name|rate\nA|\"x, y; z\"|4\n"), SourceSpecBuilder.file("b.csv").build(),
                new Findings());
        assertEquals(4.0, cell(table, "rate", "A").value());
        assertEquals("x, y; z", cell(table, "name", "A").text());
    }

    @Test
    void decimalCommaUndeclaredGivesAHint() throws IOException {
        // The issue's example: "12,5" read with the default decimal point.
        String csv = "key;rate\nA;12,5\n";
        FigureTable table = read(utf8(csv), SourceSpecBuilder.file("x.csv").build(), new Findings());
        FigureCell cell = cell(table, "rate", "A");
        assertEquals(CellStatus.NO_DATA, cell.status());
        assertTrue(cell.malformed());
        assertTrue(cell.problem().contains("decimal: \",\""), cell.problem());
        assertEquals("row 2, column \"rate\"", table.place(cell));
    }

    @Test
    void markersKeepStatusesApart() throws IOException {
        String csv = "key,rate\nA,0\nB,\nC,NA\nD,x\nE,-\nF,..\n";
        FigureSourceSpec spec = SourceSpecBuilder.file("m.csv").suppressed("x").notApplicable("-").build();
        Findings findings = new Findings();
        FigureTable table = read(utf8(csv), spec, findings);
        assertEquals(CellStatus.REPORTED, cell(table, "rate", "A").status());
        assertEquals(0.0, cell(table, "rate", "A").value());
        assertEquals(CellStatus.NO_DATA, cell(table, "rate", "B").status());
        assertEquals(CellStatus.NO_DATA, cell(table, "rate", "C").status());
        assertEquals(CellStatus.SUPPRESSED, cell(table, "rate", "D").status());
        assertEquals(CellStatus.NOT_APPLICABLE, cell(table, "rate", "E").status());
        assertEquals(CellStatus.NO_DATA, cell(table, "rate", "F").status());
        assertTrue(table.cells().stream().noneMatch(FigureCell::malformed));
        assertEquals(List.of(), findings.list());
    }

    @Test
    void longLayoutWithPeriods() throws IOException {
        String csv = "code,year,what,figure\nA,2020,rate,1\nA,2021,rate,2\nA,2021,people,100\nB,2021,rate,..\n";
        FigureSourceSpec spec = SourceSpecBuilder.file("long.csv").key("code").layout("long").periodColumn("year")
                .indicatorColumn("what").valueColumn("figure").build();
        Findings findings = new Findings();
        FigureTable table = read(utf8(csv), spec, findings);
        assertEquals(List.of(), findings.list());
        assertEquals(List.of("2020", "2021"), table.periods("rate"));
        assertEquals(List.of("2021"), table.periods("people"));
        assertEquals(2, table.cells("rate", "2021").size());
        assertEquals(100.0, table.cells("people", "2021").get(0).value());
        assertEquals("figure", table.cells("people", "2021").get(0).column());
    }

    @Test
    void unknownSettingsAreReportedOnTheProjectFile() throws IOException {
        Findings findings = new Findings();
        read(utf8("key,rate\nA,1\n"), SourceSpecBuilder.file("s.csv").delimiter("/")
                .decimal(",").thousands(",").build(), findings);
        List<String> codes = findings.list().stream().map(f -> f.code() + "@" + f.file() + ":" + f.place()).toList();
        // the layout's words are read with the project file (aequa.project.ConfigWordsTest)
        assertEquals(List.of("project-unknown-value@aequa.yaml:figures \"s.csv\", delimiter",
                "project-conflicting-setting@aequa.yaml:figures \"s.csv\", thousands"), codes);
    }

    @Test
    void aMarkerDeclaredTwiceIsAConflict() throws IOException {
        Findings findings = new Findings();
        FigureTable table = read(utf8("key,rate\nA,x\n"), SourceSpecBuilder.file("c.csv").missing("x").suppressed("x")
                .build(), findings);
        assertEquals("project-conflicting-setting", findings.list().get(0).code());
        assertEquals(CellStatus.SUPPRESSED, cell(table, "rate", "A").status(), "the first declaration stands");
    }

    @Test
    void aFileThatIsGoneIsAnInputErrorAndAnUnknownTypeAProgrammingError() {
        // the project file's checks report both first, with their line (SourceVocabularyTest); a file removed
        // between those checks and the read is an I/O failure, and a reader never sees a type it does not read
        Findings findings = new Findings();
        assertThrows(UncheckedIOException.class, () -> FigureReaders.read(dir, SourceSpecBuilder.file("nope.csv").build(), findings));
        assertThrows(IllegalArgumentException.class,
                () -> FigureReaders.read(dir, SourceSpecBuilder.file("figures.ods").build(), findings)); // OpenDocument: not read
        assertEquals(List.of(), findings.list());
    }
}
