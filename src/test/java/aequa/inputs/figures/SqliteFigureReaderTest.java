package aequa.inputs.figures;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Findings;

/**
 * A real SQLite database file, written in the test through sqlite-jdbc, read back through a view whose
 * name needs quoting (SQLite documentation, "SQLite Keywords": a name in double quotes is an identifier,
 * and a double quote inside it is doubled).
 */
class SqliteFigureReaderTest {

    private static final String VIEW = "rates \"2021\" view";

    @TempDir
    Path dir;

    private Path database;

    @BeforeEach
    void createDatabase() throws SQLException {
        database = dir.resolve("stats.sqlite");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + database);
             Statement s = c.createStatement()) {
            s.executeUpdate("CREATE TABLE figures (code TEXT, year INTEGER, births INTEGER, rate REAL, note TEXT,"
                    + " people INTEGER, shape BLOB)");
            s.executeUpdate("INSERT INTO figures VALUES ('A', 2021, 12, 1.25, '7,5', 1000, x'00ff')");
            s.executeUpdate("INSERT INTO figures VALUES ('B', 2021, NULL, 2.5, 'x', 2000, NULL)");
            s.executeUpdate("INSERT INTO figures VALUES ('C', 2020, 3, 0.5, '', 500, NULL)");
            s.executeUpdate("INSERT INTO figures VALUES (7, 2021, 0, 0.0, '-', 10, NULL)");
            s.executeUpdate("CREATE VIEW \"rates \"\"2021\"\" view\" AS SELECT * FROM figures WHERE year = 2021");
        }
    }

    private FigureTable read(String table, Findings findings) {
        return FigureReaders.read(dir, SourceSpecBuilder.file("stats.sqlite").table(table).key("code")
                .periodColumn("year").decimal(",").suppressed("x").notApplicable("-").build(), findings);
    }

    private static FigureCell cell(FigureTable table, String indicator, String key) {
        return table.cells(indicator, "2021").stream().filter(c -> c.key().equals(key)).findFirst().orElseThrow();
    }

    @Test
    void readsAViewWithAQuotedName() throws IOException {
        byte[] before = Files.readAllBytes(database);
        Findings findings = new Findings();
        FigureTable table = read(VIEW, findings);
        assertEquals(List.of(), findings.list());
        assertEquals(List.of("2021"), table.periods("rate"), "the view keeps only 2021");
        assertEquals(12.0, cell(table, "births", "A").value(), "INTEGER taken as typed");
        assertEquals(1.25, cell(table, "rate", "A").value(), "REAL taken as typed, not through decimal ','");
        assertEquals(7.5, cell(table, "note", "A").value(), "TEXT read with the declared decimal comma");
        assertEquals(CellStatus.NO_DATA, cell(table, "births", "B").status(), "NULL is no data");
        assertEquals(CellStatus.SUPPRESSED, cell(table, "note", "B").status());
        assertEquals(CellStatus.NOT_APPLICABLE, cell(table, "note", "7").status(), "integer key read as text");
        assertEquals(CellStatus.REPORTED, cell(table, "births", "7").status());
        assertEquals(0.0, cell(table, "births", "7").value());
        assertTrue(cell(table, "shape", "A").malformed(), "a BLOB is not a figure");
        assertEquals("table \"" + VIEW + "\", row 1, column \"rate\"", table.place(cell(table, "rate", "A")));
        assertArrayEquals(before, Files.readAllBytes(database), "read-only: the file is unchanged");
    }

    @Test
    void tableNamesAreMatchedIgnoringCase() {
        Findings findings = new Findings();
        FigureTable table = read("FIGURES", findings);
        assertEquals(List.of(), findings.list());
        assertEquals(List.of("2020", "2021"), table.periods("rate"));
    }

    @Test
    void severalTablesNeedAName() {
        Findings findings = new Findings();
        FigureTable table = read("", findings);
        assertTrue(table.cells().isEmpty());
        assertEquals("figures-table-ambiguous", findings.list().get(0).code());
        assertTrue(findings.list().get(0).message().contains(VIEW));
    }

    @Test
    void unknownTableListsTheOthers() {
        Findings findings = new Findings();
        read("nope", findings);
        assertEquals("figures-table-missing", findings.list().get(0).code());
        assertTrue(findings.list().get(0).hint().contains("figures"));
    }

    @Test
    void aTextFileNamedSqliteIsNotADatabase() throws IOException {
        Files.writeString(dir.resolve("fake.gpkg"), "key,rate\n");
        Findings findings = new Findings();
        FigureReaders.read(dir, SourceSpecBuilder.file("fake.gpkg").build(), findings);
        assertEquals("figures-not-database", findings.list().get(0).code());
    }

    /** scaffold's sampler reads the first table by name, its columns in order and its values as the reader sees them. */
    @Test
    void scaffoldSamplesTheFirstTable() throws java.io.IOException {
        FigureColumns columns = FigureColumns.read(database).orElseThrow();
        assertEquals("figures", columns.table());
        assertEquals(java.util.List.of("code", "year", "births", "rate", "note", "people", "shape"),
                java.util.List.copyOf(columns.columns().keySet()));
        assertEquals(java.util.Arrays.asList("A", "B", "C", "7"), columns.columns().get("code"));
        assertEquals(java.util.Arrays.asList("12", null, "3", "0"), columns.columns().get("births"));
    }
}
