package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A site published in two languages shows the project's own words (site title and notice, each map's title,
 * unit, notes and source) in the language of each edition where the project translates them, and as written
 * where it does not. The starter project's districts and figures are invented; only where words go is checked.
 */
class TranslatedProjectTextsTest {

    @TempDir
    static Path tmp;

    private static Path site;
    private static String terminal;
    private static int germanLine;

    @BeforeAll
    static void publishEnglishAndFrench() throws IOException {
        Path project = tmp.resolve("project");
        StringWriter ignored = new StringWriter();
        assertEquals(0, Main.run(new String[] {"scaffold", project.toString()}, new PrintWriter(ignored), new PrintWriter(ignored)));
        String yaml = Files.readString(project.resolve("aequa.yaml"), StandardCharsets.UTF_8)
                .replace("  notice: \"The example districts and figures in this starter project are invented.\"\n",
                        String.join("\n",
                                "  notice: \"The example districts and figures in this starter project are invented.\"",
                                "  languages: [en, fr]",
                                "  translations:",
                                "    fr: { title: \"Mes cartes\", notice: \"Les districts et les chiffres de ce projet sont inventés.\" }",
                                ""))
                .replace("    as-of: \"2025\"\n", String.join("\n",
                        "    as-of: \"2025\"",
                        "    notes: \"Rates per 1,000 residents.\"",
                        "    translations:",
                        "      fr: { title: \"Taux par district\", unit: \"pour 1 000 habitants\", notes: \"Taux pour 1 000 résidents.\" }",
                        "      de: { title: \"Rate nach Bezirk\" }",
                        ""));
        Files.writeString(project.resolve("aequa.yaml"), yaml, StandardCharsets.UTF_8);
        germanLine = yaml.substring(0, yaml.indexOf("      de:")).split("\n", -1).length;
        site = tmp.resolve("site");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(0, Main.run(new String[] {"publish", project.toString(), "--out", site.toString()},
                new PrintWriter(out, true), new PrintWriter(err, true)), err.toString());
        terminal = out + "\n" + err;
    }

    private static String page(String path) throws IOException {
        return Files.readString(site.resolve(path), StandardCharsets.UTF_8);
    }

    @Test
    void theFrenchEditionShowsTheTranslatedWords() throws IOException {
        String map = page("fr/maps/example-rate/index.html");
        assertTrue(map.contains(">Taux par district</h1>"), "French title");
        assertTrue(map.contains("pour 1 000 habitants"), "French unit");
        assertTrue(map.contains("Taux pour 1 000 résidents."), "French notes");
        assertTrue(map.contains("Invented example figures"), "the source is not translated, so it is shown as written");
        assertFalse(map.contains("Example rate by district"), "no English title left on the French page");
        String index = page("fr/index.html");
        assertTrue(index.contains("Mes cartes") && index.contains("Taux par district")
                && index.contains("Les districts et les chiffres de ce projet sont inventés."), "French index");
        assertTrue(page("fr/maps/example-rate/example-rate-web.svg").contains("pour 1 000 habitants"), "the map's own legend");
    }

    @Test
    void theFirstEditionKeepsTheWordsAsWritten() throws IOException {
        String map = page("maps/example-rate/index.html");
        assertTrue(map.contains(">Example rate by district</h1>"));
        assertTrue(map.contains("Rates per 1,000 residents."));
        assertFalse(map.contains("Taux par district"));
        assertTrue(page("index.html").contains("My maps"));
    }

    @Test
    void aTranslationForALanguageTheSiteDoesNotPublishIsReportedAtItsLine() {
        assertTrue(terminal.contains("aequa.yaml, line " + germanLine + ", column 7: The site is not published in \"de\""), terminal);
    }
}
