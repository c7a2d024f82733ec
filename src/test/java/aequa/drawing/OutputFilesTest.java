package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;

import aequa.atlas.MapModel;
import aequa.project.ClassMethod;

/**
 * Renders the fixture maps in every format, checks each decodes at the expected size, and keeps the files
 * under target/drawing-look/ for people to look at.
 */
class OutputFilesTest {

    private static final Path OUT = Path.of("target", "drawing-look");

    @Test
    void pngDecodesAtOneAndTwoTimesTheRequestedWidth() throws IOException {
        MapModel model = MapFixtures.choropleth(14, 12);
        Theme theme = Themes.bundled("daylight");
        for (int scale : new int[]{1, 2}) {
            DrawnMap png = MapDrawings.png(model, theme, 800, scale);
            // javax.imageio is the reference PNG decoder here (ISO/IEC 15948 reader in the JDK)
            BufferedImage image = ImageIO.read(new ByteArrayInputStream(png.bytes()));
            assertNotNull(image, "PNG must decode");
            assertEquals(800 * scale, image.getWidth());
            assertEquals((int) Math.round(png.height()) * scale, image.getHeight());
            save("choropleth-" + scale + "x.png", png.bytes());
        }
    }

    @Test
    void thePublishedPairIsOnePaintingAtTwiceTheWidthAndItsTwoByTwoMean() throws IOException {
        MapModel model = MapFixtures.choropleth(14, 12);
        Theme theme = Themes.bundled("daylight");
        List<DrawnMap> pair = MapDrawings.pngPair(model, theme, 800, DrawOptions.web().withTitle(true));
        // javax.imageio is the reference PNG decoder here (ISO/IEC 15948 reader in the JDK)
        BufferedImage single = ImageIO.read(new ByteArrayInputStream(pair.get(0).bytes()));
        BufferedImage twice = ImageIO.read(new ByteArrayInputStream(pair.get(1).bytes()));
        assertArrayEquals(MapDrawings.png(model, theme, 800, 2).bytes(), pair.get(1).bytes(), "the 2x PNG is the usual one");
        assertEquals(800, single.getWidth());
        assertEquals(2 * single.getWidth(), twice.getWidth());
        assertEquals(2 * single.getHeight(), twice.getHeight());
        for (int y = 0; y < single.getHeight(); y++) {
            for (int x = 0; x < single.getWidth(); x++) {
                for (int shift = 0; shift <= 16; shift += 8) {
                    int sum = 0;
                    for (int k = 0; k < 4; k++) {
                        sum += twice.getRGB(2 * x + k % 2, 2 * y + k / 2) >> shift & 0xff;
                    }
                    // box-filter downsampling: the mean of the block, rounded half up
                    assertEquals((sum + 2) / 4, single.getRGB(x, y) >> shift & 0xff, "pixel " + x + "," + y);
                }
            }
        }
        save("choropleth-1x-from-2x.png", pair.get(0).bytes());
    }

    @Test
    void lookAtEveryKindOfMap() throws IOException {
        Theme daylight = Themes.bundled("daylight");
        Theme newsprint = Themes.bundled("newsprint");
        Theme contrast = Themes.bundled("contrast");
        MapModel choropleth = MapFixtures.choropleth(14, 12);
        MapModel multiples = MapFixtures.build(12, 10, List.of("2021", "2022", "2023"), "choropleth", ClassMethod.QUANTILE, 5, 3);
        MapModel circles = MapFixtures.build(12, 10, List.of("2024"), "circles", ClassMethod.QUANTILE, 5, 3);
        MapModel unclassed = MapFixtures.build(12, 10, List.of("2024"), "choropleth", ClassMethod.UNCLASSED, 1, 3);
        save("web.png", MapDrawings.png(choropleth, daylight, 900, 1).bytes());
        save("histogram.png", MapDrawings.png(choropleth, daylight, 900, 1,
                DrawOptions.web().withTitle(true).withHistogram(true).withGraticule(DrawOptions.Graticule.ALWAYS)).bytes());
        save("contrast.png", MapDrawings.png(choropleth, contrast, 900, 1).bytes());
        save("multiples.png", MapDrawings.png(multiples, daylight, 900, 1).bytes());
        save("circles.png", MapDrawings.png(circles, daylight, 900, 1).bytes());
        save("unclassed.png", MapDrawings.png(unclassed, daylight, 900, 1).bytes());
        save("world.png", MapDrawings.png(WorldFixture.model(), daylight, 900, 1).bytes());
        save("web.svg", MapDrawings.webSvg(choropleth, daylight, WebSize.STANDARD).bytes());
        for (PrintPreset preset : PrintPreset.values()) {
            DrawnMap print = MapDrawings.printSvg(choropleth, newsprint, PrintSize.of(preset));
            save("print-" + preset.configName() + ".svg", print.bytes());
        }
        DrawnMap pdf = MapDrawings.pdf(choropleth, newsprint, PrintSize.of(PrintPreset.TWO_COLUMNS), DrawOptions.print());
        save("print.pdf", pdf.bytes());
        // print previews: the print layout rasterised through the same painter is the PDF; look at PNGs of
        // the column widths by rendering the web layout at the same proportions
        save("narrow.png", MapDrawings.png(choropleth, newsprint, 300, 2).bytes());
        assertTrue(Files.size(OUT.resolve("web.svg")) > 0);
    }

    private static void save(String name, byte[] bytes) throws IOException {
        Files.createDirectories(OUT);
        Files.write(OUT.resolve(name), bytes);
    }
}
