package aequa.inputs.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Findings;

/**
 * Figures that would reach the map as garbage: infinity (a SQLite REAL can hold it), values so large that
 * the first sum overflows (1e308), and whole numbers beyond 2^53, which a double cannot hold exactly
 * (IEEE 754-2019, section 3.6: binary64 has p = 53). Each is kept as a malformed cell with its reason, which
 * the join reports wherever a map uses it; 2^53 - 1, the largest whole number below that, is still a number.
 */
class HostileValuesTest {

    @TempDir
    Path dir;

    private static FigureCell cell(FigureTable table, String indicator, String key) {
        return table.cells(indicator, "").stream().filter(c -> c.key().equals(key)).findFirst().orElseThrow();
    }

    @Test
    void hugeAndInfiniteTextValuesAreMalformed() throws IOException {
        Files.writeString(dir.resolve("f.csv"), "key,rate\nA,1e308\nB,-1e308\nC,9007199254740993\nD,9007199254740991\nE,1e400\n",
                StandardCharsets.UTF_8);
        Findings findings = new Findings();
        FigureTable table = FigureReaders.read(dir, SourceSpecBuilder.file("f.csv").build(), findings);
        assertEquals(0, findings.list().size(), findings.list().toString());
        for (String key : new String[] {"A", "B", "C", "E"}) {
            assertTrue(cell(table, "rate", key).malformed(), key);
            assertTrue(Double.isNaN(cell(table, "rate", key).value()), key);
        }
        assertTrue(cell(table, "rate", "A").problem().contains("2^53"), cell(table, "rate", "A").problem());
        assertEquals(9007199254740991.0, cell(table, "rate", "D").value(), "2^53 - 1 is still exact");
    }

    @Test
    void infiniteAndHugeDatabaseValuesAreMalformed() throws Exception {
        Path database = dir.resolve("f.sqlite");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + database); Statement s = c.createStatement()) {
            // SQLite reads a REAL literal too large for a double as infinity ("Datatypes In SQLite", section 3.2)
            s.execute("CREATE TABLE t (key TEXT, rate REAL, count INTEGER)");
            s.execute("INSERT INTO t VALUES ('A', 1e999, 9223372036854775807), ('B', -1e999, 12), ('C', 2.5, -9007199254740993)");
        }
        FigureTable table = FigureReaders.read(dir, SourceSpecBuilder.file("f.sqlite").build(), new Findings());
        assertTrue(cell(table, "rate", "A").malformed() && cell(table, "rate", "B").malformed());
        assertTrue(cell(table, "count", "A").malformed() && cell(table, "count", "C").malformed());
        assertEquals(2.5, cell(table, "rate", "C").value());
        assertEquals(12.0, cell(table, "count", "B").value());
    }
}
