package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;

/**
 * The information dates of a PDF are replaced whatever zone and calendar wrote them, the title becomes a
 * Unicode text string, and the file's cross-reference table still points at every object (ISO 32000-1,
 * sections 7.5.4 and 7.5.5).
 */
class PdfInformationTest {

    /**
     * A three-object PDF laid out as JFreePDF lays it out when given no title (information dictionary first,
     * then a stream with binary bytes, then the xref table with ten-digit offsets), with the given date text.
     */
    private static byte[] pdfDated(String date) {
        List<String> objects = List.of(
                "<< /Type /Catalog >>",
                "<< /Type /Info\n/ModDate (" + date + ")\n/CreationDate (" + date + ")\n>>",
                "<< /Length 4 >>\nstream\n\u0000\u00ff\n)\nendstream");
        StringBuilder pdf = new StringBuilder("%PDF-1.4\n%\u0080\u0081\n");
        List<Integer> offsets = new ArrayList<>();
        for (int i = 0; i < objects.size(); i++) {
            offsets.add(pdf.length());
            pdf.append(i + 1).append(" 0 obj\n").append(objects.get(i)).append("\nendobj\n");
        }
        int xref = pdf.length();
        pdf.append("xref\n0 ").append(objects.size() + 1).append("\n0000000000 65535 f \n");
        offsets.forEach(o -> pdf.append(String.format(Locale.ROOT, "%010d 00000 n \n", o)));
        pdf.append("trailer\n<< /Info 2 0 R\n/Root 1 0 R\n/Size 4\n>>\nstartxref\n").append(xref).append("\n%%EOF");
        return pdf.toString().getBytes(StandardCharsets.ISO_8859_1);
    }

    @Test
    void datesFromAnyZoneOrCalendarBecomeTheSameBytes() {
        // what JFreePDF 2.0 writes: UTC, Kiritimati (+14), St John's (-03:30, minutes cut), a Buddhist-calendar year
        byte[] utc = PdfInformation.rewritten(pdfDated("D:20261204152200+00'0'"), "t");
        assertArrayEquals(utc, PdfInformation.rewritten(pdfDated("D:20261205052200+14'0'"), "t"));
        assertArrayEquals(utc, PdfInformation.rewritten(pdfDated("D:20261204115200-03'3'"), "t"));
        assertArrayEquals(utc, PdfInformation.rewritten(pdfDated("D:25691204152200+00'0'"), "t"));
        assertArrayEquals(utc, PdfInformation.rewritten(pdfDated("D:2026"), "t"), "a shorter date moves every later object");
        String text = new String(utc, StandardCharsets.ISO_8859_1);
        assertTrue(text.contains("/ModDate (" + PdfInformation.FIXED + ")") && text.contains("/CreationDate (" + PdfInformation.FIXED + ")"));
        assertTrue(text.contains("\u0000\u00ff\n)\n"), "binary stream bytes are copied unchanged");
    }

    @Test
    void everyCrossReferenceStillPointsAtItsObject() {
        String text = new String(PdfInformation.rewritten(pdfDated("D:2026"), "t"), StandardCharsets.ISO_8859_1);
        assertEquals(3, PdfXref.assertPointsAtEveryObject(text));
    }

    @Test
    void aPdfWithoutInformationIsLeftAsItIs() {
        byte[] undated = "%PDF-1.4\n1 0 obj\n<< >>\nendobj\n".getBytes(StandardCharsets.ISO_8859_1);
        assertArrayEquals(undated, PdfInformation.rewritten(undated, "t"));
    }

    @Test
    void titleBecomesAUnicodeTextString() {
        String text = new String(PdfInformation.rewritten(pdfDated("D:2026"), "km\u00b2"), StandardCharsets.ISO_8859_1);
        // ISO 32000-1, 7.9.2.2: UTF-16BE after the byte order mark FE FF; k = 006B, m = 006D, superscript two = 00B2
        assertTrue(text.contains("/Title <FEFF006B006D00B2>"), text);
        assertEquals(3, PdfXref.assertPointsAtEveryObject(text));
    }

    @Test
    void bracketsAndBackslashesInTheTitleStayInsideTheString() {
        // ISO 32000-1, 7.3.4.2: an unbalanced ")" or a "\" ends or escapes a literal string; a hexadecimal
        // string (7.3.4.3) holds any byte; ")" = 0029, "(" = 0028, "\" = 005C
        String text = new String(PdfInformation.rewritten(pdfDated("D:2026"), "a) (b\\"), StandardCharsets.ISO_8859_1);
        assertTrue(text.contains("/Title <FEFF00610029002000280062005C>\n"), text);
    }
}
