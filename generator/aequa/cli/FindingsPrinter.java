package aequa.cli;

import java.io.PrintWriter;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import aequa.findings.Finding;
import aequa.findings.Severity;

/**
 * Prints findings for a person at a terminal: errors first, then warnings, then notes, one line each. The
 * commands that build something show a few findings of each kind and count the rest, so a real boundary
 * file's many repairs do not bury the result; {@code audit} shows every one.
 */
final class FindingsPrinter {

    /** How many findings of one kind the building commands show. */
    static final int SHOWN_PER_KIND = 5;

    private FindingsPrinter() {
    }

    /** Every finding (notes only when {@code withNotes}). */
    static void print(List<Finding> findings, PrintWriter err, boolean withNotes) {
        print(findings, err, withNotes, Integer.MAX_VALUE, "");
    }

    /**
     * At most {@code perKind} findings of each severity and code, then one line counting the others and
     * saying {@code whereAll} they can be read.
     */
    static void print(List<Finding> findings, PrintWriter err, boolean withNotes, int perKind, String whereAll) {
        for (Severity severity : Severity.values()) {
            if (severity == Severity.NOTE && !withNotes) {
                continue;
            }
            Map<String, Integer> seen = new HashMap<>();
            Map<String, Integer> hidden = new TreeMap<>();
            for (Finding f : findings) {
                if (f.severity() != severity) {
                    continue;
                }
                if (seen.merge(f.code(), 1, Integer::sum) <= perKind) {
                    err.println(f.toLine());
                } else {
                    hidden.merge(f.code(), 1, Integer::sum);
                }
            }
            hidden.forEach((code, n) -> err.println(severity.name().toLowerCase(Locale.ROOT) + ": ... and "
                    + plural(n, "more finding") + " of this kind (" + code + ")" + whereAll + "."));
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
