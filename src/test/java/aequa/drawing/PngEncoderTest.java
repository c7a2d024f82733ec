package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * aequa's PNGs are read back pixel for pixel by outside readers: the JDK's own PNG decoder
 * ({@code javax.imageio}, an implementation independent of {@link PngEncoder}) and Debian's {@code pngcheck},
 * which checks every chunk's CRC, the zlib stream and the image size against the header and exits 0 only
 * with no error. .ci/run installs pngcheck; without it this test fails: it never skips.
 */
class PngEncoderTest {

    @TempDir
    Path folder;

    @Test
    void everyPixelDecodesAsItWasPainted() throws IOException {
        Random random = new Random(7);
        for (int[] size : List.of(new int[] {1, 1}, new int[] {3, 2}, new int[] {257, 31})) {
            BufferedImage image = new BufferedImage(size[0], size[1], BufferedImage.TYPE_INT_RGB);
            for (int y = 0; y < size[1]; y++) {
                for (int x = 0; x < size[0]; x++) {
                    image.setRGB(x, y, random.nextInt(1 << 24));
                }
            }
            assertSamePixels(image, ImageIO.read(new ByteArrayInputStream(PngEncoder.encode(image))));
        }
        BufferedImage drawing = antialiasedShapes();
        assertSamePixels(drawing, ImageIO.read(new ByteArrayInputStream(PngEncoder.encode(drawing))));
    }

    @Test
    void pngcheckFindsNoErrorInADrawnMap() throws IOException, InterruptedException {
        DrawnMap map = MapDrawings.png(MapFixtures.choropleth(20, 16), Themes.bundled("daylight"), 600, 2);
        Path png = folder.resolve("map.png");
        Files.write(png, map.bytes());
        Process check;
        try {
            check = new ProcessBuilder("pngcheck", "-v", png.toString()).redirectErrorStream(true).start();
        } catch (IOException e) {
            fail("pngcheck is needed for this test (Debian: apt-get install pngcheck; .ci/run installs it): " + e.getMessage());
            return;
        }
        String report = new String(check.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(check.waitFor(60, TimeUnit.SECONDS), "pngcheck did not finish");
        assertEquals(0, check.exitValue(), report);
        long height = 2 * Math.round(map.height());
        assertTrue(report.contains("1200 x " + height + " image, 24-bit RGB, non-interlaced"), report);
        assertTrue(report.contains("No errors detected"), report);
    }

    /**
     * The fixed parts of the file: the signature and the IEND chunk, whose CRC is AE 42 60 82 in every PNG
     * (ISO/IEC 15948, sections 5.2 and 11.2.5; the constant from memory, and it follows from the CRC-32 of
     * "IEND").
     */
    @Test
    void signatureHeaderAndEndAreThoseOfTheStandard() {
        BufferedImage image = new BufferedImage(5, 4, BufferedImage.TYPE_INT_RGB);
        byte[] png = PngEncoder.encode(image);
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'}, Arrays.copyOf(png, 8));
        assertArrayEquals(new byte[] {0, 0, 0, 13, 'I', 'H', 'D', 'R', 0, 0, 0, 5, 0, 0, 0, 4, 8, 2, 0, 0, 0},
                Arrays.copyOfRange(png, 8, 29), "IHDR: 5 x 4, 8 bits, truecolour, deflate, no interlace");
        assertArrayEquals(new byte[] {0, 0, 0, 0, 'I', 'E', 'N', 'D', (byte) 0xae, 0x42, 0x60, (byte) 0x82},
                Arrays.copyOfRange(png, png.length - 12, png.length));
        assertArrayEquals(png, PngEncoder.encode(image), "the same pixels give the same bytes");
    }

    @Test
    void refusesImagesOfAnotherLayout() {
        BufferedImage argb = new BufferedImage(2, 2, BufferedImage.TYPE_INT_ARGB);
        assertThrows(IllegalArgumentException.class, () -> PngEncoder.encode(argb));
    }

    /** Overlapping filled and stroked shapes with anti-aliased edges, as a map's raster has them. */
    private static BufferedImage antialiasedShapes() {
        BufferedImage image = new BufferedImage(320, 200, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(new Color(0xf4f1ea));
        g.fillRect(0, 0, 320, 200);
        Random random = new Random(11);
        for (int i = 0; i < 40; i++) {
            g.setColor(new Color(random.nextInt(1 << 24)));
            g.fill(new Ellipse2D.Double(random.nextInt(300), random.nextInt(180), 10 + random.nextInt(90), 10 + random.nextInt(60)));
            g.setColor(Color.DARK_GRAY);
            g.setStroke(new BasicStroke(0.7f));
            g.draw(new Line2D.Double(random.nextInt(320), random.nextInt(200), random.nextInt(320), random.nextInt(200)));
        }
        g.dispose();
        return image;
    }

    private static void assertSamePixels(BufferedImage expected, BufferedImage decoded) {
        assertEquals(expected.getWidth(), decoded.getWidth());
        assertEquals(expected.getHeight(), decoded.getHeight());
        for (int y = 0; y < expected.getHeight(); y++) {
            for (int x = 0; x < expected.getWidth(); x++) {
                if ((expected.getRGB(x, y) & 0xffffff) != (decoded.getRGB(x, y) & 0xffffff)) {
                    fail("pixel " + x + "," + y + ": painted " + Integer.toHexString(expected.getRGB(x, y))
                            + ", decoded " + Integer.toHexString(decoded.getRGB(x, y)));
                }
            }
        }
    }
}
