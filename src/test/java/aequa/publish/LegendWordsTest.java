package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;

import aequa.atlas.MapModel;
import aequa.classes.Classification;
import aequa.drawing.MapDrawings;
import aequa.drawing.Themes;
import aequa.drawing.PrintPreset;
import aequa.drawing.PrintSize;
import aequa.pages.MapPageView;
import aequa.wording.Wording;

/**
 * The drawn legend and the page's key name each class with the same words, and those words say where a value
 * on a break goes: classes are half-open, [lower, upper), the last one closed (common practice for
 * choropleth classes; aequa's rule in {@link Classification}).
 */
class LegendWordsTest {

    @Test
    void theDrawnLegendAndThePageKeySayTheSameRangesAndABreakValueIsInTheUpperClass() {
        MapModel map = SiteFixtures.map("key-words", SiteFixtures.Texts.plain(), 12, 0.5);
        List<MapPageView.LegendRow> rows = MapViews.legend(map, Wording.english());
        // the print legend lists every class (the web one may draw a histogram with the end limits only)
        String svg = new String(MapDrawings.printSvg(map, Themes.bundled("newsprint"), PrintSize.of(PrintPreset.TWO_COLUMNS))
                .bytes(), StandardCharsets.UTF_8);
        Classification classes = map.classification();
        assertEquals(classes.classCount(), rows.size());
        for (int i = 0; i < rows.size(); i++) {
            String range = rows.get(i).range();
            assertTrue(svg.contains(">" + range + "<"), "the drawn legend says \"" + range + "\" too");
            boolean last = i == rows.size() - 1;
            assertTrue(range.contains(last ? " to " : " to under "), range);
            assertTrue(last != range.contains(" to under "), range);
            // the value on the class's lower limit is in this class, the one on its upper limit in the next
            assertEquals(i, classes.classOf(classes.limits().get(i)));
            assertEquals(last ? i : i + 1, classes.classOf(classes.limits().get(i + 1)));
        }
    }
}
