package aequa.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/** The builder makes the same maps as the canonical constructor the project file's reader calls. */
class MapSpecTest {

    /** A map with every setting away from its default, through the canonical constructor. */
    private static final MapSpec EVERY_SETTING = new MapSpec("m", "Title", "r", "f", "ind", List.of("2023", "2024"),
            Measure.COUNT, Normalisation.COLUMN, "people", 1000.0, "per 1,000 people", MapDisplay.CIRCLES,
            new ClassesSpec(ClassMethod.QUANTILE, 4, null, null), new ColoursSpec(null, 200.0, null),
            new ProjectionSpec("albers-conic", Map.of("centre-lon", 10.0)), "events", "margin", "notes", "source",
            "2024", List.of(0.0, 100.0), new InsetsSpec("off", List.of()), "state", 12.0,
            Map.of("fr", new MapTexts("Titre", null, null, null, null)));

    @Test
    void aCopyKeepsEverySetting() {
        assertEquals(EVERY_SETTING, EVERY_SETTING.toBuilder().build());
    }

    @Test
    void aCopyChangesOnlyWhatIsSet() {
        MapSpec retitled = EVERY_SETTING.toBuilder().title("Other").largestCircleMm(20.0).build();
        assertEquals("Other", retitled.title());
        assertEquals(20.0, retitled.largestCircleMm());
        assertEquals(EVERY_SETTING, retitled.toBuilder().title("Title").largestCircleMm(12.0).build());
        assertNotEquals(EVERY_SETTING, retitled);
    }

    @Test
    void unsetSettingsTakeTheCanonicalDefaults() {
        MapSpec canonical = new MapSpec("m", null, null, null, null, null, null, null, null, null, null, null, null,
                null, null, null, null, null, null, null, null, null, null, null, null);
        assertEquals(canonical, MapSpec.builder("m").build());
        assertEquals("m", canonical.title(), "the title defaults to the id");
    }
}
