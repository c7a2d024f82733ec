package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;

import org.junit.jupiter.api.Test;

import aequa.atlas.MapModel;
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
}
