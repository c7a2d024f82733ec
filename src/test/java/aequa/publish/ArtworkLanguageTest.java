package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.MapModel;
import aequa.drawing.Theme;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.drawing.PrintPreset;
import aequa.drawing.PrintSize;
import aequa.drawing.Themes;
import aequa.wording.Language;
import aequa.wording.Wording;

/**
 * Every picture the publisher writes into a language's folder is drawn in that language: the two PNGs, made
 * from one painting, are the same pictures {@link DrawingArtwork#png} draws in that language, not English ones.
 */
class ArtworkLanguageTest {

    @Test
    void bothPngsOfAFrenchMapAreDrawnInFrench() {
        MapModel map = SiteFixtures.map("langue", SiteFixtures.Texts.plain(), 12, 0.5);
        DrawingArtwork english = new DrawingArtwork(Themes.bundled("daylight"), Themes.bundled("newsprint"),
                PrintSize.of(PrintPreset.TWO_COLUMNS), "test");
        DrawingArtwork french = english.inLanguage(Wording.of(Language.parse("fr").orElseThrow()));
        byte[][] pair = french.pngs(map, 600);
        assertArrayEquals(french.png(map, 600, 2), pair[1], "the 2x PNG is the French painting");
        assertFalse(Arrays.equals(english.png(map, 600, 2), pair[1]), "the French PNG differs from the English one");
        // the same words in the vector drawing (a legend range in French: "de 1 à moins de 2")
        assertTrue(new String(french.printSvg(map), StandardCharsets.UTF_8).contains(" à moins de "));
    }

    @Test
    void whatThePrintPreflightFindsInAnEditionReachesTheTerminal(@TempDir Path project) throws IOException {
        // publish draws every edition, the first language's too, with a copy made by inLanguage, and prints
        // the preflight findings of the artwork it made: a print theme whose ink limit (1 %) every colour but
        // white exceeds must give findings there, once per map however many languages draw it
        Path folder = Files.createDirectories(project.resolve("themes/thin-ink"));
        Files.writeString(folder.resolve("theme.yaml"), new String(Themes.class.getResourceAsStream("/themes/newsprint/theme.yaml")
                .readAllBytes(), StandardCharsets.UTF_8).replace("name: newsprint", "name: thin-ink")
                .replace("ink-limit-percent: 240", "ink-limit-percent: 1"));
        Findings loading = new Findings();
        Theme thinInk = Themes.load(project, "thin-ink", loading);
        assertEquals(List.of(), loading.list());
        MapModel map = SiteFixtures.map("encre", SiteFixtures.Texts.plain(), 12, 0.5);
        DrawingArtwork artwork = new DrawingArtwork(Themes.bundled("daylight"), thinInk, PrintSize.of(PrintPreset.TWO_COLUMNS), "test");
        artwork.inLanguage(Wording.english()).printSvg(map);
        List<Finding> found = artwork.preflightFindings();
        assertFalse(found.isEmpty());
        assertTrue(found.stream().allMatch(f -> f.code().equals("print-ink-too-heavy")), found.toString());
        artwork.inLanguage(Wording.of(Language.parse("fr").orElseThrow())).printSvg(map);
        assertEquals(found, artwork.preflightFindings(), "the second language's drawing of the map adds nothing");
    }
}
