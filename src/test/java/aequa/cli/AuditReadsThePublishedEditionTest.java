package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;

import aequa.atlas.MapModel;
import aequa.publish.CheckStep;

/**
 * The check step reads what publish reads: the projections of the edition in the output folder (so a
 * monthly update keeps its projection) and the theme's page colour (against which ramps are checked). An
 * audit of the output publish writes therefore judges the same maps publish would build.
 */
class AuditReadsThePublishedEditionTest {

    @Test
    void theProjectionOfThePublishedEditionIsKeptByAuditAsByPublish(@TempDir Path tmp) throws IOException {
        CliSession cli = new CliSession();
        Path project = cli.scaffold(tmp.resolve("project"));
        Path site = tmp.resolve("site");
        assertEquals(0, cli.run("publish", project.toString(), "--out", site.toString()), cli.errText());
        // the published edition's projection, moved by a thousandth of a degree: a little worse than the best,
        // well within the chooser's stability margin, so a rebuild keeps it (ProjectionChooser.STABILITY_MARGIN)
        Path report = site.resolve("report.json");
        ObjectNode root = (ObjectNode) new ObjectMapper().readTree(report.toFile());
        for (JsonNode parameter : root.path("maps").get(0).path("projection").path("parameters")) {
            ((ObjectNode) parameter).put("value", parameter.path("value").asDouble() + 0.001);
        }
        new ObjectMapper().writeValue(report.toFile(), root);

        MapModel withEdition = CheckStep.run(project, site).atlas().orElseThrow().maps().get(0);
        MapModel without = CheckStep.run(project, tmp.resolve("no-site-yet")).atlas().orElseThrow().maps().get(0);
        // ChoiceReason's wording for a choice kept from the previous publish
        assertTrue(withEdition.projection().reason().contains("kept from the previous publish"), withEdition.projection().reason());
        assertFalse(without.projection().reason().contains("previous publish"), without.projection().reason());
        assertFalse(withEdition.projection().projection().wkt2().equals(without.projection().projection().wkt2()));
        // the audit command, given that folder, prints the line of that map (MapSummary rounds omega, so the line
        // alone would not tell the two choices apart; the check step above does)
        CliSession audit = new CliSession();
        assertEquals(0, audit.run("audit", project.toString(), "--out", site.toString()), audit.errText());
        assertTrue(audit.out.toString().contains(MapSummary.line(withEdition)), audit.out.toString());
    }

    @Test
    void rampsAreMadeForTheThemesPageColour(@TempDir Path tmp) throws IOException {
        CliSession cli = new CliSession();
        Path project = cli.scaffold(tmp.resolve("project"));
        // a theme of the project's own: the bundled daylight theme on a dark page
        String daylight;
        try (var in = AuditReadsThePublishedEditionTest.class.getResourceAsStream("/themes/daylight/theme.yaml")) {
            daylight = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        }
        String night = daylight.replaceFirst("background: \"#[0-9a-fA-F]{6}\"", "background: \"#1b1b1f\"");
        assertFalse(night.equals(daylight));
        Files.createDirectories(project.resolve("themes/night"));
        Files.writeString(project.resolve("themes/night/theme.yaml"), night);
        Path yaml = project.resolve("aequa.yaml");
        Files.writeString(yaml, Files.readString(yaml).replace("  publisher:", "  theme: night\n  publisher:"));

        MapModel onDark = CheckStep.run(project, tmp.resolve("site")).atlas().orElseThrow().maps().get(0);
        MapModel onWhite = CheckStep.run(cli.scaffold(tmp.resolve("plain")), tmp.resolve("site")).atlas().orElseThrow().maps().get(0);
        // ColourRamps: on a light page the quiet class is light, on a dark page it is dark
        assertTrue(lightness(onWhite.ramp().fills().get(0)) > 0.9, onWhite.ramp().fills().toString());
        assertTrue(lightness(onDark.ramp().fills().get(0)) < 0.4, onDark.ramp().fills().toString());
    }

    private static double lightness(aequa.colour.Rgb fill) {
        return aequa.colour.OkLab.fromRgb(fill).lightness();
    }
}
