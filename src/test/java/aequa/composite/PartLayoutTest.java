package aequa.composite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * Frame sizes of the layout, on an invented main part (a 1,000 km square, labelled as invented): a long name
 * takes two lines instead of widening its frame to the whole name, and a part at its own area scale gets a
 * band for its own square.
 */
class PartLayoutTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();
    private static final Envelope MAIN = new Envelope(0, 1_000_000, 0, 1_000_000);
    private static final List<Geometry> MAIN_REGIONS = List.of(GEOMETRY.toGeometry(MAIN));

    @Test
    void aLongNameTakesMoreLinesNotTheWholeWidth() {
        String name = "Guam and Commonwealth of the Northern Mariana Islands";
        double nameWidthM = PartLayout.nameWidthM(name, MAIN);
        Envelope islands = new Envelope(0, 20_000, 0, 200_000);
        PartLayout.Placement placed = PartLayout.place(MAIN_REGIONS,
                List.of(new PartLayout.Inset(islands, nameWidthM, "", false))).get(0);
        assertTrue(placed.nameLines() > 1 && placed.nameLines() <= PartLayout.MAX_NAME_LINES, "lines: " + placed.nameLines());
        assertTrue(placed.frameM().getWidth() < 0.7 * nameWidthM, placed.frameM().getWidth() + " for a name of " + nameWidthM);
        PartLayout.Placement shortName = PartLayout.place(MAIN_REGIONS,
                List.of(new PartLayout.Inset(islands, PartLayout.nameWidthM("Guam", MAIN), "", false))).get(0);
        assertEquals(1, shortName.nameLines());
        assertEquals(0, shortName.scaleBandM());
    }

    /**
     * A name of one word cannot break: however large a narrow print makes the bands, it keeps one line and its
     * frame is as wide as the word; a long name of many words breaks into more lines instead of widening its frame.
     */
    @Test
    void aNameBreaksOnlyBetweenWords() {
        Envelope islands = new Envelope(0, 20_000, 0, 200_000);
        double wordM = PartLayout.nameWidthM("Hawaii", MAIN);
        PartLayout.Placement oneWord = PartLayout.place(MAIN_REGIONS,
                List.of(new PartLayout.Inset(islands, wordM, PartLayout.TWO_LINE_WIDTH * wordM, wordM, "", false)), 0.08).get(0);
        assertEquals(1, oneWord.nameLines());
        double nameM = PartLayout.nameWidthM("The Outer Skerries", MAIN);
        PartLayout.Placement grown = PartLayout.place(MAIN_REGIONS,
                List.of(new PartLayout.Inset(islands, nameM, "", false)), 0.08).get(0);
        PartLayout.Placement own = PartLayout.place(MAIN_REGIONS, List.of(new PartLayout.Inset(islands, nameM, "", false))).get(0);
        assertTrue(grown.nameLines() > own.nameLines(), grown.nameLines() + " lines against " + own.nameLines());
    }

    @Test
    void aPartAtItsOwnScaleHasRoomForItsSquareBelowItsRegions() {
        Envelope part = new Envelope(0, 300_000, 0, 300_000);
        PartLayout.Placement placed = PartLayout.place(MAIN_REGIONS,
                List.of(new PartLayout.Inset(part, PartLayout.nameWidthM("Far Isle", MAIN), "", true))).get(0);
        assertTrue(placed.scaleBandM() > 0);
        // the regions, moved, start above the band
        assertTrue(part.getMinY() + placed.dyM() >= placed.frameM().getMinY() + placed.scaleBandM() - 1e-6);
        // and end below the name band
        assertTrue(part.getMaxY() + placed.dyM() <= placed.frameM().getMaxY() - placed.nameBandM() + 1e-6);
    }

    /**
     * Asked for name bands of at least 8 % of the map's drawn width (a print too narrow for the layout's own
     * proportions), every one-line band reaches that share of the finished map's width (or of its height over the
     * tallest aspect, when the map is drawn by its height), and a name's room grows with its band.
     */
    @Test
    void nameBandsReachTheirLeastShareOfTheFinishedMap() {
        List<PartLayout.Inset> insets = List.of(
                new PartLayout.Inset(new Envelope(0, 200_000, 0, 300_000), PartLayout.nameWidthM("North Reach", MAIN), "", false),
                new PartLayout.Inset(new Envelope(0, 50_000, 0, 80_000), PartLayout.nameWidthM("Outer Skerries", MAIN), "", true));
        List<PartLayout.Placement> own = PartLayout.place(MAIN_REGIONS, insets);
        List<PartLayout.Placement> grown = PartLayout.place(MAIN_REGIONS, insets, 0.08);
        Envelope whole = new Envelope(MAIN);
        grown.forEach(p -> whole.expandToInclude(p.frameM()));
        double drawnWidthM = Math.max(whole.getWidth(), whole.getHeight() / PartLayout.MAX_ASPECT);
        for (int i = 0; i < insets.size(); i++) {
            PartLayout.Placement p = grown.get(i);
            double oneLineBandM = p.nameBandM() / (1 + PartLayout.EXTRA_LINE_BAND * (p.nameLines() - 1));
            assertTrue(oneLineBandM >= 0.08 * drawnWidthM, oneLineBandM + " against " + drawnWidthM);
            assertTrue(p.frameM().getWidth() > own.get(i).frameM().getWidth(), "the name's room grows with its band");
        }
        assertTrue(grown.get(1).scaleBandM() > own.get(1).scaleBandM(), "so does the part's own square");
        for (int i = 0; i < grown.size(); i++) {
            for (int j = i + 1; j < grown.size(); j++) {
                assertTrue(!grown.get(i).frameM().intersects(grown.get(j).frameM()), "frames never overlap");
            }
        }
    }
}
