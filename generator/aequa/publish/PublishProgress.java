package aequa.publish;

import java.io.PrintWriter;
import java.util.Locale;

/**
 * Receives progress of a publish, stage by stage. The CLI passes {@link #forTerminal(PrintWriter)} with the writer
 * it was given for messages; tests and scheduled jobs pass {@link #silent()}. Called from the publishing thread only.
 */
public interface PublishProgress {

    /** The stages of a publish, in order. */
    enum Stage {
        PREPARE("reading the previous edition"),
        MAPS("drawing maps"),
        REPORT("writing report.json"),
        PAGES("writing pages"),
        SWAP("publishing");

        private final String label;

        Stage(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /** {@code done} of {@code total} steps of {@code stage} are finished ({@code 0 <= done <= total}). */
    void step(Stage stage, int done, int total);

    /** Reports nothing. */
    static PublishProgress silent() {
        return (stage, done, total) -> { };
    }

    /**
     * One updating line per stage on {@code out} when the process runs in a terminal
     * ({@link System#console()} is not null); silent otherwise, so logs of scheduled jobs stay clean.
     */
    static PublishProgress forTerminal(PrintWriter out) {
        if (System.console() == null) {
            return silent();
        }
        return (stage, done, total) -> {
            out.printf(Locale.ROOT, "\r%-28s %d/%d", stage.label(), done, total);
            if (done == total) {
                out.println();
            }
            out.flush();
        };
    }
}
