package aequa.inputs;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.sqlite.SQLiteConfig;

/**
 * The columns of one table of a SQLite file (a GeoPackage is one) and their values as text, row by row in
 * rowid order, for guessing which column is the key. Read-only; the whole table is held in memory, which
 * suits statistics tables and boundary attributes of a few tens of MB. Shared by the region and figure
 * samplers, which may not use each other.
 */
public final class SqliteColumns {

    private SqliteColumns() {
    }

    /**
     * The first name, in the order the query returns them, of {@code namesQuery}'s first column; empty when
     * it returns none.
     */
    public static Optional<String> firstName(Path file, String namesQuery) throws IOException {
        try (Connection connection = open(file); Statement s = connection.createStatement();
             ResultSet rs = s.executeQuery(namesQuery)) {
            return rs.next() ? Optional.of(rs.getString(1)) : Optional.empty();
        } catch (SQLException e) {
            throw new IOException(file.getFileName() + " cannot be read as SQLite: " + e.getMessage(), e);
        }
    }

    /** Every column of {@code table} but those in {@code skipped}, with its values as text (null stays null). */
    public static Map<String, List<String>> read(Path file, String table, Set<String> skipped) throws IOException {
        try (Connection connection = open(file); Statement s = connection.createStatement();
             ResultSet rs = s.executeQuery("SELECT * FROM " + quote(table) + " ORDER BY rowid")) {
            int count = rs.getMetaData().getColumnCount();
            Map<String, List<String>> columns = new LinkedHashMap<>();
            List<Integer> kept = new ArrayList<>();
            for (int i = 1; i <= count; i++) {
                String name = rs.getMetaData().getColumnName(i);
                if (!skipped.contains(name)) {
                    columns.put(name, new ArrayList<>());
                    kept.add(i);
                }
            }
            while (rs.next()) {
                for (int i : kept) {
                    columns.get(rs.getMetaData().getColumnName(i)).add(rs.getString(i));
                }
            }
            return columns;
        } catch (SQLException e) {
            throw new IOException(file.getFileName() + " cannot be read as SQLite: " + e.getMessage(), e);
        }
    }

    private static Connection open(Path file) throws SQLException {
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(true);
        return DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath(), config.toProperties());
    }

    /** SQL identifier quoting (SQLite: double quotes, embedded quotes doubled), for every SQLite reader. */
    public static String quote(String identifier) {
        return "\"" + identifier.replace("\"", "\"\"") + "\"";
    }
}
