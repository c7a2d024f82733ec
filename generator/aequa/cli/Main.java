package aequa.cli;

import java.io.PrintWriter;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ScopeType;

/** Entry point: parses the command line and turns each command's outcome into an exit code. */
@Command(name = "aequa", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Publishes static web sites of equal-area thematic maps.",
        subcommands = {PublishCommand.class, AuditCommand.class, ExplainCommand.class, ScaffoldCommand.class,
                PreviewCommand.class, CommandLine.HelpCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success",
                "1:the data has problems that the project file treats as errors",
                "2:usage or project-file error",
                "3:internal failure (please report it, with --debug output), or out of memory",
                "4:another publish is writing the same output folder (see --wait)"})
public final class Main implements Runnable {

    @Option(names = "--debug", scope = ScopeType.INHERIT, description = "Show stack traces of internal failures.")
    boolean debug;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "Name a command, for example 'aequa publish'.");
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        int code = run(args, out, err);
        out.flush();
        err.flush();
        System.exit(code);
    }

    /** Runs aequa as the command line would, writing to the given streams; returns the exit code. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        Main main = new Main();
        CommandLine cli = new CommandLine(main);
        cli.setOut(out);
        cli.setErr(err);
        cli.setExitCodeExceptionMapper(e -> ExitCode.INTERNAL.code);
        cli.setParameterExceptionHandler((e, args2) -> {
            err.println("aequa: " + e.getMessage());
            err.println("Try 'aequa --help' or 'aequa help " + e.getCommandLine().getCommandName() + "'.");
            return ExitCode.USAGE.code;
        });
        cli.setExecutionExceptionHandler((e, commandLine, parseResult) -> {
            err.println("aequa: internal failure: " + e);
            if (main.debug) {
                e.printStackTrace(err);
            } else {
                err.println("Run again with --debug to see where it happened, and please report it.");
            }
            return ExitCode.INTERNAL.code;
        });
        try {
            return cli.execute(args);
        } catch (OutOfMemoryError e) {
            err.println(MemoryAdvice.outOfMemory(Runtime.getRuntime().maxMemory()));
            return ExitCode.INTERNAL.code;
        }
    }
}
