package aequa.drawing;

import java.nio.charset.StandardCharsets;

/**
 * One finished drawing, not yet written anywhere.
 *
 * @param format         what the bytes are
 * @param bytes          the file content (SVG as UTF-8)
 * @param width          page width in {@code unit}
 * @param height         page height in {@code unit}
 * @param unit           {@code mm} (print SVG, PDF) or {@code px} (web SVG, PNG at 1x)
 * @param scaleUnitsPerM the map scale: page units per projected metre (the same for every panel)
 * @param areaScale      the area-scale square shown
 * @param inventory      what was drawn, for {@link PrintPreflight}
 */
public record DrawnMap(Format format, byte[] bytes, double width, double height, String unit, double scaleUnitsPerM,
                       AreaScale areaScale, Inventory inventory) {

    /** The output formats. */
    public enum Format {
        WEB_SVG("svg"), PRINT_SVG("svg"), PNG("png"), PDF("pdf");

        private final String extension;

        Format(String extension) {
            this.extension = extension;
        }

        public String extension() {
            return extension;
        }
    }

    /** The bytes as text; meaningful for SVG only. */
    public String text() {
        return new String(bytes, StandardCharsets.UTF_8);
    }
}
