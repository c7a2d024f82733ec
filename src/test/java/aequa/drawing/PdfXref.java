package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** The cross-reference check of a classic PDF file (ISO 32000-1, sections 7.5.4 and 7.5.5), shared by the PDF tests. */
final class PdfXref {

    private PdfXref() {
    }

    /**
     * Asserts that {@code startxref} points at the xref table and every in-use entry at its object's header.
     *
     * @param pdf the file as ISO-8859-1 text (one char per byte)
     * @return the number of objects the table lists as in use
     */
    static int assertPointsAtEveryObject(String pdf) {
        Matcher start = Pattern.compile("startxref\\s+(\\d+)").matcher(pdf);
        assertTrue(start.find(), "a startxref");
        int xref = Integer.parseInt(start.group(1));
        assertTrue(pdf.startsWith("xref", xref), "startxref points at the xref table");
        Matcher entries = Pattern.compile("(\\d{10}) 00000 n").matcher(pdf.substring(xref));
        int objects = 0;
        while (entries.find()) {
            int offset = Integer.parseInt(entries.group(1));
            objects++;
            assertTrue(pdf.startsWith(objects + " 0 obj", offset), "object " + objects + " at " + offset);
        }
        return objects;
    }
}
