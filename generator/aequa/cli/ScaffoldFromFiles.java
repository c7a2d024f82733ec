package aequa.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

import aequa.atlas.Atlas;
import aequa.atlas.AtlasLoader;
import aequa.atlas.LoadOptions;
import aequa.atlas.MapModel;
import aequa.findings.Findings;
import aequa.inputs.figures.FigureColumns;
import aequa.inputs.regions.RegionAttributes;
import aequa.project.LoadedProject;
import aequa.project.ProjectLoader;
import aequa.statistics.FigureStatus;
import aequa.statistics.KeyPairGuess;

/**
 * {@code scaffold DIR --regions FILE --figures FILE}: copies the user's two files into {@code DIR/regions/} and
 * {@code DIR/figures/} (a {@code .shp} with its {@code .shx .dbf .prj .cpg} sidecars; a zip as it is), writes an {@code aequa.yaml}
 * whose keys are guessed by {@link KeyPairGuess} with one map of the first numeric figure column, then loads the
 * project as {@code aequa audit} does and prints the join summary. Nothing is written when a file cannot be
 * sampled (an unsupported kind is a usage error).
 */
final class ScaffoldFromFiles {

    private static final List<String> SHAPEFILE_SIDECARS = List.of(".shx", ".dbf", ".prj", ".cpg");
    /**
     * A plain decimal number, optionally signed, with an exponent. A leading zero before another digit ("01") marks a
     * code, not a figure; thousands separators are not read here.
     */
    private static final Pattern NUMBER = Pattern.compile("[-+]?((0|[1-9]\\d*)(\\.\\d*)?|\\.\\d+)([eE][-+]?\\d+)?");

    private final Path dir;
    private final PrintWriter out;
    private final PrintWriter err;

    ScaffoldFromFiles(Path dir, PrintWriter out, PrintWriter err) {
        this.dir = dir;
        this.out = out;
        this.err = err;
    }

    int run(Path regionsFile, Path figuresFile) throws IOException {
        for (Path file : List.of(regionsFile, figuresFile)) {
            if (!Files.isRegularFile(file)) {
                return usage(file + " does not exist or is not a file.");
            }
        }
        Optional<RegionAttributes> regions;
        Optional<FigureColumns> figures;
        try {
            regions = RegionAttributes.read(regionsFile);
        } catch (IOException e) {
            return usage(regionsFile + ": its attributes cannot be read (" + e + "); check that the file is complete.");
        }
        try {
            figures = FigureColumns.read(figuresFile);
        } catch (IOException e) {
            return usage(figuresFile + ": its columns cannot be read (" + e + "); text files must be UTF-8.");
        }
        if (regions.isEmpty()) {
            return usage(regionsFile + ": scaffold reads regions from " + RegionAttributes.KINDS + "; convert the file first.");
        }
        if (figures.isEmpty()) {
            return usage(figuresFile + ": scaffold reads figures from " + FigureColumns.KINDS + "; convert the file first.");
        }
        KeyPairGuess.Guess guess = KeyPairGuess.best(regions.get().attributes(), figures.get().columns());
        if (guess == null) {
            return usage((regions.get().attributes().isEmpty() ? regionsFile + " has no attributes" : figuresFile + " has no columns")
                    + " to join on.");
        }
        Optional<String> indicator = firstNumericColumn(figures.get().columns(), guess.column());
        if (indicator.isEmpty()) {
            return usage(figuresFile + " has no column of numbers besides the key column '" + guess.column() + "' to map.");
        }
        String regionsCopy = "regions/" + regionsFile.getFileName();
        String figuresCopy = "figures/" + figuresFile.getFileName();
        copy(regionsFile, dir.resolve(regionsCopy));
        if (regionsCopy.toLowerCase(Locale.ROOT).endsWith(".shp")) {
            copySidecars(regionsFile, dir.resolve("regions"));
        }
        copy(figuresFile, dir.resolve(figuresCopy));
        String name = regions.get().attributes().keySet().stream()
                .filter(a -> !a.equals(guess.attribute()) && a.toLowerCase(Locale.ROOT).contains("name")).findFirst().orElse("");
        Files.writeString(dir.resolve("aequa.yaml"), ProjectFileText.of(regionsCopy, regions.get().part(), guess, name,
                figuresCopy, figures.get().table(), indicator.get()), StandardCharsets.UTF_8);
        out.println("Wrote a new project in " + dir + " from " + regionsFile.getFileName() + " and " + figuresFile.getFileName()
                + ": regions keyed by '" + guess.attribute() + "', figures by '" + guess.column() + "', one map of '"
                + indicator.get() + "'.");
        if (guess.relaxed()) {
            out.println("Only relaxed matching (letter case, blanks, leading zeros) joins these keys, so the project says"
                    + " key-matching: relaxed; check the join with aequa audit.");
        }
        return dryRun(guess);
    }

