package aequa.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Optional;

import aequa.atlas.Atlas;
import aequa.atlas.LoadOptions;
import aequa.findings.Findings;
import aequa.project.LoadedProject;
import aequa.publish.CheckStep;
import aequa.publish.DrawingArtwork;
import aequa.publish.DrawingSettings;
import aequa.publish.LastPublish;
import aequa.publish.PublishOptions;
import aequa.publish.PublishProgress;
import aequa.publish.PublishRefusedException;
import aequa.publish.PublishResult;
import aequa.publish.SiteLock;
import aequa.publish.SiteLockedException;
import aequa.publish.SitePublisher;

/**
 * One whole build, as {@code publish} and {@code preview} run it: the check step ({@link CheckStep}, the same
 * as {@code audit}'s), stop with the findings if the data has errors, otherwise publish (step 2). Returns the exit code; writes nothing at all
 * when it fails. When the inputs, aequa and the output are exactly as the last publish left them
 * ({@link LastPublish}), it says so and stops before step 1.
 */
final class SiteBuilder {

    private final PrintWriter out;
    private final PrintWriter err;

    SiteBuilder(PrintWriter out, PrintWriter err) {
        this.out = out;
        this.err = err;
    }

    /**
     * Loads and publishes. The output's lock is taken after the project file's own checks and before the
     * load step, so a second publish of a busy output learns it at once (waiting up to {@code lockWait}).
     */
    ExitCode build(Path projectDir, Path outDir, Duration lockWait, boolean showProgress) throws IOException {
        Findings findings = new Findings();
        Optional<LoadedProject> loaded = CheckStep.readProject(projectDir, findings);
        if (loaded.isEmpty()) {
            FindingsPrinter.print(findings.list(), err, false);
            return ExitCode.USAGE;
        }
        LoadedProject project = loaded.get();
        LastPublish last = LastPublish.check(project, outDir);
        if (last.unchanged()) {
            out.println("Nothing changed since the last publish (inputs, themes, templates and aequa are the same): "
                    + outDir + " was left as it was.");
            return ExitCode.OK;
        }
        Optional<DrawingSettings> settings = CheckStep.readSettings(project, findings);
        if (settings.isEmpty()) {
            FindingsPrinter.print(findings.list(), err, false);
            return ExitCode.USAGE;
        }
        try (SiteLock lock = SiteLock.acquire(outDir, lockWait)) {
            return loadAndPublish(project, settings.get(), lock, last, findings, showProgress);
        } catch (SiteLockedException e) {
            err.println("aequa: " + e.getMessage());
            return ExitCode.LOCKED;
        } catch (PublishRefusedException e) {
            err.println("aequa: " + e.getMessage());
            return ExitCode.USAGE;
        }
    }

    private ExitCode loadAndPublish(LoadedProject project, DrawingSettings settings, SiteLock lock, LastPublish last,
                                    Findings findings, boolean showProgress) throws IOException {
        Path outDir = lock.outDir();
        Atlas atlas = CheckStep.load(project, settings, outDir, LoadOptions.CacheUse.READ_AND_STORE, findings);
        FindingsPrinter.print(findings.list(), err, false, FindingsPrinter.SHOWN_PER_KIND, "; `aequa audit` lists every one");
        if (findings.hasErrors()) {
            err.println("aequa: nothing was published: " + FindingsPrinter.tally(findings.list())
                    + ". The site in " + outDir + " is unchanged.");
            return ExitCode.DATA_PROBLEMS;
        }
        DrawingArtwork artwork = new DrawingArtwork(settings.theme(), settings.printTheme(), settings.printSize(),
                new Version().getVersion()[0]);
        PublishOptions publishOptions = PublishOptions.defaults()
                .withProgress(showProgress ? PublishProgress.forTerminal(err) : PublishProgress.silent());
        PublishResult result = SitePublisher.publish(atlas, findings.list(), artwork, lock, publishOptions);
        last.record(outDir);
        FindingsPrinter.print(artwork.preflightFindings(), err, false);
        for (var map : atlas.maps()) {
            out.println(MapSummary.line(map));
        }
        out.println(result.summary());
        return ExitCode.OK;
    }
}
