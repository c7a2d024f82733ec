package aequa.composite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
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
        Envelope islands = new Envelope(0, 20_000, 0, 200_000);
        PartLayout.Placement placed = PartLayout.place(MAIN_REGIONS, List.of(inset(islands, name, false))).get(0);
        assertTrue(placed.nameLines() > 1 && placed.nameLines() <= PartLayout.MAX_NAME_LINES, "lines: " + placed.nameLines());
        double nameWidthM = PartLayout.nameWidthM(name, MAIN);
        assertTrue(placed.frameM().getWidth() < 0.7 * nameWidthM, placed.frameM().getWidth() + " for a name of " + nameWidthM);
        PartLayout.Placement shortName = PartLayout.place(MAIN_REGIONS, List.of(inset(islands, "Guam", false))).get(0);
        assertEquals(1, shortName.nameLines());
        assertEquals(0, shortName.scaleBandM());
    }

    /**
     * A name of one word cannot break: however large a narrow print makes the bands, it keeps one line and its
     * frame is as wide as the word; a long name of many words breaks into more lines instead of widening its frame
     * to the whole name.
     */
    @Test
    void aNameBreaksOnlyBetweenWords() {
        Envelope islands = new Envelope(0, 20_000, 0, 200_000);
        PartLayout.Placement oneWord = PartLayout.place(MAIN_REGIONS, List.of(inset(islands, "Hawaii", false)), 0.08).get(0);
        assertEquals(1, oneWord.nameLines());
        String name = "The Outer Skerries";
        PartLayout.Placement grown = PartLayout.place(MAIN_REGIONS, List.of(inset(islands, name, false)), 0.08).get(0);
        double growth = grown.nameBandM() / (1 + PartLayout.EXTRA_LINE_BAND * (grown.nameLines() - 1))
                / (PartLayout.NAME_BAND_SHARE * MAIN.getWidth());
        assertTrue(grown.nameLines() > 1, grown.nameLines() + " lines");
        assertTrue(grown.frameM().getWidth() < growth * PartLayout.nameWidthM(name, MAIN),
                grown.frameM().getWidth() + " against the whole name's " + growth * PartLayout.nameWidthM(name, MAIN));
    }

    @Test
    void aPartAtItsOwnScaleHasRoomForItsSquareBelowItsRegions() {
        Envelope part = new Envelope(0, 300_000, 0, 300_000);
        PartLayout.Placement placed = PartLayout.place(MAIN_REGIONS,
                List.of(inset(part, "Far Isle", true))).get(0);
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
                inset(new Envelope(0, 200_000, 0, 300_000), "North Reach", false),
                inset(new Envelope(0, 50_000, 0, 80_000), "Outer Skerries", true));
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

    /**
     * Five framed parts with long names on a narrow print (bands of 5 % of the drawn width; the US counties ask
     * 4.4 % at two columns): every band reaches its share and the main part keeps at least 60 % of the drawn width
     * (71 % now). Growing the bands and laying out again until the share held spread such frames in a row, each
     * round wider than the last: it left the main part 46 % here and an eighth on the US counties. Parts and names
     * are invented.
     */
    @Test
    void longNamesOnANarrowPrintKeepTheMainPartLarge() {
        List<PartLayout.Inset> insets = List.of(
                inset(new Envelope(0, 600_000, 0, 400_000), "The Northern Reach", false),
                inset(new Envelope(0, 80_000, 0, 300_000), "Isles of the Far Western Ocean", false),
                inset(new Envelope(0, 100_000, 0, 40_000), "Upper and Lower Skerries of the South", false),
                inset(new Envelope(0, 50_000, 0, 50_000), "Cape Islands and Banks", false),
                inset(new Envelope(0, 10_000, 0, 10_000), "Lone Rock", false));
        List<PartLayout.Placement> placed = PartLayout.place(MAIN_REGIONS, insets, 0.05);
        Envelope whole = new Envelope(MAIN);
        placed.forEach(p -> whole.expandToInclude(p.frameM()));
        double drawnWidthM = Math.max(whole.getWidth(), whole.getHeight() / PartLayout.MAX_ASPECT);
        for (PartLayout.Placement p : placed) {
            double oneLineBandM = p.nameBandM() / (1 + PartLayout.EXTRA_LINE_BAND * (p.nameLines() - 1));
            assertTrue(oneLineBandM >= 0.05 * drawnWidthM * (1 - 1e-9), oneLineBandM + " against " + drawnWidthM);
            assertTrue(!p.frameM().intersects(MAIN), "a frame clear of the main part's regions");
        }
        assertTrue(MAIN.getWidth() >= 0.6 * drawnWidthM, "the main part takes " + MAIN.getWidth() / drawnWidthM + " of the width");
        for (int i = 0; i < placed.size(); i++) {
            for (int j = i + 1; j < placed.size(); j++) {
                assertTrue(!placed.get(i).frameM().intersects(placed.get(j).frameM()), "frames never overlap");
            }
        }
    }

    /**
     * A one-word name wider than any page the share allows (bands of 30 % of the drawn width hold about two
     * characters a line) cannot fit however the map is drawn: the frames still get their places, clear of the main
     * part and of each other, at the least growth. The name is invented.
     */
    @Test
    void aWordWiderThanAnyPageStillGetsAPlace() {
        List<PartLayout.Inset> insets = List.of(inset(new Envelope(0, 100_000, 0, 100_000), "Northwesternmostisland", false),
                inset(new Envelope(0, 50_000, 0, 50_000), "Skerry", false));
        List<PartLayout.Placement> placed = PartLayout.place(MAIN_REGIONS, insets, 0.3);
        assertEquals(2, placed.size());
        assertTrue(!placed.get(0).frameM().intersects(MAIN) && !placed.get(1).frameM().intersects(MAIN));
        assertTrue(!placed.get(0).frameM().intersects(placed.get(1).frameM()));
        assertEquals(1, placed.get(0).nameLines(), "one word keeps one line");
    }

    /** A part named {@code name}, whose lines break between its words (two lines taken as the layout's estimate). */
    private static PartLayout.Inset inset(Envelope content, String name, boolean ownScale) {
        double nameM = PartLayout.nameWidthM(name, MAIN);
        double longestWordM = Arrays.stream(name.split(" ")).mapToDouble(w -> PartLayout.nameWidthM(w, MAIN)).max().orElse(0);
        return new PartLayout.Inset(content, nameM, PartLayout.TWO_LINE_WIDTH * nameM, longestWordM, "", ownScale);
    }
}
