package aequa.cli;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;

import aequa.atlas.Atlas;
import aequa.atlas.AtlasLoader;
import aequa.atlas.LoadOptions;
import aequa.atlas.MapModel;
import aequa.findings.Findings;
import aequa.inputs.CacheFolder;
import aequa.project.LoadedProject;
import aequa.project.ProjectLoader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** Runs step 1 of a build (load and check everything) and prints the findings; writes nothing. */
@Command(name = "audit", mixinStandardHelpOptions = true,
        description = "Check every input and print the join, area and projection findings, without writing pages.")
final class AuditCommand implements Callable<Integer> {

    @Parameters(paramLabel = "PROJECT_DIR", defaultValue = "data-demo", description = "The project folder (default: ${DEFAULT-VALUE}).")
    Path projectDir;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Findings findings = new Findings();
        Optional<LoadedProject> project = ProjectLoader.load(projectDir, findings);
        var err = spec.commandLine().getErr();
        if (project.isEmpty()) {
            FindingsPrinter.print(findings.list(), err, true);
            return ExitCode.USAGE.code;
        }
        Atlas atlas = AtlasLoader.load(project.get(),
                LoadOptions.defaults().withCache(CacheFolder.of(project.get().dir()), LoadOptions.CacheUse.READ), findings);
        FindingsPrinter.print(findings.list(), err, true);
        var out = spec.commandLine().getOut();
        for (MapModel map : atlas.maps()) {
            out.println(MapSummary.line(map));
        }
        out.println("Audit of " + projectDir + ": " + atlas.maps().size() + " of " + project.get().file().maps().size()
                + " maps ready; " + FindingsPrinter.tally(findings.list()) + ".");
        return findings.hasErrors() ? ExitCode.DATA_PROBLEMS.code : ExitCode.OK.code;
    }
}