    /** Loads the written project as {@code aequa audit} does and prints how many regions the join matched. */
    private int dryRun(KeyPairGuess.Guess guess) {
        Findings findings = new Findings();
        Optional<LoadedProject> project = ProjectLoader.load(dir, findings);
        if (project.isEmpty()) {
            FindingsPrinter.print(findings.list(), err, false);
            return ExitCode.DATA_PROBLEMS.code;
        }
        Atlas atlas = AtlasLoader.load(project.get(), LoadOptions.defaults(), findings);
        FindingsPrinter.print(findings.list(), err, false, FindingsPrinter.SHOWN_PER_KIND, "; `aequa audit` lists every one");
        String pair = "key = " + guess.attribute() + " (regions) and " + guess.column() + " (figures)";
        for (MapModel map : atlas.maps()) {
            long matched = map.regions().stream().filter(r -> r.values().stream()
                    .anyMatch(v -> v.status() != FigureStatus.NO_DATA)).count();
            out.println(String.format(Locale.ROOT, "Join dry run: %,d of %,d regions matched on %s.", matched,
                    map.regions().size(), pair));
        }
        if (atlas.maps().isEmpty()) {
            out.println(String.format(Locale.ROOT, "Join dry run: the map could not be built; in the files, %,d of %,d"
                    + " regions find a row on %s.", guess.matchedRegions(), guess.regions(), pair));
        }
        if (atlas.maps().isEmpty() || guess.weak()) {
            out.println("Fewer than half the regions match on the best pair found (" + pair + "): check 'key' in "
                    + dir.resolve("aequa.yaml") + " before publishing.");
        }
        return findings.hasErrors() ? ExitCode.DATA_PROBLEMS.code : ExitCode.OK.code;
    }

    /** The first column other than the key whose filled cells are all plain numbers. */
    private static Optional<String> firstNumericColumn(Map<String, List<String>> columns, String keyColumn) {
        for (var column : columns.entrySet()) {
            List<String> filled = new ArrayList<>();
            for (String value : column.getValue()) {
                if (value != null && !value.isBlank()) {
                    filled.add(value.strip());
                }
            }
            if (!column.getKey().equals(keyColumn) && !filled.isEmpty()
                    && filled.stream().allMatch(v -> NUMBER.matcher(v).matches())) {
                return Optional.of(column.getKey());
            }
        }
        return Optional.empty();
    }

    private static void copy(Path from, Path to) throws IOException {
        Files.createDirectories(to.getParent());
        Files.copy(from, to);
    }

    /** Copies the files beside a {@code .shp} that share its base name and end in a sidecar extension. */
    private static void copySidecars(Path shp, Path regionsDir) throws IOException {
        String fileName = shp.getFileName().toString();
        String base = fileName.substring(0, fileName.length() - ".shp".length());
        Path folder = shp.toAbsolutePath().getParent();
        try (var siblings = Files.list(folder)) {
            for (Path sibling : siblings.sorted().toList()) {
                String name = sibling.getFileName().toString();
                String lower = name.toLowerCase(Locale.ROOT);
                if (name.startsWith(base) && SHAPEFILE_SIDECARS.stream().anyMatch(ext -> lower.equals(
                        base.toLowerCase(Locale.ROOT) + ext))) {
                    copy(sibling, regionsDir.resolve(name));
                }
            }
        }
    }

    private int usage(String message) {
        err.println("aequa: " + message);
        return ExitCode.USAGE.code;
    }
}
