package aequa.inputs.figures;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;

import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

import org.dhatim.fastexcel.reader.CellRangeAddress;

/**
 * The merged cell ranges of one worksheet of an .xlsx (ECMA-376 Part 1, section 18.3.1.55 {@code mergeCell}),
 * which fastexcel-reader 0.19 does not expose. The worksheet part is found through the workbook's relationships
 * ({@code xl/_rels/workbook.xml.rels}, ECMA-376 Part 2, Open Packaging Conventions) by the sheet's relationship
 * id, and read with the JDK's streaming XML parser (external entities off). Only {@code mergeCell ref}
 * attributes are read; a part that cannot be found gives no ranges.
 */
final class MergedRanges {

    private static final String WORKBOOK_RELS = "xl/_rels/workbook.xml.rels";

    private MergedRanges() {
    }

    /** @param relationId the sheet's {@code r:id} in {@code xl/workbook.xml} */
    static List<CellRangeAddress> of(Path xlsx, String relationId) throws IOException {
        try (ZipFile zip = new ZipFile(xlsx.toFile())) {
            String target = sheetPart(zip, relationId);
            ZipEntry sheet = target == null ? null : zip.getEntry(target);
            if (sheet == null) {
                return List.of();
            }
            List<CellRangeAddress> ranges = new ArrayList<>();
            try (InputStream in = zip.getInputStream(sheet)) {
                XMLStreamReader xml = factory().createXMLStreamReader(in);
                while (xml.hasNext()) {
                    if (xml.next() == XMLStreamConstants.START_ELEMENT && "mergeCell".equals(xml.getLocalName())) {
                        String ref = xml.getAttributeValue(null, "ref");
                        if (ref != null && ref.contains(":")) {
                            ranges.add(CellRangeAddress.valueOf(ref));
                        }
                    }
                }
            }
            return ranges;
        } catch (XMLStreamException | IllegalArgumentException e) {
            return List.of();
        }
    }

    /** The zip path of the worksheet part the relationship names, or null. */
    private static String sheetPart(ZipFile zip, String relationId) throws IOException, XMLStreamException {
        ZipEntry rels = zip.getEntry(WORKBOOK_RELS);
        if (rels == null) {
            return null;
        }
        try (InputStream in = zip.getInputStream(rels)) {
            XMLStreamReader xml = factory().createXMLStreamReader(in);
            while (xml.hasNext()) {
                if (xml.next() == XMLStreamConstants.START_ELEMENT && "Relationship".equals(xml.getLocalName())
                        && relationId.equals(xml.getAttributeValue(null, "Id"))) {
                    String target = xml.getAttributeValue(null, "Target");
                    // targets are relative to xl/ unless absolute (OPC, Part 2, section 9.3)
                    return target.startsWith("/") ? target.substring(1) : "xl/" + target;
                }
            }
        }
        return null;
    }

    private static XMLInputFactory factory() {
        XMLInputFactory factory = XMLInputFactory.newFactory();
        factory.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        factory.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        return factory;
    }
}
