package aequa.endtoend;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

import aequa.cli.Main;

/**
 * The demo project published once per test run, through the command line exactly as a user runs it
 * ({@code aequa publish data-demo --out ...}); shared by the end-to-end and browser tests.
 */
public final class DemoSite {

    private static final Path OUT = Path.of("target", "demo-site").toAbsolutePath();
    private static Path published;
    private static String terminal;

    private DemoSite() {
    }

    /** The folder of the published demo site. */
    public static synchronized Path folder() {
        if (published == null) {
            try {
                if (Files.exists(OUT)) {
                    deleteTree(OUT);
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            int code = Main.run(new String[] {"publish", "data-demo", "--out", OUT.toString()},
                    new PrintWriter(out, true), new PrintWriter(err, true));
            terminal = out + "\n" + err;
            if (code != 0) {
                throw new IllegalStateException("publishing the demo exited with " + code + ":\n" + terminal);
            }
            published = OUT;
        }
        return published;
    }

    /** What the publish printed (standard output, then standard error). */
    public static synchronized String terminal() {
        folder();
        return terminal;
    }

    private static void deleteTree(Path root) throws IOException {
        try (var paths = Files.walk(root)) {
            for (Path p : paths.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
