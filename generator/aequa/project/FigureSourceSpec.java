package aequa.project;

import java.util.List;

/**
 * A statistics source: a CSV file, a table or view in a SQLite/GeoPackage file, or a sheet of a workbook.
 *
 * @param file            path relative to the project folder ({@code .csv}, {@code .tsv}, {@code .sqlite}, {@code .gpkg}, {@code .xlsx})
 * @param table           table or view name, for database files
 * @param key             column holding the region key
 * @param layout          {@code wide} (a column per indicator) or {@code long} (key, indicator, period, value rows)
 * @param indicatorColumn long layout: the column naming the indicator
 * @param periodColumn    the column naming the period the figure refers to, or empty for a single period
 * @param valueColumn     long layout: the column holding the value
 * @param delimiter       CSV field separator: {@code ","}, {@code ";"} or {@code "\t"}; empty to detect
 * @param decimal         the decimal mark, {@code "."} or {@code ","}
 * @param thousands       the thousands separator, or empty for none
 * @param missing         cell texts that mean "no data"
 * @param suppressed      cell texts that mean "withheld", for example for confidentiality
 * @param notApplicable   cell texts that mean "not applicable"
 * @param keyMatching     {@code exact} or {@code relaxed} (opt-in: case, whitespace and leading zeros ignored)
 * @param sheet           workbooks ({@code .xlsx}): the sheet's name, or its position counted from 1; empty for the first
 * @param headerRow       workbooks: the row (counted from 1, as the spreadsheet shows it) holding the column names;
 *                        null to find it (the first row naming the key column, and the columns the layout needs)
 */
public record FigureSourceSpec(String file, String table, String key, TableLayout layout, String indicatorColumn,
                               String periodColumn, String valueColumn, String delimiter, String decimal,
                               String thousands, List<String> missing, List<String> suppressed,
                               List<String> notApplicable, KeyMatching keyMatching, String sheet, Integer headerRow) {

    /** The file name endings read as delimited text, lower case: the one list the checks and the readers share. */
    public static final List<String> TEXT_TYPES = List.of(".csv", ".tsv", ".txt");
    /** The file name endings read as workbooks. */
    public static final List<String> WORKBOOK_TYPES = List.of(".xlsx", ".xlsm");
    /** The file name endings read as SQLite databases (a GeoPackage is one). */
    public static final List<String> DATABASE_TYPES = List.of(".sqlite", ".sqlite3", ".db", ".gpkg");
    /** Every file name ending a statistics source may have. */
    public static final List<String> FILE_TYPES = List.of(".csv", ".tsv", ".txt", ".xlsx", ".xlsm", ".sqlite", ".sqlite3", ".db", ".gpkg");

    public FigureSourceSpec {
        table = table == null ? "" : table;
        key = key == null ? "key" : key;
        layout = layout == null ? TableLayout.WIDE : layout;
        indicatorColumn = indicatorColumn == null ? "indicator" : indicatorColumn;
        periodColumn = periodColumn == null ? "" : periodColumn;
        valueColumn = valueColumn == null ? "value" : valueColumn;
        delimiter = delimiter == null ? "" : delimiter;
        decimal = decimal == null ? "." : decimal;
        thousands = thousands == null ? "" : thousands;
        missing = missing == null ? List.of("", "NA", "..") : List.copyOf(missing);
        suppressed = suppressed == null ? List.of() : List.copyOf(suppressed);
        notApplicable = notApplicable == null ? List.of() : List.copyOf(notApplicable);
        keyMatching = keyMatching == null ? KeyMatching.EXACT : keyMatching;
        sheet = sheet == null ? "" : sheet;
    }

    /** A source that is not a workbook. */
    public FigureSourceSpec(String file, String table, String key, TableLayout layout, String indicatorColumn,
                            String periodColumn, String valueColumn, String delimiter, String decimal,
                            String thousands, List<String> missing, List<String> suppressed,
                            List<String> notApplicable, KeyMatching keyMatching) {
        this(file, table, key, layout, indicatorColumn, periodColumn, valueColumn, delimiter, decimal, thousands,
                missing, suppressed, notApplicable, keyMatching, "", null);
    }
}
