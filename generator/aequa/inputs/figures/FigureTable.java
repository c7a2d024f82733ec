package aequa.inputs.figures;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SortedSet;
import java.util.TreeMap;
import java.util.TreeSet;

import aequa.project.KeyMatching;

/**
 * The figures of one statistics source, as cells keyed by region key, indicator and period, in source
 * order. Immutable. Duplicate keys are kept (the join reports them), and so are malformed cells.
 */
public final class FigureTable {

    private final String file;
    private final String tableName;
    private final KeyMatching keyMatching;
    private final List<FigureCell> cells;
    private final Map<String, Map<String, List<FigureCell>>> byIndicatorAndPeriod;

    /**
     * @param file        the source path as the user wrote it
     * @param tableName   where in the file the table is, as findings name it ({@code table "stats"} in a database,
     *                    {@code sheet "Data"} in a workbook); empty for a CSV file
     * @param keyMatching how the source's keys are to be matched to the geometry (from its settings)
     * @param cells       the cells in source order
     */
    public FigureTable(String file, String tableName, KeyMatching keyMatching, List<FigureCell> cells) {
        this.file = file;
        this.tableName = tableName;
        this.keyMatching = keyMatching;
        this.cells = List.copyOf(cells);
        Map<String, Map<String, List<FigureCell>>> index = new TreeMap<>();
        for (FigureCell cell : this.cells) {
            index.computeIfAbsent(cell.indicator(), i -> new TreeMap<>(PeriodOrder.OLDEST_FIRST))
                    .computeIfAbsent(cell.period(), p -> new ArrayList<>()).add(cell);
        }
        Map<String, Map<String, List<FigureCell>>> frozen = new LinkedHashMap<>();
        index.forEach((indicator, periods) -> {
            Map<String, List<FigureCell>> frozenPeriods = new LinkedHashMap<>();
            periods.forEach((period, list) -> frozenPeriods.put(period, List.copyOf(list)));
            frozen.put(indicator, Collections.unmodifiableMap(frozenPeriods));
        });
        this.byIndicatorAndPeriod = Collections.unmodifiableMap(frozen);
    }

    /** A table with no cells, for a source that could not be read (the reason is a finding). */
    public static FigureTable empty(String file, KeyMatching keyMatching) {
        return new FigureTable(file, "", keyMatching, List.of());
    }

    public String file() {
        return file;
    }

    public String tableName() {
        return tableName;
    }

    public KeyMatching keyMatching() {
        return keyMatching;
    }

    /** All cells, in source order. */
    public List<FigureCell> cells() {
        return cells;
    }

    /** The indicators, sorted. */
    public SortedSet<String> indicators() {
        return new TreeSet<>(byIndicatorAndPeriod.keySet());
    }

    public boolean hasIndicator(String indicator) {
        return byIndicatorAndPeriod.containsKey(indicator);
    }

    /** The periods with at least one cell of {@code indicator}, oldest first ({@link PeriodOrder}). */
    public List<String> periods(String indicator) {
        return List.copyOf(byIndicatorAndPeriod.getOrDefault(indicator, Map.of()).keySet());
    }

    /** The cells of one indicator and period, in source order; empty when there are none. */
    public List<FigureCell> cells(String indicator, String period) {
        return byIndicatorAndPeriod.getOrDefault(indicator, Map.of()).getOrDefault(period, List.of());
    }

    /** Where {@code cell} is, for a finding: {@code row 7, column "rate"}, prefixed by the table name if any. */
    public String place(FigureCell cell) {
        String rowAndColumn = "row " + cell.row() + ", column \"" + cell.column() + "\"";
        return tableName.isEmpty() ? rowAndColumn : tableName + ", " + rowAndColumn;
    }
}
