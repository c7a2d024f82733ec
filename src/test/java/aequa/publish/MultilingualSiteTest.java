package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.findings.Severity;
import aequa.project.ProjectFile;
import aequa.project.SiteSpec;
import aequa.wording.SiteWording;

/**
 * One project published in English, French and Arabic: the first language at the root, the others in their
 * folders with the same pages, links between the versions (hreflang and visible), one report.json, the
 * project's own wording applied, and every problem in that wording reported with its file and line.
 */
class MultilingualSiteTest {

    @TempDir
    static Path tmp;

    private static Map<String, byte[]> site;
    private static Findings findings;

    @BeforeAll
    static void publishThreeLanguages() throws IOException {
        Path project = tmp.resolve("project");
        Files.createDirectories(project.resolve("wording"));
        Files.writeString(project.resolve("wording/fr.txt"), String.join("\n",
                "# our own words",
                "map.colourKey = Légende",
                "map.colourKye = typo",
                "map.source = Source : {sauce}",
                "draw.noData = {broken"), StandardCharsets.UTF_8);
        MapModel map = SiteFixtures.map("map-a", SiteFixtures.Texts.plain(), 12, 1234.5);
        SiteSpec siteSpec = new SiteSpec("Atlas", "Invented Mapping Collective", SiteFixtures.NOTICE, null, null, null, null,
                List.of("en", "fr", "ar"));
        ProjectFile file = new ProjectFile(siteSpec, Map.of(), Map.of(), null, null, List.of(map.spec()));
        findings = new Findings();
        Atlas atlas = new Atlas(project, file, List.of(map), SiteWording.load(project, siteSpec.languages(), findings));
        Path out = tmp.resolve("site");
        SitePublisher.publish(atlas, new FakeArtwork(), out, PublishOptions.defaults());
        site = PublishTestSupport.files(out);
    }

    private static String page(String name) {
        byte[] bytes = site.get(name);
        assertTrue(bytes != null, "missing " + name + " in " + site.keySet());
        return new String(bytes, StandardCharsets.UTF_8);
    }

    @Test
    void eachLanguageHasTheWholeTreeAndOneReportServesAll() {
        for (String prefix : List.of("", "fr/", "ar/")) {
            for (String name : List.of("index.html", "method.html", "changes.html", "maps/map-a/index.html",
                    "maps/map-a/figures.html", "maps/map-a/map-a.csv")) {
                page(prefix + name);
            }
        }
        assertTrue(site.containsKey("report.json"));
        assertFalse(site.containsKey("fr/report.json") || site.containsKey("ar/report.json"));
        assertFalse(site.containsKey("fr/assets/site.css"), "the stylesheets are shared at the root");
        assertTrue(page("fr/index.html").contains("href=\"../assets/site.css\""));
    }

    @Test
    void versionsLinkToEachOtherWithHreflang() {
        String french = page("fr/maps/map-a/index.html");
        assertTrue(french.contains("<html lang=\"fr\" dir=\"ltr\">"), french);
        assertTrue(french.contains("<link rel=\"alternate\" hreflang=\"en\" href=\"../../../maps/map-a/index.html\"/>"), french);
        assertTrue(french.contains("<link rel=\"alternate\" hreflang=\"ar\" href=\"../../../ar/maps/map-a/index.html\"/>"), french);
        assertTrue(french.contains("hreflang=\"fr\" lang=\"fr\" aria-current=\"page\">Français</a>"), french);
        String english = page("index.html");
        assertTrue(english.contains("<link rel=\"alternate\" hreflang=\"fr\" href=\"fr/index.html\"/>"), english);
        assertTrue(english.contains("lang=\"ar\">العربية</a>"), english);
    }

    @Test
    void wordsAndNumbersFollowTheLanguage() {
        String french = page("fr/maps/map-a/index.html");
        assertTrue(french.contains("<h2 id=\"key-map-a\">Légende</h2>"), "the project's override applies: " + french);
        assertTrue(french.contains("Téléchargements"), french);
        assertTrue(french.contains("Source : "), "a broken override leaves the shipped message: " + french);
        // region 5 reports 1,284.5: French groups with U+202F and writes a decimal comma (CLDR fr)
        String table = page("fr/maps/map-a/figures.html");
        assertTrue(table.contains("1\u202f284,5"), table);
        assertTrue(table.contains("pas de données"), table);
        String arabic = page("ar/maps/map-a/index.html");
        assertTrue(arabic.contains("<html lang=\"ar\" dir=\"rtl\">"), arabic);
        assertTrue(arabic.contains("مفتاح الألوان"), arabic);
    }

    @Test
    void theCsvKeepsMachineNumbersInEveryLanguageAndThePagesSaySo() {
        assertEquals(page("maps/map-a/map-a.csv"), page("fr/maps/map-a/map-a.csv"));
        assertTrue(page("fr/maps/map-a/map-a.csv").contains("1284.5"));
        assertTrue(page("fr/maps/map-a/index.html").contains("un point comme séparateur décimal"));
    }

    @Test
    void everyProblemInTheProjectsWordingIsAFindingWithFileAndLine() {
        List<String> seen = findings.list().stream().map(f -> f.code() + " " + f.file() + " " + f.place()).toList();
        assertTrue(seen.contains("wording-key-unknown wording/fr.txt line 3"), seen.toString());
        assertTrue(seen.contains("wording-arguments-differ wording/fr.txt line 4"), seen.toString());
        assertTrue(seen.contains("wording-pattern-invalid wording/fr.txt line 5"), seen.toString());
        assertEquals(3, findings.list().size(), seen.toString());
        assertTrue(findings.list().stream().allMatch(f -> f.severity() == Severity.ERROR));
    }

    @Test
    void aLanguageWithoutMessagesIsReported() {
        Findings own = new Findings();
        SiteWording.load(tmp.resolve("none"), List.of("en", "xx", "de"), own);
        assertEquals(List.of("site-language-unknown", "site-language-unknown"), own.list().stream().map(Finding::code).toList());
    }
}
