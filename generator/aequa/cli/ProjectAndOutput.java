package aequa.cli;

import java.nio.file.Path;

import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The project folder and output folder that {@code publish} and {@code preview} share. */
final class ProjectAndOutput {

    @Parameters(paramLabel = "PROJECT_DIR", defaultValue = "data-demo", description = "The project folder (default: ${DEFAULT-VALUE}).")
    Path projectDir;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "site-out", description = "The output folder (default: ${DEFAULT-VALUE}).")
    Path outDir;

    @Option(names = "--wait", paramLabel = "SECONDS", defaultValue = "0",
            description = "When another publish is writing the same output, wait up to this long for it (default: ${DEFAULT-VALUE}, fail at once with exit code 4).")
    long waitSeconds;
}
