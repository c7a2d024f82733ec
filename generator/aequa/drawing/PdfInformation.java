package aequa.drawing;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Rewrites the document information dictionary JFreePDF writes: the clock dates become one fixed instant in
 * UTC, so a PDF depends on neither the clock, the time zone nor the locale of the machine; and the title is
 * added as a Unicode text string, so "km²" or any script survives and any bracket or backslash in it stays
 * text. The title must not be given to JFreePDF: 2.0 writes it as a literal string without escaping
 * {@code (}, {@code )} or {@code \} (ISO 32000-1, section 7.3.4.2 requires unbalanced ones to be escaped), so
 * a title such as "Rate (per 1,000" or "a) b" ends the string early and every PDF reader reports a syntax
 * error in the information dictionary; and it turns characters outside its single-byte encoding into "?".
 *
 * <p>JFreePDF 2.0 stamps {@code /CreationDate} and {@code /ModDate} with the current time in the JVM's default
 * zone and calendar, offset included ({@code D:20261204152200+14'0'} on Kiritimati), and offers no way to set
 * them; so this rewrites its finished bytes. Our own code rather than a PDF library: only the dates and the
 * title change, and the cross-reference table (ISO 32000-1, section 7.5.4: ten-digit byte offsets of each object)
 * and the {@code startxref} offset (section 7.5.5) are shifted by the change in length, whatever length the
 * machine's calendar gave the original dates. Everything else is copied byte for byte.
 */
final class PdfInformation {

    /**
     * 1 January 2000, 00:00:00 UTC, in the date format of ISO 32000-1, section 7.9.4 ({@code D:YYYYMMDDHHmmSSOHH'mm'},
     * O = Z for universal time).
     */
    static final String FIXED = "D:20000101000000Z00'00'";

    private static final Pattern DATE = Pattern.compile("/(CreationDate|ModDate) \\(D:[^)]*\\)");
    private static final String INFO_TYPE = "/Type /Info";
    private static final Pattern XREF_ENTRY = Pattern.compile("(\\d{10}) (\\d{5}) n");
    private static final Pattern START_XREF = Pattern.compile("startxref(\\s+)(\\d+)");

    private PdfInformation() {
    }

    /**
     * {@code pdf} (written by JFreePDF without a title) with its information dates set to {@link #FIXED} and
     * {@code title} added to its information dictionary; a PDF without an information dictionary is returned as
     * it is. Every cross-reference offset and {@code startxref} still point at their objects.
     */
    static byte[] rewritten(byte[] pdf, String title) {
        // ISO-8859-1 maps every byte to one char and back, so binary streams survive and offsets stay byte offsets
        String text = new String(pdf, StandardCharsets.ISO_8859_1);
        int info = text.indexOf(INFO_TYPE);
        if (info < 0) {
            return pdf;
        }
        StringBuilder out = new StringBuilder(text.length());
        List<int[]> shifts = new ArrayList<>(); // {position in the original, change in length there}
        int afterType = info + INFO_TYPE.length();
        String titleEntry = "\n/Title " + unicodeText(title);
        out.append(text, 0, afterType).append(titleEntry);
        shifts.add(new int[] {afterType, titleEntry.length()});
        int copied = afterType;
        Matcher date = DATE.matcher(text);
        date.region(afterType, Math.max(afterType, text.indexOf("endobj", afterType)));
        while (date.find()) {
            String replacement = "/" + date.group(1) + " (" + FIXED + ")";
            out.append(text, copied, date.start()).append(replacement);
            shifts.add(new int[] {date.start(), replacement.length() - (date.end() - date.start())});
            copied = date.end();
        }
        int xref = text.lastIndexOf("\nxref");
        if (xref < copied) {
            throw new IllegalStateException("the PDF's cross-reference table does not follow its information dictionary");
        }
        out.append(text, copied, xref);
        out.append(shiftedXref(text.substring(xref), shifts));
        return out.toString().getBytes(StandardCharsets.ISO_8859_1);
    }

    /**
     * A PDF text string in UTF-16BE with its byte order mark, written as a hexadecimal string (ISO 32000-1,
     * sections 7.9.2.2 and 7.3.4.3), so it needs no escaping and stays 7-bit.
     */
    static String unicodeText(String value) {
        StringBuilder hex = new StringBuilder("<FEFF");
        for (byte b : value.getBytes(StandardCharsets.UTF_16BE)) {
            hex.append(String.format(Locale.ROOT, "%02X", b & 0xff));
        }
        return hex.append('>').toString();
    }

    /** The cross-reference section and trailer with every offset moved by the changes made before it. */
    private static String shiftedXref(String section, List<int[]> shifts) {
        Matcher entry = XREF_ENTRY.matcher(section);
        StringBuilder entries = new StringBuilder(section.length());
        while (entry.find()) {
            long offset = Long.parseLong(entry.group(1));
            entry.appendReplacement(entries, String.format(Locale.ROOT, "%010d %s n", shifted(offset, shifts), entry.group(2)));
        }
        entry.appendTail(entries);
        Matcher start = START_XREF.matcher(entries);
        if (!start.find()) {
            throw new IllegalStateException("the PDF has no startxref");
        }
        long moved = shifted(Long.parseLong(start.group(2)), shifts);
        return entries.substring(0, start.start()) + "startxref" + start.group(1) + moved + entries.substring(start.end());
    }

    private static long shifted(long offset, List<int[]> shifts) {
        long moved = offset;
        for (int[] shift : shifts) {
            if (shift[0] < offset) {
                moved += shift[1];
            }
        }
        return moved;
    }
}
