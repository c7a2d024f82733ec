package aequa.testing;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.function.Function;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * A small project made in a test's folder on the real boundary files of {@code src/test/resources/geometry}
 * (its SOURCE.md names each file's source and licence): a boundary file copied into {@code regions/}, a figures
 * CSV with one row per feature of it, and the project file. The figures come from the boundary file's own
 * properties (a code, a population estimate): real attribute data, enough to classify and draw, never an oracle.
 */
public final class RealProject {

    /** The real boundary files, with their sources in SOURCE.md. */
    public static final Path GEOMETRY = Path.of("src/test/resources/geometry");

    private static final ObjectMapper JSON = new ObjectMapper();

    private final Path folder;

    private RealProject(Path folder) {
        this.folder = folder;
    }

    /** A project in {@code folder}, with its {@code regions/} and {@code figures/} folders made. */
    public static RealProject in(Path folder) throws IOException {
        Files.createDirectories(folder.resolve("regions"));
        Files.createDirectories(folder.resolve("figures"));
        return new RealProject(folder);
    }

    /** The project's folder. */
    public Path folder() {
        return folder;
    }

    /** Copies the boundary file {@code geometryFile} to {@code regions/NAME.geojson} (replacing an earlier copy). */
    public RealProject regions(String name, String geometryFile) throws IOException {
        Files.copy(GEOMETRY.resolve(geometryFile), regionFile(name), StandardCopyOption.REPLACE_EXISTING);
        return this;
    }

    /**
     * Writes {@code figures/NAME.csv} for the regions copied as {@code NAME}: the header {@code code,COLUMN},
     * then per feature, in the file's order, its {@code keyProperty} and {@code value} of its properties.
     */
    public RealProject figures(String name, String keyProperty, String column, Function<JsonNode, String> value)
            throws IOException {
        StringBuilder csv = new StringBuilder("code,").append(column).append('\n');
        for (JsonNode feature : JSON.readTree(regionFile(name).toFile()).path("features")) {
            JsonNode properties = feature.path("properties");
            csv.append(properties.path(keyProperty).asText()).append(',').append(value.apply(properties)).append('\n');
        }
        Files.writeString(folder.resolve("figures").resolve(name + ".csv"), csv, StandardCharsets.UTF_8);
        return this;
    }

    /** Writes {@code aequa.yaml}, one line per argument (the last one ended by a line break), and returns the folder. */
    public Path projectFile(String... lines) throws IOException {
        Files.writeString(folder.resolve("aequa.yaml"), String.join("\n", lines) + "\n", StandardCharsets.UTF_8);
        return folder;
    }

    /** A figure read from a property as written in the boundary file (empty where it is missing). */
    public static Function<JsonNode, String> property(String name) {
        return properties -> properties.path(name).asText("");
    }

    /** A figure made from a numeric code property: the code modulo {@code divisor}, to spread values over classes. */
    public static Function<JsonNode, String> codeModulo(String codeProperty, int divisor) {
        return properties -> String.valueOf(Integer.parseInt(properties.path(codeProperty).asText()) % divisor);
    }

    private Path regionFile(String name) {
        return folder.resolve("regions").resolve(name + ".geojson");
    }
}
