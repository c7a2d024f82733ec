package aequa.project;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * Checks a bound project file for what its types cannot say: ids that other sections refer to, files that
 * must exist, and the words allowed for each setting. Every finding names the line and column of the value.
 * Names that belong to later stages (projection families, class methods) are checked by those stages,
 * through {@link ProjectPlaces}.
 */
final class ProjectChecks {

    private static final Pattern MAP_ID = Pattern.compile("[a-z0-9][a-z0-9-]{0,62}");

    private final Path projectDir;
    private final ProjectFile project;
    private final YamlLocations locations;
    private final Findings findings;

    /** @param projectDir the project folder's real path ({@link Path#toRealPath}) */
    ProjectChecks(Path projectDir, ProjectFile project, YamlLocations locations, Findings findings) {
        this.projectDir = projectDir;
        this.project = project;
        this.locations = locations;
        this.findings = findings;
    }

    void run() {
        project.regions().forEach((id, source) -> checkRegionSource("/regions/" + id, source));
        project.figures().forEach((id, source) -> checkFigureSource("/figures/" + id, source));
        checkChecks();
        if (project.maps().isEmpty()) {
            error("project-no-maps", "/maps", "The project file defines no maps.",
                    "Add a 'maps:' list; 'aequa scaffold' writes an example.");
        }
        Set<String> ids = new HashSet<>();
        for (int i = 0; i < project.maps().size(); i++) {
            checkMap("/maps/" + i, project.maps().get(i), ids);
        }
        new TranslationChecks(project, locations, findings).run();
    }

    private void checkRegionSource(String at, RegionSourceSpec source) {
        checkFile(at, source.file(), RegionSourceSpec.FILE_TYPES);
        onlyFor(at + "/layer", source.layer(), source.file(), List.of(".gpkg", ".zip"), "layer",
                "a GeoPackage layer, or a Shapefile inside a zip");
        onlyFor(at + "/object", source.object(), source.file(), List.of(".topojson", ".json"), "object",
                "the object of a TopoJSON topology");
        InsetsChecks.check(at + "/insets", source.insets(), this::error);
        if (NamePattern.isPattern(source.name()) && NamePattern.parse(source.name()).isEmpty()) {
            error("project-bad-name-pattern", at + "/name", "The name pattern '" + source.name() + "' does not pair its braces"
                            + " around property names.",
                    "Write each property in braces, for example \"{name}, {state}\"; text outside braces is kept as it is.");
        }
        if (source.key().isBlank()) {
            error("project-missing-key", at + "/key", "The region source has an empty 'key'.",
                    "Name the property that holds each region's code, or '" + RegionSourceSpec.FEATURE_ID + "' for the feature id.");
        }
    }

    private void checkFigureSource(String at, FigureSourceSpec source) {
        checkFile(at, source.file(), FigureSourceSpec.FILE_TYPES);
        onlyFor(at + "/table", source.table(), source.file(), FigureSourceSpec.DATABASE_TYPES, "table",
                "a table or view of a database");
        onlyFor(at + "/sheet", source.sheet(), source.file(), FigureSourceSpec.WORKBOOK_TYPES, "sheet", "a sheet of a workbook");
        onlyFor(at + "/header-row", source.headerRow() == null ? "" : source.headerRow().toString(), source.file(),
                FigureSourceSpec.WORKBOOK_TYPES, "header-row", "the header row of a workbook sheet");
        oneOf(at + "/decimal", source.decimal(), List.of(".", ","));
        oneOf(at + "/delimiter", source.delimiter(), List.of("", ",", ";", "\t", "|"));
    }

    private void checkChecks() {
        ChecksSpec checks = project.checks();
        if (!(checks.areaTolerance() > 0)) {
            error("project-bad-value", "/checks/area-tolerance", "'area-tolerance' must be a positive number.",
                    "The default, 1e-4, allows 0.01 % between a region's drawn and true area.");
        }
        if (!(checks.minMatchedPercent() >= 0 && checks.minMatchedPercent() <= 100)) {
            error("project-bad-value", "/checks/min-matched-percent",
                    "'min-matched-percent' must be a number from 0 to 100.",
                    "The default, 95, stops a build when more than 5 % of a map's regions find no figure; 0 turns the check off.");
        }
    }

