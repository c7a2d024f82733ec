package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.colour.Rgb;
import aequa.colour.WcagContrast;
import aequa.findings.Finding;
import aequa.findings.Findings;

class ThemesTest {

    private static final List<String> BUNDLED = List.of("daylight", "newsprint", "contrast");

    @Test
    void bundledThemesLoadWithoutFindings() {
        for (String name : BUNDLED) {
            Findings findings = new Findings();
            Theme theme = Themes.load(null, name, findings);
            assertEquals(name, theme.name());
            assertTrue(findings.list().isEmpty(), findings.list().toString());
        }
    }

    @Test
    void textMeetsWcagAaContrastInEveryTheme() {
        // WCAG 2.2 success criterion 1.4.3: at least 4.5:1 for normal text
        for (String name : BUNDLED) {
            Theme.Colours c = Themes.bundled(name).colours();
            assertTrue(WcagContrast.ratio(c.text(), c.background()) >= 4.5, name + " text");
            assertTrue(WcagContrast.ratio(c.textMuted(), c.background()) >= 4.5, name + " muted text");
        }
    }

    @Test
    void newsprintHasNoPureBlackAndNoLineBelowAHairline() {
        Theme newsprint = Themes.bundled("newsprint");
        Theme.Colours c = newsprint.colours();
        for (Rgb colour : List.of(c.text(), c.textMuted(), c.outline(), c.noDataHatch(), c.unreliableHatch(), c.symbol())) {
            assertFalse(colour.equals(new Rgb(0, 0, 0)), "no pure black in print theme");
        }
        Theme.Lines l = newsprint.lines();
        for (LineWeight w : List.of(l.border(), l.outline(), l.graticule(), l.hatch(), l.symbolEdge())) {
            assertTrue(w.pt() >= 0.25, "line " + w);
        }
    }

    @Test
    void aProjectThemeReplacesTheBundledOne(@TempDir Path project) throws IOException {
        Path folder = Files.createDirectories(project.resolve("themes/daylight"));
        String yaml = new String(Themes.class.getResourceAsStream("/themes/daylight/theme.yaml").readAllBytes())
                .replace("background: \"#ffffff\"", "background: \"#fdfcf8\"");
        Files.writeString(folder.resolve("theme.yaml"), yaml);
        Findings findings = new Findings();
        Theme theme = Themes.load(project, "daylight", findings);
        assertEquals(new Rgb(0xfd, 0xfc, 0xf8), theme.colours().background());
        assertTrue(findings.list().isEmpty());
    }

    @Test
    void unknownAndBrokenThemesAreFindingsAndFallBack(@TempDir Path project) throws IOException {
        Findings findings = new Findings();
        assertEquals("daylight", Themes.load(project, "no-such-theme", findings).name());
        assertEquals("theme-unknown", findings.list().get(0).code());

        Path folder = Files.createDirectories(project.resolve("themes/broken"));
        Files.writeString(folder.resolve("theme.yaml"), "name: broken\ncolours: {background: \"#fff\"}\nshade: 3\n");
        Findings broken = new Findings();
        assertEquals("daylight", Themes.load(project, "broken", broken).name());
        Finding f = broken.list().get(0);
        assertEquals("theme-invalid", f.code());
        assertEquals("themes/broken/theme.yaml", f.file());

        Findings unsafe = new Findings();
        Themes.load(project, "../etc", unsafe);
        assertEquals("theme-unknown", unsafe.list().get(0).code());
    }

    @Test
    void aThemeGivesLineWeightsAsNamesTextOrBareNumbers(@TempDir Path project) throws IOException {
        // themes/README.md: "lines (points, or a preset name ...)"; YAML reads 0.3 unquoted as a number
        Path folder = Files.createDirectories(project.resolve("themes/weights"));
        String yaml = new String(Themes.class.getResourceAsStream("/themes/daylight/theme.yaml").readAllBytes())
                .replace("name: daylight", "name: weights")
                .replace("border: fine", "border: 0.3")
                .replace("outline: medium", "outline: \"0.6pt\"");
        Files.writeString(folder.resolve("theme.yaml"), yaml);
        Findings findings = new Findings();
        Theme theme = Themes.load(project, "weights", findings);
        assertTrue(findings.list().isEmpty(), findings.list().toString());
        assertEquals(0.3, theme.lines().border().pt());
        assertEquals(0.6, theme.lines().outline().pt());
        assertEquals(0.25, theme.lines().graticule().pt(), "hairline");
    }

    @Test
    void lineWeightPresetsAndNumbers() {
        assertEquals(0.25, LineWeight.parse("hairline").pt());
        assertEquals(0.35, LineWeight.parse("fine").pt());
        assertEquals(0.3, LineWeight.parse("0.3").pt());
        assertEquals(0.4, LineWeight.parse("0.4pt").pt());
    }
}
