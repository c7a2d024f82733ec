package aequa.inputs.figures;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.regex.Pattern;

import org.dhatim.fastexcel.reader.Cell;
import org.dhatim.fastexcel.reader.CellType;

/**
 * Reads one workbook cell as aequa needs it, honouring its type: text stays text (leading zeros kept), numbers
 * stay numbers, a formula gives its cached value (the value the spreadsheet last computed, stored beside the
 * formula), and a number shown with a date format is a date, written as an ISO 8601 day ({@code 2024-03-31})
 * so that it can name a period.
 */
final class WorkbookCells {

    /** Number formats built into the format (ECMA-376 Part 1, section 18.8.30): 14-17 and 22 show dates. */
    private static final Pattern BUILT_IN_DATE_IDS = Pattern.compile("1[4-7]|22");
    /** Quoted text, bracketed sections ([Red], [$-409]) and escaped characters carry no date letters. */
    private static final Pattern NOT_A_CODE = Pattern.compile("\"[^\"]*\"|\\[[^\\]]*]|\\\\.|_.|\\*.");

    private final boolean date1904;

    /** @param date1904 whether the workbook counts days from 1904 (ECMA-376 Part 1, section 18.17.4.1) */
    WorkbookCells(boolean date1904) {
        this.date1904 = date1904;
    }

    /** The cell as text: what a key, a period or a column name is read from; empty for an empty cell. */
    String text(Cell cell) {
        if (cell == null) {
            return "";
        }
        BigDecimal number = number(cell);
        if (number != null) {
            return isDate(cell) ? day(number).toString() : number.stripTrailingZeros().toPlainString();
        }
        String raw = cell.getType() == CellType.FORMULA ? cell.getRawValue() : cell.getText();
        return raw == null ? "" : raw;
    }

    /** The cell as a figure: a typed number, or text for the readers' markers and number parsing. */
    SourceField field(Cell cell) {
        BigDecimal number = cell == null ? null : number(cell);
        if (number != null && !isDate(cell)) {
            return SourceField.number(number.doubleValue(), text(cell));
        }
        return SourceField.text(text(cell));
    }

    /** The cell's number, its cached value for a formula; null when it holds no number. */
    private static BigDecimal number(Cell cell) {
        if (cell.getType() == CellType.NUMBER) {
            return cell.asNumber();
        }
        if (cell.getType() == CellType.FORMULA && cell.getRawValue() != null) {
            try {
                return new BigDecimal(cell.getRawValue().trim());
            } catch (NumberFormatException e) {
                return null;
            }
        }
        return null;
    }

    private static boolean isDate(Cell cell) {
        Integer id = cell.getDataFormatId();
        if (id != null && BUILT_IN_DATE_IDS.matcher(id.toString()).matches()) {
            return true;
        }
        String format = cell.getDataFormatString();
        if (format == null || format.equalsIgnoreCase("General")) {
            return false;
        }
        String code = NOT_A_CODE.matcher(format).replaceAll("").toLowerCase(java.util.Locale.ROOT);
        return code.indexOf('y') >= 0 || code.indexOf('d') >= 0;
    }

    /**
     * A date serial as a day: days since 1899-12-30 in the 1900 system (which places the serial 60 on a
     * 29 February 1900 that did not exist, a known quirk kept by ECMA-376 Part 1, section 18.17.4.1, so serials
     * from 61 on are right), or since 1904-01-01 in the 1904 system.
     */
    private LocalDate day(BigDecimal serial) {
        long days = serial.setScale(0, java.math.RoundingMode.FLOOR).longValueExact();
        return date1904 ? LocalDate.of(1904, 1, 1).plusDays(days) : LocalDate.of(1899, 12, 30).plusDays(days);
    }
}
