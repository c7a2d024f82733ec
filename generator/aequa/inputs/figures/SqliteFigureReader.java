package aequa.inputs.figures;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.sqlite.SQLiteConfig;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.SqliteColumns;

/**
 * Reads a table or view of a SQLite database (a GeoPackage is one) through sqlite-jdbc, read-only.
 * INTEGER and REAL values are taken as typed; TEXT values are interpreted like CSV fields (markers,
 * declared decimal mark); NULL is no data; BLOB values (geometry columns) are malformed cells, harmless
 * unless a map uses them. Identifiers are quoted (SQLite documentation, "SQL As Understood By SQLite",
 * keywords: a double-quoted string is an identifier; a double quote inside is doubled).
 */
final class SqliteFigureReader {

    /** The first 16 bytes of every SQLite 3 database file (SQLite documentation, "Database File Format", 1.3). */
    private static final byte[] HEADER = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);

    private SqliteFigureReader() {
    }

    static FigureTable read(Path path, FigureSourceSettings settings, Findings findings) throws IOException {
        FigureTable empty = FigureTable.empty(settings.file(), settings.keyMatching());
        if (!hasSqliteHeader(path)) {
            findings.add(Finding.error("figures-not-database", settings.file(), "",
                    "The file is not a SQLite database (a GeoPackage is one).",
                    "Check the path, or use a .csv file extension for delimited text."));
            return empty;
        }
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(true);
        try (Connection connection = DriverManager.getConnection("jdbc:sqlite:" + path.toAbsolutePath(),
                config.toProperties())) {
            Optional<String> table = chooseTable(connection, settings, findings);
            if (table.isEmpty()) {
                return empty;
            }
            return readTable(connection, table.get(), settings, findings).orElse(empty);
        } catch (SQLException e) {
            findings.add(Finding.error("figures-database-unreadable", settings.file(), settings.table(),
                    "The database could not be read: " + e.getMessage() + ".",
                    "Check that the file is a complete, uncorrupted SQLite database."));
            return empty;
        }
    }

    private static Optional<FigureTable> readTable(Connection connection, String table,
                                                   FigureSourceSettings settings, Findings findings) throws SQLException {
        try (Statement statement = connection.createStatement();
             ResultSet rows = statement.executeQuery("SELECT * FROM " + SqliteColumns.quote(table))) {
            ResultSetMetaData meta = rows.getMetaData();
            List<String> columns = new ArrayList<>();
            for (int c = 1; c <= meta.getColumnCount(); c++) {
                columns.add(meta.getColumnLabel(c));
            }
            Optional<TableShaper> started = TableShaper.start(settings, "table \"" + table + "\"", columns, "table \"" + table + "\"",
                    findings);
            if (started.isEmpty()) {
                return Optional.empty();
            }
            int keyColumn = columns.indexOf(settings.keyColumn()) + 1;
            int row = 0;
            while (rows.next()) {
                row++;
                List<SourceField> fields = new ArrayList<>(columns.size());
                for (int c = 1; c <= columns.size(); c++) {
                    fields.add(c == keyColumn ? SourceField.text(rows.getString(c)) : field(rows.getObject(c)));
                }
                started.get().accept(row, fields);
            }
            return Optional.of(started.get().finish());
        }
    }

    private static SourceField field(Object value) {
        if (value instanceof Integer || value instanceof Long) {
            long whole = ((Number) value).longValue();
            return SourceField.number(whole, Long.toString(whole));
        }
        if (value instanceof Number) {
            double real = ((Number) value).doubleValue();
            return SourceField.number(real, Double.toString(real));
        }
        if (value instanceof byte[]) {
            return SourceField.text("(binary, " + ((byte[]) value).length + " bytes)");
        }
        return SourceField.text(value == null ? "" : value.toString());
    }

    /** The table or view named in the settings, or the only one in the file; empty after a finding. */
    private static Optional<String> chooseTable(Connection connection, FigureSourceSettings settings,
                                                Findings findings) throws SQLException {
        List<String> candidates = new ArrayList<>();
        try (PreparedStatement query = connection.prepareStatement(
                "SELECT name FROM sqlite_master WHERE type IN ('table', 'view') ORDER BY name")) {
            try (ResultSet names = query.executeQuery()) {
                while (names.next()) {
                    String name = names.getString(1);
                    if (!isInternal(name)) {
                        candidates.add(name);
                    }
                }
            }
        }
        if (settings.table().isEmpty()) {
            if (candidates.size() == 1) {
                return Optional.of(candidates.get(0));
            }
            findings.add(Finding.error("figures-table-ambiguous", settings.file(), "",
                    candidates.isEmpty() ? "The database has no table or view."
                            : "The database has several tables and views: " + String.join(", ", candidates) + ".",
                    "Name the one to read with table: in aequa.yaml."));
            return Optional.empty();
        }
        // SQLite compares identifiers ignoring ASCII case, so "Stats" names the table "stats".
        Optional<String> found = candidates.stream().filter(c -> c.equalsIgnoreCase(settings.table())).findFirst();
        if (found.isEmpty()) {
            findings.add(Finding.error("figures-table-missing", settings.file(), "",
                    "There is no table or view \"" + settings.table() + "\".",
                    candidates.isEmpty() ? "The database has no table or view."
                            : "The database has: " + String.join(", ", candidates) + "."));
        }
        return found;
    }

    /** SQLite's own tables, GeoPackage metadata tables and spatial index tables. */
    private static boolean isInternal(String name) {
        return name.startsWith("sqlite_") || name.startsWith("gpkg_") || name.startsWith("rtree_");
    }

    private static boolean hasSqliteHeader(Path path) throws IOException {
        try (InputStream in = Files.newInputStream(path)) {
            return Arrays.equals(in.readNBytes(HEADER.length), HEADER);
        }
    }
}
