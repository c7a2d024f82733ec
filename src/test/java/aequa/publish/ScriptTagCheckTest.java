package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;

/**
 * The check that keeps a script out of the pages that inline a map's SVG. HTML tag names are
 * ASCII-case-insensitive (WHATWG HTML Living Standard, 13.2.5.8 "Tag name state": upper-case ASCII letters
 * are lowered), so every spelling of {@code <script} must be refused.
 */
class ScriptTagCheckTest {

    @Test
    void findsTheTagInAnyCaseAndAnywhere() {
        for (String svg : List.of("<script>x</script>", "<svg><SCRIPT src='a.js'/></svg>", "<svg><g/><ScRiPt>",
                "text < and then <scripT", "<svg>" + "<path d='M0 0'/>".repeat(10_000) + "<script")) {
            assertTrue(MapBuild.containsScriptTag(svg), svg.substring(Math.max(0, svg.length() - 40)));
        }
    }

    @Test
    void leavesOrdinaryMapsAlone() {
        for (String svg : List.of("", "<svg/>", "<svg><title>a script of figures</title></svg>", "<svg><scrip t/>",
                "script <", "<svg><g id='scripts'/><desc>&lt;script</desc></svg>", "<")) {
            assertFalse(MapBuild.containsScriptTag(svg), svg);
        }
    }

    /** The check agrees with the lower-case copy it replaced on text in several scripts and cases. */
    @Test
    void agreesWithALowerCaseSearch() {
        java.util.Random random = new java.util.Random(7);
        String[] pieces = {"<", "s", "S", "c", "C", "r", "R", "i", "I", "p", "P", "t", "T", "<script", "<SCRIPT", "é", "Ж", " "};
        for (int i = 0; i < 20_000; i++) {
            StringBuilder svg = new StringBuilder();
            for (int n = random.nextInt(12); n > 0; n--) {
                svg.append(pieces[random.nextInt(pieces.length)]);
            }
            String text = svg.toString();
            assertEquals(text.toLowerCase(Locale.ROOT).contains("<script"), MapBuild.containsScriptTag(text), text);
        }
    }
}
