package aequa.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import aequa.atlas.MapModel;
import aequa.publish.CheckStep;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * Runs step 1 of a build ({@link CheckStep}, exactly as publish runs it) and prints every finding; writes nothing,
 * not even the geometry cache.
 */
@Command(name = "audit", mixinStandardHelpOptions = true,
        description = "Check every input and print the join, area and projection findings, without writing pages.")
final class AuditCommand implements Callable<Integer> {

    @Parameters(paramLabel = "PROJECT_DIR", defaultValue = "data-demo", description = "The project folder (default: ${DEFAULT-VALUE}).")
    Path projectDir;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "site-out",
            description = "The output folder whose published edition publish would keep projections from (default: ${DEFAULT-VALUE}); only read.")
    Path outDir;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        CheckStep.Result checked = CheckStep.run(projectDir, outDir);
        var err = spec.commandLine().getErr();
        FindingsPrinter.print(checked.findings().list(), err, true);
        if (checked.outcome() == CheckStep.Outcome.PROJECT_FILE_ERRORS) {
            return ExitCode.USAGE.code;
        }
        var out = spec.commandLine().getOut();
        List<MapModel> maps = checked.atlas().orElseThrow().maps();
        for (MapModel map : maps) {
            out.println(MapSummary.line(map));
        }
        out.println("Audit of " + projectDir + ": " + maps.size() + " of " + checked.project().orElseThrow().file().maps().size()
                + " maps ready; " + FindingsPrinter.tally(checked.findings().list()) + ".");
        return checked.outcome() == CheckStep.Outcome.DATA_ERRORS ? ExitCode.DATA_PROBLEMS.code : ExitCode.OK.code;
    }
}
