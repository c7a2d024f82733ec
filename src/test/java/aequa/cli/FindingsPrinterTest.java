package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import aequa.findings.Finding;

/** The building commands show a few findings of each kind and count the rest; audit shows all. */
class FindingsPrinterTest {

    private static List<Finding> findings() {
        List<Finding> findings = new ArrayList<>();
        for (int i = 0; i < 7; i++) {
            findings.add(Finding.warning("geometry-repaired", "b.geojson", "feature \"" + i + "\"", "Repaired.", "Check it."));
        }
        findings.add(Finding.error("key-duplicate", "b.geojson", "feature \"x\"", "Twice.", "Keep one."));
        findings.add(Finding.warning("ring-degenerate", "b.geojson", "feature \"y\"", "Too small.", "Remove it."));
        return findings;
    }

    private static List<String> printed(int perKind) {
        StringWriter text = new StringWriter();
        FindingsPrinter.print(findings(), new PrintWriter(text, true), false, perKind, "; audit lists every one");
        return text.toString().lines().toList();
    }

    @Test
    void showsAFewOfEachKindAndCountsTheRest() {
        List<String> lines = printed(5);
        assertEquals(1 + 5 + 1 + 1, lines.size(), String.join("\n", lines));
        assertEquals("error: b.geojson, feature \"x\": Twice. Hint: Keep one.", lines.get(0));
        assertEquals("warning: ... and 2 more findings of this kind (geometry-repaired); audit lists every one.", lines.get(7));
    }

    @Test
    void withoutALimitEveryFindingIsShown() {
        assertEquals(9, printed(Integer.MAX_VALUE).size());
    }
}
