package aequa.publish;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * The single hook between themes and pages: finds the CSS of the site's theme, which the publisher copies
 * to {@code assets/theme.css} after the base stylesheet. The theme's CSS redefines the custom properties of
 * {@code templates/assets/site.css}.
 *
 * <p>Looked up in this order, first hit wins: the project's {@code themes/NAME.css}, the project's
 * {@code themes/NAME/site.css}, then the same two inside the jar (classpath {@code /themes/}). A theme
 * without CSS leaves the base stylesheet alone.
 */
final class ThemeStyles {

    private ThemeStyles() {
    }

    static byte[] find(Path projectDir, String themeName) {
        String safe = SafePaths.fileSafeId(themeName);
        List<String> candidates = List.of(safe + ".css", safe + "/site.css");
        Path ownThemes = projectDir.resolve("themes");
        for (String candidate : candidates) {
            Path file = ownThemes.resolve(candidate);
            if (Files.isRegularFile(file)) {
                try {
                    return Files.readAllBytes(file);
                } catch (IOException e) {
                    throw new UncheckedIOException("cannot read theme " + file, e);
                }
            }
        }
        for (String candidate : candidates) {
            try (InputStream in = ThemeStyles.class.getResourceAsStream("/themes/" + candidate)) {
                if (in != null) {
                    return in.readAllBytes();
                }
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read bundled theme " + candidate, e);
            }
        }
        return ("/* theme \"" + safe + "\" has no CSS; the base stylesheet applies */\n").getBytes(StandardCharsets.UTF_8);
    }
}
