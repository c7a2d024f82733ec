package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.findings.Finding;

/** report.json lists a bounded number of findings of each kind and counts the rest. */
class ReportFindingsCapTest {

    @TempDir
    Path tmp;

    @Test
    void repeatedFindingsAreCappedPerKindWithACount() throws IOException {
        List<Finding> findings = new ArrayList<>();
        for (int row = 2; row < 50_002; row++) {
            findings.add(Finding.warning("join-key-unmatched", "figures.csv", "row " + row,
                    "The statistics key \"X" + row + "\" matches no region of the geometry.", ""));
        }
        findings.add(Finding.note("join-relaxed-match", "figures.csv", "row 3", "matched ignoring case", ""));
        Path out = tmp.resolve("site");
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("p"), SiteFixtures.Texts.plain(), 1, 12), findings,
                new FakeArtwork(), out, PublishOptions.defaults());

        JsonNode listed = new ObjectMapper().readTree(out.resolve("report.json").toFile()).get("findings");
        int cap = SiteReport.FINDINGS_PER_KIND;
        assertEquals(cap + 2, listed.size());
        assertEquals("row 2", listed.get(0).get("place").asText(), "the first ones are listed, in order");
        assertEquals("join-relaxed-match", listed.get(cap).get("code").asText());
        JsonNode omitted = listed.get(cap + 1);
        assertEquals("join-key-unmatched", omitted.get("code").asText());
        assertEquals(50_000 - cap, omitted.get("omitted").asInt());
        assertTrue(omitted.get("message").asText().startsWith("49,900 more"), omitted.toString());
    }
}
