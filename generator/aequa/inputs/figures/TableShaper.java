package aequa.inputs.figures;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.IntStream;

import aequa.findings.Excerpt;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.TableLayout;

/**
 * Turns the rows of a source (CSV records or database result rows) into {@link FigureCell}s, for either
 * layout. Shared by the CSV and database readers so both treat keys, periods and markers alike.
 *
 * <p>Wide layout: every column other than the key and period columns is an indicator (text columns such
 * as names become malformed cells, harmless unless a map uses them). Long layout: each row is one cell,
 * named by the indicator column, holding the value column. Rows whose fields are all blank are skipped
 * silently; a row without a key (or without a period, when there is a period column) is skipped with a
 * warning; a row with more or fewer fields than the header is read as far as it goes, with a warning.
 */
final class TableShaper {

    /** How many column names a missing-column hint lists; our choice. */
    private static final int COLUMNS_SHOWN = 20;

    private final FigureSourceSettings settings;
    private final String tableName;
    private final List<String> columns;
    private final Findings findings;
    private final CellInterpreter interpreter;
    private final int keyIndex;
    private final int periodIndex;
    private final int indicatorIndex;
    private final int valueIndex;
    /** Wide layout: the columns that hold an indicator each (not key or period, named, first of their name). */
    private final int[] indicatorColumns;
    private final List<FigureCell> cells = new ArrayList<>();

    private TableShaper(FigureSourceSettings settings, String tableName, List<String> columns, int[] indexes,
                        Findings findings) {
        this.settings = settings;
        this.tableName = tableName;
        this.columns = List.copyOf(columns);
        this.findings = findings;
        this.interpreter = new CellInterpreter(settings);
        this.keyIndex = indexes[0];
        this.periodIndex = indexes[1];
        this.indicatorIndex = indexes[2];
        this.valueIndex = indexes[3];
        this.indicatorColumns = IntStream.range(0, this.columns.size())
                .filter(c -> c != keyIndex && c != periodIndex && !this.columns.get(c).isBlank()
                        && this.columns.indexOf(this.columns.get(c)) == c)
                .toArray();
    }

    /**
     * Checks the header and prepares to shape rows; empty (after error findings) when a column the layout
     * needs is absent.
     *
     * @param headerPlace where the header is, for findings ({@code row 1}, or {@code table "stats"})
     */
    static Optional<TableShaper> start(FigureSourceSettings settings, String tableName, List<String> columns,
                                       String headerPlace, Findings findings) {
        reportDuplicateColumns(settings, columns, headerPlace, findings);
        boolean ok = true;
        int key = find(settings, columns, settings.keyColumn(), "key", headerPlace, findings);
        ok &= key >= 0;
        int period = -1;
        if (!settings.periodColumn().isEmpty()) {
            period = find(settings, columns, settings.periodColumn(), "period-column", headerPlace, findings);
            ok &= period >= 0;
        }
        int indicator = -1;
        int value = -1;
        if (settings.layout() == TableLayout.LONG) {
            indicator = find(settings, columns, settings.indicatorColumn(), "indicator-column", headerPlace, findings);
            value = find(settings, columns, settings.valueColumn(), "value-column", headerPlace, findings);
            ok &= indicator >= 0 && value >= 0;
        }
        return ok ? Optional.of(new TableShaper(settings, tableName, columns, new int[] {key, period, indicator, value},
                findings)) : Optional.empty();
    }

