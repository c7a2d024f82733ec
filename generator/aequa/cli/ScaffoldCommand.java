package aequa.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * Writes a new, minimal project that {@code publish} builds as it is; with {@code --regions} and {@code --figures},
 * a project made from the user's two files ({@link ScaffoldFromFiles}).
 */
@Command(name = "scaffold", mixinStandardHelpOptions = true,
        description = {"Write a new minimal project (project file, regions, figures) into DIR.",
                "With --regions and --figures, start from your own files: their keys are guessed and checked by a join dry run."})
final class ScaffoldCommand implements Callable<Integer> {

    /** The files of the starter project, bundled as resources under /aequa/scaffold/. */
    private static final List<String> FILES = List.of("aequa.yaml", "regions/districts.geojson", "figures/districts.csv");

    @Parameters(paramLabel = "DIR", description = "A folder that does not exist yet, or is empty.")
    Path dir;

    @Option(names = "--regions", paramLabel = "FILE",
            description = "Your region boundaries (GeoJSON, TopoJSON, Shapefile .shp or .zip); copied into DIR/regions/.")
    Path regionsFile;

    @Option(names = "--figures", paramLabel = "FILE",
            description = "Your figures (CSV/TSV or .xlsx workbook); copied into DIR/figures/.")
    Path figuresFile;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        if (Files.exists(dir) && (!Files.isDirectory(dir) || hasEntries(dir))) {
            spec.commandLine().getErr().println("aequa: " + dir + " already exists and is not an empty folder; "
                    + "scaffold never overwrites files. Name a new folder.");
            return ExitCode.USAGE.code;
        }
        if ((regionsFile == null) != (figuresFile == null)) {
            spec.commandLine().getErr().println("aequa: give both --regions FILE and --figures FILE, or neither.");
            return ExitCode.USAGE.code;
        }
        if (regionsFile != null) {
            return new ScaffoldFromFiles(dir, spec.commandLine().getOut(), spec.commandLine().getErr())
                    .run(regionsFile, figuresFile);
        }
        for (String name : FILES) {
            Path target = dir.resolve(name);
            Files.createDirectories(target.getParent());
            try (InputStream in = ScaffoldCommand.class.getResourceAsStream("/aequa/scaffold/" + name)) {
                if (in == null) {
                    throw new IllegalStateException("starter file missing from the build: " + name);
                }
                Files.copy(in, target);
            } catch (FileAlreadyExistsException e) {
                throw new IllegalStateException("raced with another writer on " + target, e);
            }
        }
        spec.commandLine().getOut().println("Wrote a new project in " + dir + ". Build it with: aequa publish " + dir);
        return ExitCode.OK.code;
    }

    private static boolean hasEntries(Path folder) throws IOException {
        try (var entries = Files.list(folder)) {
            return entries.findAny().isPresent();
        }
    }
}
