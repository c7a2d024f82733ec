package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Font;
import java.awt.GraphicsEnvironment;
import java.awt.font.FontRenderContext;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.MapModel;
import aequa.drawing.MapDrawings;
import aequa.drawing.PrintPreset;
import aequa.drawing.PrintSize;
import aequa.drawing.Theme;
import aequa.drawing.Themes;

/**
 * The names on a composite map's frames stay inside their frames in print, at the narrowest preset a desk uses for
 * a national map (two columns, 104 mm; common practice) and at one column, on the US Census Bureau's 2017 counties
 * (src/test/resources/geometry, source note there) with parts named from the counties' {@code state}: the
 * longest, "Guam and Commonwealth of the Northern Mariana Islands", ran out of its frame and across the next one
 * at 104 mm, since the type cannot shrink below the theme's smallest size. Text is measured with Java2D's own
 * font metrics (the string bounds of the font the SVG names, at the size it states), not with aequa's.
 */
class FrameNamesInPrintTest {

    private static final Pattern FRAME = Pattern.compile(
            "<g id='frame-part-\\d+'><rect x='([0-9.]+)' y='([0-9.]+)' width='([0-9.]+)' height='([0-9.]+)'");
    private static final Pattern TEXT = Pattern.compile("<text x='([0-9.]+)' y='([0-9.]+)'[^>]*font-size: ([0-9.]+)px;'>([^<]*)</text>");
    private static final FontRenderContext MEASURE = new FontRenderContext(null, true, true);
    /** The print SVG writes its text inside matrix(0.01, ...) groups: coordinates and sizes are in 1/100 mm. */
    private static final double TEXT_UNIT_MM = 0.01;

    private static Path project;

    @BeforeAll
    static void write(@TempDir Path dir) throws IOException {
        project = dir;
        Files.createDirectories(dir.resolve("regions"));
        Files.createDirectories(dir.resolve("figures"));
        Files.copy(Path.of("src/test/resources/geometry/us-counties-2017.geojson"), dir.resolve("regions/counties.geojson"));
        StringBuilder csv = new StringBuilder("code,code_number\n");
        Matcher id = Pattern.compile("\"id\":\\s*\"(\\d{5})\"").matcher(Files.readString(dir.resolve("regions/counties.geojson")));
        Set<String> seen = new HashSet<>();
        while (id.find()) {
            if (seen.add(id.group(1))) {
                csv.append(id.group(1)).append(',').append(Integer.parseInt(id.group(1)) % 97).append('\n');
            }
        }
        Files.writeString(dir.resolve("figures/counties.csv"), csv);
    }

    @Test
    void namesFitTheirFramesAtTwoColumns() throws IOException {
        assertNamesInsideFrames("two-columns", PrintPreset.TWO_COLUMNS);
    }

    /** One column (50 mm; common practice for a newspaper's narrowest graphic): names at the smallest type are a third of the width. */
    @Test
    void namesFitTheirFramesAtOneColumn() throws IOException {
        assertNamesInsideFrames("one-column", PrintPreset.ONE_COLUMN);
    }

    private static void assertNamesInsideFrames(String width, PrintPreset preset) throws IOException {
        Files.writeString(project.resolve("aequa.yaml"), String.join("\n",
                "site: { print-width: " + width + " }",
                "regions:",
                "  counties: { file: regions/counties.geojson, key: id, name: \"{name}, {state}\" }",
                "figures:",
                "  counties: { file: figures/counties.csv, key: code }",
                "maps:",
                "  - { id: counties, regions: counties, figures: counties, indicator: code_number, measure: rate }",
                ""));
        CheckStep.Result checked = CheckStep.run(project, project.resolve("out"));
        assertTrue(checked.atlas().isPresent(), checked.findings().list().toString());
        MapModel map = checked.atlas().get().maps().get(0);
        assertTrue(map.parts().size() >= 4, "the counties are drawn in parts");
        Theme print = Themes.bundled("newsprint");
        String svg = new String(MapDrawings.printSvg(map, print, PrintSize.of(preset)).bytes(), StandardCharsets.UTF_8);

        List<Rectangle2D> frames = new ArrayList<>();
        List<String> groups = new ArrayList<>();
        Matcher f = FRAME.matcher(svg);
        while (f.find()) {
            frames.add(new Rectangle2D.Double(num(f, 1), num(f, 2), num(f, 3), num(f, 4)));
            groups.add(svg.substring(f.start(), svg.indexOf("<g id='", f.end()) < 0 ? svg.length() : svg.indexOf("<g id='", f.end())));
        }
        assertTrue(frames.size() == map.parts().size() - 1, frames.size() + " frames");
        String family = installed(print.fonts().family());
        int named = 0;
        for (int i = 0; i < frames.size(); i++) {
            Rectangle2D frame = frames.get(i);
            Matcher t = TEXT.matcher(groups.get(i));
            while (t.find()) {
                double sizeMm = num(t, 3) * TEXT_UNIT_MM;
                String text = t.group(4).replace("&amp;", "&");
                Font font = new Font(family, Font.PLAIN, 1000);
                Rectangle2D bounds = font.getStringBounds(text, MEASURE);
                double scale = sizeMm / 1000;
                double capMm = font.createGlyphVector(MEASURE, "H").getVisualBounds().getHeight() * scale;
                double left = num(t, 1) * TEXT_UNIT_MM;
                double baseline = num(t, 2) * TEXT_UNIT_MM;
                Rectangle2D ink = new Rectangle2D.Double(left, baseline - capMm, bounds.getWidth() * scale, capMm);
                String where = "'" + text + "' at " + width + ": " + ink + " in frame " + frame;
                assertTrue(frame.contains(ink), where);
                for (int j = 0; j < frames.size(); j++) {
                    assertTrue(j == i || !frames.get(j).intersects(ink), where + " crosses frame " + frames.get(j));
                }
                // the theme's smallest type (print preflight): the name was not made to fit by shrinking below it
                assertTrue(sizeMm / 25.4 * 72 >= print.typePt().minimum() - 1e-6, where + " at " + sizeMm + " mm");
                named++;
            }
        }
        assertTrue(named >= frames.size(), "every frame has its name");
    }

    private static double num(Matcher m, int group) {
        return Double.parseDouble(m.group(group));
    }

    private static String installed(List<String> stack) {
        Set<String> fonts = new HashSet<>(Arrays.asList(
                GraphicsEnvironment.getLocalGraphicsEnvironment().getAvailableFontFamilyNames(java.util.Locale.ROOT)));
        return stack.stream().filter(fonts::contains).findFirst().orElse(Font.SANS_SERIF);
    }
}