    /** Shapes one row; {@code row} is the row number used in findings. */
    void accept(int row, List<SourceField> fields) {
        if (fields.stream().allMatch(f -> !f.typed() && CellInterpreter.trim(f.text()).isEmpty())) {
            return;
        }
        if (fields.size() != columns.size()) {
            findings.add(Finding.warning("figures-row-ragged", settings.file(), rowPlace(row),
                    "The row has " + fields.size() + " fields but the header has " + columns.size() + ".",
                    "Check for a missing or extra separator; missing fields are read as no data."));
        }
        String key = field(fields, keyIndex).text();
        if (CellInterpreter.trim(key).isEmpty()) {
            findings.add(Finding.warning("figures-key-empty", settings.file(), rowPlace(row),
                    "The row has no region key in column \"" + columns.get(keyIndex) + "\"; it is skipped.",
                    "Fill in the key or delete the row."));
            return;
        }
        String period = "";
        if (periodIndex >= 0) {
            period = CellInterpreter.trim(field(fields, periodIndex).text());
            if (period.isEmpty()) {
                findings.add(Finding.warning("figures-period-empty", settings.file(), rowPlace(row),
                        "The row has no period in column \"" + columns.get(periodIndex) + "\"; it is skipped.",
                        "Fill in the period or delete the row."));
                return;
            }
        }
        if (settings.layout() == TableLayout.LONG) {
            String indicator = CellInterpreter.trim(field(fields, indicatorIndex).text());
            if (indicator.isEmpty()) {
                findings.add(Finding.warning("figures-indicator-empty", settings.file(), rowPlace(row),
                        "The row names no indicator in column \"" + columns.get(indicatorIndex) + "\"; it is skipped.",
                        "Fill in the indicator or delete the row."));
                return;
            }
            addCell(key, indicator, period, row, valueIndex, fields);
            return;
        }
        for (int c : indicatorColumns) {
            addCell(key, columns.get(c), period, row, c, fields);
        }
    }

    FigureTable finish() {
        return new FigureTable(settings.file(), tableName, settings.keyMatching(), cells);
    }

    private void addCell(String key, String indicator, String period, int row, int column, List<SourceField> fields) {
        SourceField field = field(fields, column);
        CellInterpreter.Reading reading = interpreter.read(field);
        cells.add(new FigureCell(key, indicator, period, reading.status(), reading.value(), field.text(), row,
                columns.get(column), reading.problem()));
    }

    private static SourceField field(List<SourceField> fields, int index) {
        return index < fields.size() ? fields.get(index) : SourceField.text("");
    }

    private String rowPlace(int row) {
        return tableName.isEmpty() ? "row " + row : tableName + ", row " + row;
    }

    private static int find(FigureSourceSettings settings, List<String> columns, String wanted, String specKey,
                            String headerPlace, Findings findings) {
        int exact = columns.indexOf(wanted);
        if (exact >= 0) {
            return exact;
        }
        String near = columns.stream().filter(c -> CellInterpreter.trim(c).equalsIgnoreCase(CellInterpreter.trim(wanted)))
                .findFirst().map(c -> "Did you mean \"" + c + "\"? Column names must match exactly; set " + specKey
                        + ": in aequa.yaml.")
                .orElse("The columns are: " + quoteAll(columns) + "; set " + specKey + ": in aequa.yaml.");
        findings.add(Finding.error("figures-column-missing", settings.file(), headerPlace,
                "There is no column \"" + wanted + "\" (" + specKey + ").", near));
        return -1;
    }

    private static void reportDuplicateColumns(FigureSourceSettings settings, List<String> columns,
                                               String headerPlace, Findings findings) {
        Set<String> seen = new HashSet<>();
        Set<String> reported = new HashSet<>();
        for (String column : columns) {
            if (!column.isBlank() && !seen.add(column) && reported.add(column)) {
                findings.add(Finding.error("figures-column-duplicate", settings.file(), headerPlace,
                        "The column name \"" + column + "\" appears more than once.",
                        "Rename one of them; aequa reads the first one only."));
            }
        }
    }

    /** The column names as short excerpts (a header row may be any text), at most {@value #COLUMNS_SHOWN} of them. */
    private static String quoteAll(List<String> columns) {
        List<String> quoted = new ArrayList<>();
        columns.stream().limit(COLUMNS_SHOWN).forEach(c -> quoted.add("\"" + Excerpt.of(c) + "\""));
        String more = columns.size() > COLUMNS_SHOWN ? " and " + (columns.size() - COLUMNS_SHOWN) + " more" : "";
        return String.join(", ", quoted) + more;
    }
}
