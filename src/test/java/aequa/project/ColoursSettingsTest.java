package aequa.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;

/**
 * A map's hues are angles on the OKLCh hue circle, 0 to 360 degrees (CSS Color Module Level 4, section 9.1:
 * a hue is an angle; aequa takes it in degrees and refuses values off the circle rather than wrapping them). Both
 * the main hue and a diverging ramp's {@code hue-low} are checked where the project file is read, with the
 * setting's place in the file.
 */
class ColoursSettingsTest {

    @TempDir
    Path dir;

    private List<Finding> load(String colours) throws IOException {
        return OneMapProject.findings(dir, "colours", colours);
    }

    @Test
    void huesOnTheCirclePass() throws IOException {
        assertEquals(List.of(), load("{ scheme: sequential, hue: 0 }"));
        assertEquals(List.of(), load("{ scheme: diverging, hue: 360, hue-low: 40 }"));
    }

    @Test
    void aHueOffTheCircleIsRefusedWhereItIsSet() throws IOException {
        List<Finding> main = load("{ scheme: sequential, hue: 400 }");
        assertEquals(List.of("project-bad-value"), main.stream().map(Finding::code).toList());
        assertTrue(main.get(0).message().contains("'hue'"), main.toString());
        // the setting's line in the project file (line 10: "colours: ...")
        assertTrue(main.get(0).place().startsWith("line 10,"), main.get(0).place());
        List<Finding> low = load("{ scheme: diverging, hue: 250, hue-low: -10 }");
        assertEquals(List.of("project-bad-value"), low.stream().map(Finding::code).toList());
        assertTrue(low.get(0).message().contains("'hue-low'"), low.toString());
        assertTrue(low.get(0).place().startsWith("line 10,"), low.get(0).place());
    }
}
