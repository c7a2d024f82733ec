package aequa.publish;

import java.nio.file.Path;
import java.util.Optional;

import aequa.atlas.Atlas;
import aequa.atlas.AtlasLoader;
import aequa.atlas.LoadOptions;
import aequa.drawing.PrintSize;
import aequa.drawing.Theme;
import aequa.drawing.Themes;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.CacheFolder;
import aequa.project.LoadedProject;
import aequa.project.ProjectFile;
import aequa.project.ProjectLoader;

/**
 * Step 1 of a build, the one check of user data that {@code audit}, {@code publish} and {@code preview} all
 * run: the project file ({@link ProjectLoader}), its drawing settings (themes and print width), then every
 * input with the load options publish uses (the theme's page colour, the previous edition in the output
 * folder, the geometry cache). The same project and output folder therefore give the same findings whichever
 * command reads them; only the cache use differs (audit never writes).
 *
 * <p>The phases are separate calls so that {@code publish} can stop early when nothing changed and take the
 * output's lock before the load step; {@link #run} chains them for a command that only checks.
 */
public final class CheckStep {

    private CheckStep() {
    }

    /** How far a check got. */
    public enum Outcome {
        /** The project file or its drawing settings cannot be used (exit code 2); no input was read. */
        PROJECT_FILE_ERRORS,
        /** The inputs were read; at least one finding is an error (exit code 1). */
        DATA_ERRORS,
        /** Everything was read; no finding is an error. */
        CHECKED
    }

    /**
     * What {@link #run} found.
     *
     * @param outcome  how far the check got
     * @param project  the project file, when it could be used
     * @param atlas    the loaded maps, when the load step ran
     * @param findings every finding of every phase, in the order found
     */
    public record Result(Outcome outcome, Optional<LoadedProject> project, Optional<Atlas> atlas, Findings findings) {
    }

    /** All phases, reading the previous edition from {@code outDir} and the cache without writing it. */
    public static Result run(Path projectDir, Path outDir) {
        Findings findings = new Findings();
        Optional<LoadedProject> project = readProject(projectDir, findings);
        if (project.isEmpty()) {
            return new Result(Outcome.PROJECT_FILE_ERRORS, project, Optional.empty(), findings);
        }
        Optional<DrawingSettings> settings = readSettings(project.get(), findings);
        if (settings.isEmpty()) {
            return new Result(Outcome.PROJECT_FILE_ERRORS, project, Optional.empty(), findings);
        }
        Atlas atlas = load(project.get(), settings.get(), outDir, LoadOptions.CacheUse.READ, findings);
        return new Result(findings.hasErrors() ? Outcome.DATA_ERRORS : Outcome.CHECKED, project, Optional.of(atlas), findings);
    }

    /** Phase 1: the project file and the references between its sections; empty when it cannot be used. */
    public static Optional<LoadedProject> readProject(Path projectDir, Findings findings) {
        return ProjectLoader.load(projectDir, findings);
    }

    /**
     * Phase 2: the themes and the print width. Empty, with {@code theme-unknown}, {@code theme-invalid} or
     * {@code project-bad-value} findings, when one of them cannot be used.
     */
    public static Optional<DrawingSettings> readSettings(LoadedProject project, Findings findings) {
        Findings settings = new Findings();
        Theme theme = Themes.load(project.dir(), project.file().site().theme(), project.places().place("/site/theme"), settings);
        Theme printTheme = Themes.load(project.dir(), project.file().site().printTheme(),
                project.places().place("/site/print-theme"), settings);
        String printWidth = project.file().site().printWidth();
        Optional<PrintSize> printSize = PrintWidths.parse(printWidth);
        if (printSize.isEmpty()) {
            settings.add(Finding.error("project-bad-value", ProjectFile.FILE_NAME, project.places().place("/site/print-width"),
                    "'" + printWidth + "' is not a print width.", "Use " + PrintWidths.choices() + "."));
        }
        findings.addAll(settings);
        if (settings.hasErrors()) {
            return Optional.empty();
        }
        return Optional.of(new DrawingSettings(theme, printTheme, printSize.get()));
    }

    /**
     * Phase 3: every input of every map. Ramps, borders and hatches are checked against the theme's page
     * colour; a map keeps the projection of the edition published in {@code outDir} unless a new one is
     * clearly better.
     */
    public static Atlas load(LoadedProject project, DrawingSettings settings, Path outDir, LoadOptions.CacheUse cacheUse,
                             Findings findings) {
        LoadOptions options = new LoadOptions(settings.theme().colours().background(), PreviousProjections.read(outDir))
                .withCache(CacheFolder.of(project.dir()), cacheUse)
                .withFrameNameBands(settings.frameNameBands());
        return AtlasLoader.load(project, options, findings);
    }
}
