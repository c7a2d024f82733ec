package aequa.inputs.figures;

import java.util.Objects;


/**
 * What a statistics source says for one region key, indicator and period, with where it says it.
 *
 * @param key       the region key exactly as in the source (not trimmed: exact matching is exact)
 * @param indicator the indicator: the column name (wide layout) or the indicator cell (long layout)
 * @param period    the period, trimmed; empty when the source has no period column
 * @param status    reported, no data, suppressed or not applicable; a malformed text is NO_DATA
 * @param value     the figure; NaN unless {@code status} is REPORTED
 * @param text      the field as written in the source (for a database number, the number written out)
 * @param row       the row: in a CSV file the record number counting the header as row 1, as a
 *                  spreadsheet shows it; in a database table the result row counting from 1
 * @param column    the column the field came from
 * @param problem   empty, or (for a text that is neither a number nor a declared marker) one sentence on
 *                  how to make it readable, for example about the decimal setting
 */
public record FigureCell(String key, String indicator, String period, CellStatus status, double value,
                         String text, int row, String column, String problem) {

    public FigureCell {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(indicator, "indicator");
        Objects.requireNonNull(period, "period");
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(column, "column");
        Objects.requireNonNull(problem, "problem");
    }

    /** True when the text is neither a number nor a declared marker. */
    public boolean malformed() {
        return !problem.isEmpty();
    }
}
