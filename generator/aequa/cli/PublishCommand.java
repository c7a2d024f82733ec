package aequa.cli;

import java.io.IOException;
import java.time.Duration;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** Builds the site: checks every input, draws every map and swaps the new site into place. */
@Command(name = "publish", mixinStandardHelpOptions = true,
        description = {"Build the site of a project into an output folder.",
                "Nothing is written when the data has errors; the previous site stays as it was until the new one is complete."})
final class PublishCommand implements Callable<Integer> {

    @Mixin
    ProjectAndOutput folders;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        return new SiteBuilder(spec.commandLine().getOut(), spec.commandLine().getErr())
                .build(folders.projectDir, folders.outDir, Duration.ofSeconds(folders.waitSeconds), true).code;
    }
}
