package aequa.drawing;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Pattern;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonDeserializer;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;

import aequa.colour.Rgb;
import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * Finds and reads themes. A theme is a folder {@code <name>/} holding {@code theme.yaml} (kebab-case keys,
 * unknown keys are errors). The project's own {@code themes/} folder is
 * searched first, then the themes bundled in the jar under {@code /themes/}.
 *
 * <p>A missing or broken theme is a problem in user data: it becomes a {@link Finding} and the bundled
 * {@value #DEFAULT_NAME} theme is used instead, so a build can still report everything at once.
 */
public final class Themes {

    /** The theme a project gets when it names none. */
    public static final String DEFAULT_NAME = "daylight";

    private static final Pattern SAFE_NAME = Pattern.compile("[a-z0-9][a-z0-9-]*");

    private static final ObjectMapper YAML = new YAMLMapper()
            .configure(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES, true)
            .setPropertyNamingStrategy(PropertyNamingStrategies.KEBAB_CASE)
            .registerModule(new SimpleModule("aequa-colours").addDeserializer(Rgb.class, new RgbFromHex()));

    private Themes() {
    }

    /**
     * The theme {@code name} from {@code projectDir/themes/} or, failing that, the bundled themes.
     *
     * @param projectDir the project folder, or null to use bundled themes only
     * @param findings   receives {@code theme-unknown} or {@code theme-invalid} when the theme cannot be used
     */
    public static Theme load(Path projectDir, String name, Findings findings) {
        return load(projectDir, name, "site.theme", findings);
    }

    /**
     * As {@link #load(Path, String, Findings)}, with {@code place} (where the name stands in the project file,
     * for example "line 4, column 10") in the {@code theme-unknown} finding.
     */
    public static Theme load(Path projectDir, String name, String place, Findings findings) {
        String file = "themes/" + name + "/theme.yaml";
        if (!SAFE_NAME.matcher(name).matches()) {
            findings.add(Finding.error("theme-unknown", "aequa.yaml", place,
                    "The theme name \"" + name + "\" is not a folder name aequa accepts.",
                    "Use lower-case letters, digits and hyphens, for example \"" + DEFAULT_NAME + "\"."));
            return bundled(DEFAULT_NAME);
        }
        try {
            if (projectDir != null && Files.isRegularFile(projectDir.resolve(file))) {
                Path folder = projectDir.resolve("themes").resolve(name);
                return YAML.readValue(folder.resolve("theme.yaml").toFile(), Theme.class);
            }
            Theme theme = readBundled(name);
            if (theme != null) {
                return theme;
            }
            findings.add(Finding.error("theme-unknown", "aequa.yaml", place,
                    "There is no theme called \"" + name + "\" in the project's themes/ folder or among aequa's themes.",
                    "Name one of the bundled themes (daylight, newsprint, contrast) or add themes/" + name + "/theme.yaml."));
        } catch (IOException | RuntimeException e) {
            findings.add(Finding.error("theme-invalid", file, "", "The theme file cannot be used: " + firstLine(e),
                    "Compare it with themes/" + DEFAULT_NAME + "/theme.yaml; every key must be present."));
        }
        return bundled(DEFAULT_NAME);
    }

    /** A bundled theme; a missing or broken bundled theme is a packaging error and throws. */
    public static Theme bundled(String name) {
        try {
            Theme theme = readBundled(name);
            if (theme == null) {
                throw new IllegalArgumentException("no bundled theme " + name);
            }
            return theme;
        } catch (IOException e) {
            throw new UncheckedIOException("bundled theme " + name + " is broken", e);
        }
    }

    private static Theme readBundled(String name) throws IOException {
        try (InputStream yaml = Themes.class.getResourceAsStream("/themes/" + name + "/theme.yaml")) {
            if (yaml == null) {
                return null;
            }
            return YAML.readValue(yaml, Theme.class);
        }
    }

    private static String firstLine(Exception e) {
        String message = String.valueOf(e.getMessage());
        int end = message.indexOf('\n');
        return end < 0 ? message : message.substring(0, end);
    }

    /** Reads {@code "#rrggbb"} colours. */
    private static final class RgbFromHex extends JsonDeserializer<Rgb> {
        @Override
        public Rgb deserialize(JsonParser parser, DeserializationContext context) throws IOException {
            String text = parser.getValueAsString();
            try {
                return Rgb.fromHex(text == null ? "" : text.trim());
            } catch (IllegalArgumentException e) {
                return (Rgb) context.handleWeirdStringValue(Rgb.class, text, "expected a colour written #rrggbb");
            }
        }
    }
}
