package aequa.cli;

import java.io.PrintWriter;
import java.util.List;

import aequa.findings.Finding;
import aequa.findings.Severity;

/** Prints findings for a person at a terminal: errors first, then warnings, then notes, one line each. */
final class FindingsPrinter {

    private FindingsPrinter() {
    }

    static void print(List<Finding> findings, PrintWriter err, boolean withNotes) {
        for (Severity severity : Severity.values()) {
            if (severity == Severity.NOTE && !withNotes) {
                continue;
            }
            findings.stream().filter(f -> f.severity() == severity).forEach(f -> err.println(f.toLine()));
        }
    }

    static String tally(List<Finding> findings) {
        long errors = findings.stream().filter(f -> f.severity() == Severity.ERROR).count();
        long warnings = findings.stream().filter(f -> f.severity() == Severity.WARNING).count();
        return plural(errors, "error") + ", " + plural(warnings, "warning");
    }

    private static String plural(long n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
    }
}
