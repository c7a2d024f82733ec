package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.List;

import org.junit.jupiter.api.Test;

import aequa.atlas.MapModel;
import aequa.wording.Wording;

/** What the words under the map may carry: source, date, the author's notes; never the checks' findings. */
class CaptionTest {

    @Test
    void creditsCarryTheAuthorsNotesAndNoFindings() {
        MapModel base = MapFixtures.choropleth(6, 5);
        String finding = "The statistics key \"02275\" matches no region.";
        MapModel withFinding = new MapModel(base.spec(), base.periods(), base.projection(), base.regions(),
                base.classification(), base.ramp(), base.areaAudit(), List.of(finding));
        String credits = Caption.credits(withFinding, Wording.english());
        // the fixture has no notes: the credits are the source and the date, nothing else
        assertEquals("Source: Invented survey of the Ostmark health office. Figures: 2024.", credits);
        assertFalse(Caption.caption(withFinding, null, Wording.english()).contains("matches no region"));
    }
}
