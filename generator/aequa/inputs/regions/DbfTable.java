package aequa.inputs.regions;

import java.io.ByteArrayInputStream;
import java.math.BigDecimal;
import java.nio.charset.Charset;
import java.text.SimpleDateFormat;
import java.util.ArrayList;
import java.util.Date;
import java.util.List;
import java.util.Locale;
import java.util.TimeZone;

import com.linuxense.javadbf.DBFException;
import com.linuxense.javadbf.DBFReader;

/**
 * The attribute table of a Shapefile (a dBASE file, {@code .dbf}), read record by record through javadbf, the
 * well-kept DBF library aequa uses for this format. Values come back as text as a user would read them in the
 * table: character fields as stored (trailing blanks removed, leading zeros kept), numbers without exponent or
 * added zeros, dates as ISO 8601 days. Deleted records are read too, so that record n stays the attributes of
 * shape n (the Technical Description pairs them one to one, by order).
 */
final class DbfTable implements AutoCloseable {

    /** The table cannot be read at some record. */
    static final class MalformedDbf extends Exception {
        private static final long serialVersionUID = 1L;

        MalformedDbf(String message, Throwable cause) {
            super(message, cause);
        }
    }

    private final DBFReader reader;
    private final List<String> fieldNames;
    private int recordsRead;

    private DbfTable(DBFReader reader, List<String> fieldNames) {
        this.reader = reader;
        this.fieldNames = fieldNames;
    }

    static DbfTable open(byte[] dbf, Charset charset) throws MalformedDbf {
        try {
            DBFReader reader = new DBFReader(new ByteArrayInputStream(dbf), charset, true);
            List<String> names = new ArrayList<>(reader.getFieldCount());
            for (int f = 0; f < reader.getFieldCount(); f++) {
                names.add(reader.getField(f).getName());
            }
            return new DbfTable(reader, List.copyOf(names));
        } catch (DBFException e) {
            throw new MalformedDbf(e.getMessage(), e);
        }
    }

    List<String> fieldNames() {
        return fieldNames;
    }

    /** The record count the header declares (dBASE header bytes 4-7); javadbf does not stop there by itself. */
    int declaredRecords() {
        return reader.getRecordCount();
    }

    /**
     * @return the next record's values as text, one per field (null for an empty value), or null after the
     *         last record the header declares
     * @throws MalformedDbf when the file ends before the declared count of records
     */
    String[] next() throws MalformedDbf {
        if (recordsRead >= reader.getRecordCount()) {
            return null;
        }
        Object[] values;
        try {
            values = reader.nextRecord();
        } catch (DBFException e) {
            values = null;
        }
        if (values == null) {
            throw new MalformedDbf("the file ends at record " + (recordsRead + 1) + " of the " + reader.getRecordCount()
                    + " its header declares", null);
        }
        recordsRead++;
        // with deleted records shown, javadbf may put the deletion flag before the fields: take the last ones
        int offset = values.length - fieldNames.size();
        String[] texts = new String[fieldNames.size()];
        for (int i = 0; i < texts.length; i++) {
            texts[i] = text(values[offset + i]);
        }
        return texts;
    }

    private static String text(Object value) {
        if (value == null) {
            return null;
        }
        if (value instanceof BigDecimal number) {
            return number.toPlainString();
        }
        if (value instanceof Date date) {
            SimpleDateFormat iso = new SimpleDateFormat("yyyy-MM-dd", Locale.ROOT);
            iso.setTimeZone(TimeZone.getDefault()); // javadbf builds dates in the default zone
            return iso.format(date);
        }
        String text = value.toString();
        return text.isEmpty() ? null : text;
    }

    @Override
    public void close() {
        reader.close();
    }
}
