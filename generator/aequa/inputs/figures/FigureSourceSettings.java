package aequa.inputs.figures;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.ConfigWord;
import aequa.project.FigureSourceSpec;
import aequa.project.KeyMatching;
import aequa.project.ProjectFile;
import aequa.project.TableLayout;

/**
 * A {@link FigureSourceSpec} with its words parsed once into enums and checked for contradictions.
 *
 * @param file            the source path as the user wrote it (used in every finding about the source)
 * @param table           table or view name in a database file; empty to take the only one
 * @param keyColumn       the column holding the region key
 * @param layout          wide or long
 * @param indicatorColumn long layout: the column naming the indicator
 * @param periodColumn    the column naming the period; empty when the source has a single period
 * @param valueColumn     long layout: the column holding the figure
 * @param separator       the CSV field separator, or {@link FieldSeparator#AUTO}
 * @param decimal         the decimal mark of numbers written as text
 * @param thousands       the thousands separator of numbers written as text; empty for none
 * @param markers         cell texts (compared after trimming whitespace) and the status each stands for
 * @param keyMatching     exact, or relaxed (opt-in)
 * @param sheet           workbooks: the sheet's name or 1-based position; empty for the first sheet
 * @param headerRow       workbooks: the 1-based row holding the column names, or 0 to find it
 */
public record FigureSourceSettings(String file, String table, String keyColumn, TableLayout layout,
                                   String indicatorColumn, String periodColumn, String valueColumn,
                                   FieldSeparator separator, DecimalMark decimal, String thousands,
                                   Map<String, CellStatus> markers, KeyMatching keyMatching, String sheet,
                                   int headerRow) {

    /** Thousands separators we accept: comma, point, apostrophe, space, no-break space, narrow no-break space. */
    static final Set<String> THOUSANDS_SEPARATORS = Set.of("", ",", ".", "'", " ", "\u00A0", "\u202F");

    public FigureSourceSettings {
        markers = Map.copyOf(markers);
    }

    /**
     * Parses {@code spec}; every unknown word or contradiction is an error finding on the project file,
     * and the setting falls back to its default so that reading can go on and report more.
     */
    public static FigureSourceSettings parse(FigureSourceSpec spec, Findings findings) {
        String where = "figures \"" + spec.file() + "\", ";
        TableLayout layout = spec.layout();
        KeyMatching keyMatching = spec.keyMatching();
        FieldSeparator separator = parseSeparator(spec.delimiter(), where + "delimiter", findings);
        DecimalMark decimal = parseDecimal(spec.decimal(), where + "decimal", findings);
        String thousands = spec.thousands();
        if (!THOUSANDS_SEPARATORS.contains(thousands)) {
            findings.add(Finding.error("project-unknown-value", ProjectFile.FILE_NAME, where + "thousands",
                    "Unknown thousands separator \"" + thousands + "\".",
                    "Use one of \",\", \".\", \"'\", a space, or leave it empty."));
            thousands = "";
        } else if (thousands.equals(String.valueOf(decimal.character()))) {
            findings.add(Finding.error("project-conflicting-setting", ProjectFile.FILE_NAME, where + "thousands",
                    "The thousands separator is the same as the decimal mark \"" + thousands + "\".",
                    "Numbers would be ambiguous; change one of the two."));
            thousands = "";
        }
        Map<String, CellStatus> markers = new LinkedHashMap<>();
        addMarkers(markers, spec.suppressed(), CellStatus.SUPPRESSED, where, findings);
        addMarkers(markers, spec.notApplicable(), CellStatus.NOT_APPLICABLE, where, findings);
        addMarkers(markers, spec.missing(), CellStatus.NO_DATA, where, findings);
        return new FigureSourceSettings(spec.file(), spec.table(), spec.key(), layout, spec.indicatorColumn(),
                spec.periodColumn(), spec.valueColumn(), separator, decimal, thousands, markers, keyMatching,
                spec.sheet(), headerRow(spec, where, findings));
    }

    private static int headerRow(FigureSourceSpec spec, String where, Findings findings) {
        Integer row = spec.headerRow();
        if (row == null) {
            return 0;
        }
        if (row < 1) {
            findings.add(Finding.error("project-bad-value", ProjectFile.FILE_NAME, where + "header-row",
                    "The header row " + row + " is not a row number.",
                    "Count rows from 1, as the spreadsheet shows them, or leave 'header-row' out to find the header."));
            return 0;
        }
        return row;
    }

    private static FieldSeparator parseSeparator(String text, String place, Findings findings) {
        switch (text) {
            case "":
                return FieldSeparator.AUTO;
            case ",":
                return FieldSeparator.COMMA;
            case ";":
                return FieldSeparator.SEMICOLON;
            case "\t":
            case "\\t":
            case "tab":
                return FieldSeparator.TAB;
            case "|":
                return FieldSeparator.PIPE;
            default:
                findings.add(Finding.error("project-unknown-value", ProjectFile.FILE_NAME, place,
                        "Unknown field separator \"" + text + "\".",
                        "Use \",\", \";\", \"|\" or \"\\t\" (tab), or leave it empty to detect it."));
                return FieldSeparator.AUTO;
        }
    }

    private static DecimalMark parseDecimal(String text, String place, Findings findings) {
        if (text.equals(".")) {
            return DecimalMark.POINT;
        }
        if (text.equals(",")) {
            return DecimalMark.COMMA;
        }
        findings.add(Finding.error("project-unknown-value", ProjectFile.FILE_NAME, place,
                "Unknown decimal mark \"" + text + "\".", "Use \".\" or \",\"."));
        return DecimalMark.POINT;
    }

    private static void addMarkers(Map<String, CellStatus> markers, List<String> texts, CellStatus status,
                                   String where, Findings findings) {
        for (String raw : texts) {
            String text = CellInterpreter.trim(raw);
            CellStatus earlier = markers.putIfAbsent(text, status);
            if (earlier != null && earlier != status) {
                findings.add(Finding.error("project-conflicting-setting", ProjectFile.FILE_NAME,
                        where + specKey(status),
                        "The marker \"" + text + "\" is declared both as " + describe(earlier) + " and as "
                                + describe(status) + ".",
                        "Keep it in one list only; aequa keeps it as " + describe(earlier) + "."));
            }
        }
    }

    private static String specKey(CellStatus status) {
        return status == CellStatus.NO_DATA ? "missing" : ConfigWord.kebab(status);
    }

    static String describe(CellStatus status) {
        switch (status) {
            case SUPPRESSED:
                return "suppressed";
            case NOT_APPLICABLE:
                return "not applicable";
            case NO_DATA:
                return "missing";
            default:
                return "reported";
        }
    }
}
