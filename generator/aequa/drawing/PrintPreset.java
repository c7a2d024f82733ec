package aequa.drawing;

import java.util.Arrays;
import java.util.Optional;

/**
 * Named print widths for newspaper pages. A broadsheet or tabloid grid has columns of about 46 to 50 mm
 * with gutters of about 4 mm (common practice; values from memory, they vary by title), so a graphic
 * spanning n columns is about {@code 50 n + 4 (n - 1)} mm wide.
 */
public enum PrintPreset {
    ONE_COLUMN("one-column", 50.0),
    TWO_COLUMNS("two-columns", 104.0),
    THREE_COLUMNS("three-columns", 158.0),
    FULL_WIDTH("full-width", 266.0);

    private final String configName;
    private final double widthMm;

    PrintPreset(String configName, double widthMm) {
        this.configName = configName;
        this.widthMm = widthMm;
    }

    /** The name used in project files. */
    public String configName() {
        return configName;
    }

    public double widthMm() {
        return widthMm;
    }

    public static Optional<PrintPreset> fromConfigName(String name) {
        return Arrays.stream(values()).filter(p -> p.configName.equals(name)).findFirst();
    }
}
