package aequa.project;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.databind.exc.InvalidFormatException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * Reads and checks {@value ProjectFile#FILE_NAME}. Syntax errors, unknown keys, unknown words of a mode
 * ({@link ConfigWord}) and wrong types are reported with line and column; then {@link ProjectChecks} checks references between sections and that every named
 * file exists. Returns empty when the file cannot be used at all; all problems go to {@code findings}.
 */
public final class ProjectLoader {

    private static final ObjectMapper YAML = YAMLMapper.builder()
            .propertyNamingStrategy(PropertyNamingStrategies.KEBAB_CASE)
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .disable(MapperFeature.ALLOW_COERCION_OF_SCALARS)
            .addModule(ConfigWordReader.module())
            .build();

    private ProjectLoader() {
    }

    public static Optional<LoadedProject> load(Path projectDir, Findings findings) {
        Path file = projectDir.resolve(ProjectFile.FILE_NAME);
        if (!Files.isRegularFile(file)) {
            findings.add(Finding.error("project-file-missing", ProjectFile.FILE_NAME, "",
                    "There is no project file in " + projectDir + ".",
                    "Run 'aequa scaffold " + projectDir + "' to start a project, or name the folder that holds "
                            + ProjectFile.FILE_NAME + "."));
            return Optional.empty();
        }
        String yaml;
        Path dir;
        try {
            // the real path, so that '.' and links compare with the paths of data files (ProjectChecks)
            dir = projectDir.toRealPath();
            yaml = Files.readString(file, StandardCharsets.UTF_8);
        } catch (CharacterCodingException e) {
            findings.add(Finding.error("project-file-unreadable", ProjectFile.FILE_NAME, "",
                    "The project file is not UTF-8 text; it was perhaps saved in another encoding (such as Latin-1).",
                    "Save it as UTF-8, the encoding aequa reads."));
            return Optional.empty();
        } catch (IOException e) {
            findings.add(Finding.error("project-file-unreadable", ProjectFile.FILE_NAME, "",
                    "The project file cannot be read: " + e.getMessage(), "Check the file's permissions."));
            return Optional.empty();
        }
        if (yaml.lines().allMatch(line -> line.isBlank() || line.strip().startsWith("#") || line.strip().equals("---"))) {
            // Jackson reports a file without content as a type mismatch at line 1; say what it is
            return empty(findings);
        }
        ProjectFile project;
        YamlLocations locations = null;
        List<ConfigWordReader.UnknownWord> unknownWords = ConfigWordReader.newList();
        try {
            locations = YamlLocations.scan(yaml);
            project = YAML.readerFor(ProjectFile.class).withAttribute(ConfigWordReader.UNKNOWN_WORDS, unknownWords).readValue(yaml);
        } catch (JsonProcessingException e) {
            findings.add(describe(e, locations));
            return Optional.empty();
        } catch (IOException e) {
            findings.add(Finding.error("project-file-unreadable", ProjectFile.FILE_NAME, "", e.getMessage(), ""));
            return Optional.empty();
        }
        if (project == null) {
            return empty(findings);
        }
        int before = findings.list().size();
        for (ConfigWordReader.UnknownWord unknown : unknownWords) {
            findings.add(Finding.error("project-unknown-value", ProjectFile.FILE_NAME, YamlLocations.describe(unknown.location()),
                    "'" + unknown.word() + "' is not a known value here.", "Use one of: " + unknown.choices() + "."));
        }
        new ProjectChecks(dir, project, locations, findings).run();
        boolean broken = findings.list().subList(before, findings.list().size()).stream()
                .anyMatch(f -> f.severity() == aequa.findings.Severity.ERROR);
        return broken ? Optional.empty() : Optional.of(new LoadedProject(dir, project, locations));
    }

    private static Optional<LoadedProject> empty(Findings findings) {
        findings.add(Finding.error("project-file-empty", ProjectFile.FILE_NAME, "",
                "The project file is empty.", "Run 'aequa scaffold' in a new folder to see a minimal project file."));
        return Optional.empty();
    }

    private static Finding describe(JsonProcessingException e, YamlLocations locations) {
        String place = e.getLocation() == null ? "" : YamlLocations.describe(e.getLocation());
        if (e instanceof UnrecognizedPropertyException unknown) {
            if (locations != null) {
                String keyPlace = locations.place(pointerOf(unknown));
                place = keyPlace.isEmpty() ? place : keyPlace;
            }
            java.util.List<String> known = unknown.getKnownPropertyIds().stream().map(Object::toString).sorted().toList();
            return Finding.error("project-unknown-key", ProjectFile.FILE_NAME, place,
                    "Unknown key '" + unknown.getPropertyName() + "'" + where(unknown) + ".",
                    KeySuggestion.hint(unknown.getPropertyName(), known));
        }
        if (e instanceof InvalidFormatException invalid) {
            return Finding.error("project-wrong-type", ProjectFile.FILE_NAME, place,
                    "The value '" + invalid.getValue() + "'" + where(invalid) + " is not a "
                            + simpleType(invalid.getTargetType()) + ".", "");
        }
        if (e instanceof MismatchedInputException mismatched) {
            return Finding.error("project-wrong-type", ProjectFile.FILE_NAME, place,
                    "The value" + where(mismatched) + " has the wrong type: expected "
                            + article(simpleType(mismatched.getTargetType())) + ".", "");
        }
        return Finding.error("project-syntax", ProjectFile.FILE_NAME, place,
                "The project file is not valid YAML: " + e.getOriginalMessage().lines().findFirst().orElse("") + ".",
                "Check the indentation and quoting around that line.");
    }

    private static String where(JsonMappingException e) {
        String path = pathOf(e);
        return path.isEmpty() ? "" : " at " + path;
    }

    /** The JSON Pointer of the failing key or value: {@code /maps/2/classes/count}. */
    private static String pointerOf(JsonMappingException e) {
        StringBuilder pointer = new StringBuilder();
        for (JsonMappingException.Reference ref : e.getPath()) {
            if (ref.getFieldName() != null) {
                pointer.append('/').append(ref.getFieldName().replace("~", "~0").replace("/", "~1"));
            } else if (ref.getIndex() >= 0) {
                pointer.append('/').append(ref.getIndex());
            }
        }
        return pointer.toString();
    }

    /** The path of the failing value, as the user would write it: {@code maps[2].classes.count}. */
    static String pathOf(JsonMappingException e) {
        StringBuilder path = new StringBuilder();
        for (JsonMappingException.Reference ref : e.getPath()) {
            if (ref.getFieldName() != null) {
                if (path.length() > 0) {
                    path.append('.');
                }
                path.append(ref.getFieldName());
            } else if (ref.getIndex() >= 0) {
                path.append('[').append(ref.getIndex()).append(']');
            }
        }
        return path.toString();
    }

    private static String simpleType(Class<?> type) {
        if (type == null) {
            return "value";
        }
        if (Number.class.isAssignableFrom(type) || type == double.class || type == int.class) {
            return "number";
        }
        if (type == String.class) {
            return "text";
        }
        if (java.util.List.class.isAssignableFrom(type)) {
            return "list";
        }
        if (java.util.Map.class.isAssignableFrom(type) || type.isRecord()) {
            return "section (key: value lines)";
        }
        return type.getSimpleName();
    }

    private static String article(String noun) {
        return (noun.matches("^[aeiou].*") ? "an " : "a ") + noun;
    }
}
