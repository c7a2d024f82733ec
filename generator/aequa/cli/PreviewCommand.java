package aequa.cli;

import java.io.IOException;
import java.time.Duration;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;

import aequa.publish.PreviewServer;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** Publishes, serves the site on this computer only, and rebuilds and reloads when an input changes. */
@Command(name = "preview", mixinStandardHelpOptions = true,
        description = {"Publish, serve the site on this computer, and rebuild and reload when an input changes.",
                "The site is served at http://127.0.0.1:PORT/ only; open pages reload by themselves. Stop with Ctrl-C."})
final class PreviewCommand implements Callable<Integer> {

    @Mixin
    ProjectAndOutput folders;

    @Option(names = "--port", defaultValue = "8123", description = "The port on 127.0.0.1 (default: ${DEFAULT-VALUE}; 0 for any free port).")
    int port;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException, InterruptedException {
        var out = spec.commandLine().getOut();
        var err = spec.commandLine().getErr();
        SiteBuilder builder = new SiteBuilder(out, err);
        ExitCode first = builder.build(folders.projectDir, folders.outDir, Duration.ofSeconds(folders.waitSeconds), true);
        if (first != ExitCode.OK) {
            err.println("aequa: fix the problems above, then run preview again.");
            return first.code;
        }
        PreviewServer.Rebuild rebuild = () -> {
            ExitCode code = builder.build(folders.projectDir, folders.outDir, Duration.ofSeconds(folders.waitSeconds), false);
            if (code != ExitCode.OK) {
                throw new IllegalStateException("the project has problems (listed above)");
            }
        };
        try (PreviewServer server = PreviewServer.start(folders.outDir, folders.projectDir, rebuild, port, Duration.ofSeconds(1),
                line -> {
                    out.println("aequa preview: " + line);
                    out.flush();
                })) {
            out.println("Serving " + folders.outDir + " at " + server.address() + " (this computer only). Stop with Ctrl-C.");
            out.flush();
            new CountDownLatch(1).await();
        }
        return ExitCode.OK.code;
    }
}
