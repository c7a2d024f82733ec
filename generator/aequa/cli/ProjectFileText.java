package aequa.cli;

import java.util.Locale;

import aequa.statistics.KeyPairGuess;

/** The text of the {@code aequa.yaml} that {@code scaffold --regions --figures} writes; every value double-quoted. */
final class ProjectFileText {

    private ProjectFileText() {
    }

    /**
     * @param part        the TopoJSON object, the Shapefile in a zip or the GeoPackage layer to read, empty for none
     * @param figuresPart the SQLite table of the figures, empty for none
     */
    static String of(String regionsFile, String part, KeyPairGuess.Guess guess, String nameAttribute,
                     String figuresFile, String figuresPart, String indicator) {
        StringBuilder yaml = new StringBuilder();
        yaml.append("# Written by 'aequa scaffold' from your files; the keys were guessed, check them.\n");
        yaml.append("# Every key is documented in aequa's README (\"The project file\").\n");
        yaml.append("site:\n  title: \"My maps\"\n  publisher: \"My organisation\"\n\n");
        yaml.append("regions:\n  regions:\n");
        yaml.append("    file: ").append(quoted(regionsFile)).append('\n');
        if (!part.isEmpty()) {
            String lower = regionsFile.toLowerCase(Locale.ROOT);
            String partKey = lower.endsWith(".zip") || lower.endsWith(".gpkg") ? "layer" : "object";
            yaml.append("    ").append(partKey).append(": ").append(quoted(part)).append('\n');
        }
        yaml.append("    key: ").append(quoted(guess.attribute())).append('\n');
        if (!nameAttribute.isEmpty()) {
            yaml.append("    name: ").append(quoted(nameAttribute)).append('\n');
        }
        yaml.append("\nfigures:\n  figures:\n");
        yaml.append("    file: ").append(quoted(figuresFile)).append('\n');
        if (!figuresPart.isEmpty()) {
            yaml.append("    table: ").append(quoted(figuresPart)).append('\n');
        }
        yaml.append("    key: ").append(quoted(guess.column())).append('\n');
        if (guess.relaxed()) {
            yaml.append("    key-matching: relaxed   # only relaxed matching (case, blanks, leading zeros) joins the keys\n");
        }
        yaml.append("\nmaps:\n  - id: ").append(mapId(indicator)).append('\n');
        yaml.append("    title: ").append(quoted(indicator)).append('\n');
        yaml.append("    regions: regions\n    figures: figures\n");
        yaml.append("    indicator: ").append(quoted(indicator)).append('\n');
        yaml.append("    classes: { method: quantile, count: 5 }\n");
        return yaml.toString();
    }

    /** A URL-safe map id from the indicator's name (lower case letters, digits and hyphens; "map" if none are left). */
    static String mapId(String indicator) {
        String id = indicator.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-+|-+$", "");
        id = id.length() > 63 ? id.substring(0, 63).replaceAll("-+$", "") : id;
        return id.isEmpty() ? "map" : id;
    }

    /** A YAML double-quoted scalar (YAML 1.2, section 7.3.1): backslash and quote escaped, controls as \\uXXXX. */
    private static String quoted(String text) {
        StringBuilder quoted = new StringBuilder("\"");
        for (char c : text.toCharArray()) {
            if (c == '"' || c == '\\') {
                quoted.append('\\').append(c);
            } else if (c < 0x20) {
                quoted.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
            } else {
                quoted.append(c);
            }
        }
        return quoted.append('"').toString();
    }
}
