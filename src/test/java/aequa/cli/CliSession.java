package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

/** Runs aequa in this process as the command line would, collecting what it prints. */
final class CliSession {

    final StringWriter out = new StringWriter();
    final StringWriter err = new StringWriter();

    /** The exit code of {@code aequa ARGS}. */
    int run(String... args) {
        return Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    /** A new starter project at {@code project} (checked to succeed), with the printed text cleared. */
    Path scaffold(Path project) {
        assertEquals(0, run("scaffold", project.toString()));
        out.getBuffer().setLength(0);
        err.getBuffer().setLength(0);
        return project;
    }

    String errText() {
        return err.toString();
    }
}