    private void checkMap(String at, MapSpec map, Set<String> ids) {
        if (map.id() == null || !MAP_ID.matcher(map.id()).matches()) {
            error("project-bad-map-id", at + "/id", "The map id '" + map.id() + "' is missing or not URL-safe.",
                    "Use lower-case letters, digits and hyphens, for example 'clinic-density'.");
        } else if (!ids.add(map.id())) {
            error("project-duplicate-map-id", at + "/id", "The map id '" + map.id() + "' is used twice.",
                    "Give every map its own id; it names the map's page and files.");
        }
        reference(at + "/regions", map.regions(), project.regions(), "regions");
        reference(at + "/figures", map.figures(), project.figures(), "figures");
        if (map.indicator() == null || map.indicator().isBlank()) {
            error("project-missing-key", at + "/indicator", "Map '" + map.id() + "' names no indicator.",
                    "Set 'indicator' to the column (wide layout) or indicator name (long layout) to map.");
        }
        if (map.normalise() == Normalisation.COLUMN && map.per().isBlank()) {
            error("project-missing-key", at + "/per", "Map '" + map.id() + "' normalises by a column but names none.",
                    "Set 'per' to the denominator column, for example 'population'.");
        }
        if (map.largestCircleMm() != null && !(map.largestCircleMm() >= MapSpec.MIN_CIRCLE_MM
                && map.largestCircleMm() <= MapSpec.MAX_CIRCLE_MM)) {
            error("project-bad-value", at + "/largest-circle-mm", String.format(java.util.Locale.ROOT,
                            "'largest-circle-mm' must be from %.0f to %.0f millimetres.", MapSpec.MIN_CIRCLE_MM, MapSpec.MAX_CIRCLE_MM),
                    "It is the diameter of the largest circle in print; leave it out to size circles by the map.");
        } else if (map.largestCircleMm() != null && map.display() != MapDisplay.CIRCLES) {
            error("project-bad-value", at + "/largest-circle-mm", "'largest-circle-mm' applies only to 'display: circles'.",
                    "Remove it, or set 'display: circles' for a map of counts.");
        }
        checkClasses(at + "/classes", map.classes());
        if (map.insets() != null) {
            InsetsChecks.check(at + "/insets", map.insets(), this::error);
        }
        if (!(map.colours().hue() >= 0 && map.colours().hue() <= 360)) {
            error("project-bad-value", at + "/colours/hue", "'hue' must be between 0 and 360 degrees.", "");
        }
        if (!(map.colours().hueLow() >= 0 && map.colours().hueLow() <= 360)) {
            error("project-bad-value", at + "/colours/hue-low", "'hue-low' must be between 0 and 360 degrees.", "");
        }
    }

    private void checkClasses(String at, ClassesSpec classes) {
        if (classes.count() < 2 || classes.count() > 9) {
            error("project-bad-value", at + "/count", "'count' must be between 2 and 9 classes.",
                    "Readers tell apart at most about seven shades of one hue (common practice).");
        }
        if (classes.method() == ClassMethod.MANUAL && !finiteAndAscending(classes.breaks())) {
            error("project-bad-value", at + "/breaks", "Manual classes need 'breaks': numbers in strictly ascending order.",
                    "List the inner class limits, for example [10, 20, 50].");
        }
        if (classes.method() == ClassMethod.DIVERGING && classes.midpoint() == null) {
            error("project-missing-key", at + "/midpoint", "Diverging classes need a 'midpoint'.",
                    "Set midpoint to the value the colours diverge from, for example 0 or the national rate.");
        } else if (classes.method() == ClassMethod.DIVERGING && !Double.isFinite(classes.midpoint())) {
            error("project-bad-value", at + "/midpoint", "The 'midpoint' must be a finite number.",
                    "Set midpoint to the value the colours diverge from, for example 0 or the national rate.");
        }
    }

