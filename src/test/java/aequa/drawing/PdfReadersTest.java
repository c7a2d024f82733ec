package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.MapModel;
import aequa.project.ClassMethod;

/**
 * Every PDF aequa draws is read without a complaint by outside, general-purpose PDF readers from Debian:
 * qpdf's structural check ({@code qpdf --check}: object syntax, cross-reference table, stream lengths and
 * filters; exit 0 only with no error and no warning) and poppler ({@code pdftoppm} renders the page and prints
 * "Syntax Error" lines on standard error for anything it had to guess; {@code pdfinfo} reads the title back).
 * Titles carry what PDF literal strings must escape (ISO 32000-1, section 7.3.4.2: unbalanced brackets,
 * backslashes) and characters beyond one byte. .ci/run installs both tools (Debian packages qpdf and
 * poppler-utils); without them this test fails: it never skips.
 */
class PdfReadersTest {

    /** Map titles a user can write: brackets balanced and not, a backslash, a superscript, Arabic digits and script. */
    private static final List<String> TITLES = List.of(
            "Rate (per 1,000 people",
            "Share of households (%) b) \\ c",
            "Clinics per 1,000 km\u00b2",
            "\u0627\u0644\u0639\u064a\u0627\u062f\u0627\u062a (\u0644\u0643\u0644 \u0661\u0660\u0660\u0660)");

    @TempDir
    Path folder;

    @Test
    void qpdfAndPopplerReadEveryDisplayWithoutComplaint() throws IOException, InterruptedException {
        List<MapModel> maps = List.of(
                MapFixtures.choropleth(10, 8),
                MapFixtures.build(12, 10, List.of("2024"), "circles", ClassMethod.QUANTILE, 5, 3),
                MapFixtures.build(8, 6, List.of("2023", "2024"), "choropleth", ClassMethod.EQUAL_INTERVAL, 4, 3));
        for (int i = 0; i < maps.size(); i++) {
            for (String theme : List.of("newsprint", "daylight")) {
                String title = TITLES.get((i + theme.length()) % TITLES.size());
                assertReadWithoutComplaint(maps.get(i), theme, title, "map" + i + "-" + theme);
            }
        }
    }

    @Test
    void everyAwkwardTitleIsReadBackAsWritten() throws IOException, InterruptedException {
        MapModel map = MapFixtures.choropleth(6, 5);
        for (int i = 0; i < TITLES.size(); i++) {
            assertReadWithoutComplaint(map, "newsprint", TITLES.get(i), "title" + i);
        }
    }

    private void assertReadWithoutComplaint(MapModel map, String theme, String title, String name)
            throws IOException, InterruptedException {
        MapModel titled = MapFixtures.withSpec(map, map.spec().toBuilder().title(title).build());
        Path pdf = folder.resolve(name + ".pdf");
        Files.write(pdf, MapDrawings.pdf(titled, Themes.bundled(theme), PrintSize.of(PrintPreset.TWO_COLUMNS),
                DrawOptions.print()).bytes());
        String what = name + " titled \"" + title + "\"";

        Run check = run("qpdf", "--check", pdf.toString());
        assertEquals(0, check.exit(), what + ": qpdf --check\n" + check.stdout() + check.stderr());
        assertTrue(check.stdout().contains("No syntax or stream encoding errors found"), what + ": " + check.stdout());
        assertFalse((check.stdout() + check.stderr()).contains("WARNING"), what + ": " + check.stderr());

        Run info = run("pdfinfo", "-enc", "UTF-8", pdf.toString());
        assertEquals(0, info.exit(), what + ": pdfinfo " + info.stderr());
        assertEquals("", info.stderr(), what + ": pdfinfo complained");
        assertTrue(info.stdout().lines().anyMatch(line -> line.equals("Title:           " + title)), what + ": " + info.stdout());

        Run render = run("pdftoppm", "-r", "12", "-png", "-singlefile", pdf.toString(), folder.resolve(name).toString());
        assertEquals(0, render.exit(), what + ": pdftoppm " + render.stderr());
        assertEquals("", render.stderr(), what + ": pdftoppm complained");
        assertTrue(Files.size(folder.resolve(name + ".png")) > 0, what + ": rendered");
    }

    private record Run(int exit, String stdout, String stderr) {
    }

    /** Runs an outside tool; fails (never skips) when it is not installed. */
    private Run run(String... command) throws IOException, InterruptedException {
        Path err = Files.createTempFile(folder, "stderr", ".txt");
        Process process;
        try {
            process = new ProcessBuilder(new ArrayList<>(List.of(command))).redirectError(err.toFile()).start();
        } catch (IOException e) {
            fail(command[0] + " is needed for this test (Debian: apt-get install qpdf poppler-utils; .ci/run installs"
                    + " them): " + e.getMessage());
            return null;
        }
        process.getOutputStream().close();
        String stdout = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(process.waitFor(60, TimeUnit.SECONDS), command[0] + " did not finish");
        return new Run(process.exitValue(), stdout, Files.readString(err, StandardCharsets.UTF_8));
    }
}