    /** Whether {@code breaks} holds at least one number, each finite and greater than the one before. */
    private static boolean finiteAndAscending(List<Double> breaks) {
        for (int i = 0; i < breaks.size(); i++) {
            double b = breaks.get(i);
            if (!Double.isFinite(b) || i > 0 && !(breaks.get(i - 1) < b)) {
                return false;
            }
        }
        return !breaks.isEmpty();
    }

    private void reference(String at, String id, Map<String, ?> section, String sectionName) {
        if (id == null || !section.containsKey(id)) {
            error("project-unknown-reference", at,
                    "'" + id + "' is not a source defined under '" + sectionName + "'.",
                    section.isEmpty() ? "Define the source under '" + sectionName + ":' first."
                            : "Defined: " + String.join(", ", section.keySet()) + ".");
        }
    }

    private void checkFile(String at, String file, List<String> extensions) {
        if (file == null || file.isBlank()) {
            error("project-missing-key", at + "/file", "The source names no 'file'.", "");
            return;
        }
        Path path = projectDir.resolve(file).normalize();
        if (!path.startsWith(projectDir)) {
            error("project-file-outside", at + "/file", "'" + file + "' lies outside the project folder.",
                    "Keep data files inside the project folder, so the project can be moved and rebuilt.");
        } else if (Files.isRegularFile(path) && !realPathInside(path)) {
            error("project-file-outside", at + "/file", "'" + file + "' is a link that leads outside the project folder.",
                    "Copy the file into the project folder instead of linking to it; aequa reads no file outside it.");
        } else if (!Files.isRegularFile(path)) {
            error("project-file-not-found", at + "/file", "The file '" + file + "' does not exist.",
                    "Paths are relative to the folder that holds " + ProjectFile.FILE_NAME + ".");
        } else if (extensions.stream().noneMatch(e -> file.toLowerCase(java.util.Locale.ROOT).endsWith(e))) {
            error("project-file-type", at + "/file", "'" + file + "' has an unsupported file type.",
                    "Supported here: " + String.join(", ", extensions) + ".");
        }
    }

    /**
     * One vocabulary for all readers: {@code file}, {@code key}, {@code name}, and the word that picks a part of
     * the file ({@code layer}, {@code object}, {@code table}, {@code sheet}), each meaningful for some file types
     * only; set for another type it is a mistake to point out, not a setting to ignore.
     */
    private void onlyFor(String at, String value, String file, List<String> extensions, String setting, String what) {
        String lower = file == null ? "" : file.toLowerCase(java.util.Locale.ROOT);
        if (!value.isEmpty() && extensions.stream().noneMatch(lower::endsWith)) {
            error("project-setting-not-applicable", at, "'" + setting + "' names " + what + ", but '" + file + "' is not one.",
                    "Remove '" + setting + "', or use it with a " + String.join(", ", extensions) + " file.");
        }
    }

    /** Whether {@code path}, with every link resolved, is still inside the (real) project folder. */
    private boolean realPathInside(Path path) {
        try {
            return path.toRealPath().startsWith(projectDir);
        } catch (IOException unreadable) {
            return false;
        }
    }

    private void oneOf(String at, String value, List<String> allowed) {
        if (!allowed.contains(value)) {
            error("project-unknown-value", at, "'" + value + "' is not a known value here.",
                    "Use one of: " + String.join(", ", allowed.stream().map(v -> v.equals("\t") ? "\"\\t\"" : "'" + v + "'").toList()) + ".");
        }
    }

    private void error(String code, String pointer, String message, String hint) {
        findings.add(Finding.error(code, ProjectFile.FILE_NAME, locations.place(pointer), message, hint));
    }
}
