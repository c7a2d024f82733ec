package aequa.colour;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Chroma reduction keeps lightness and hue and finds the largest in-gamut chroma. */
class GamutMappingTest {

    @Test
    void reducesOnlyChromaAndStopsAtTheGamutEdge() {
        for (double hue = 0; hue < 360; hue += 15) {
            for (double lightness : new double[] {0.3, 0.55, 0.8, 0.95}) {
                OkLch wanted = new OkLch(lightness, 0.4, hue); // far outside sRGB at every hue
                OkLch mapped = GamutMapping.reduceChroma(wanted);
                assertEquals(lightness, mapped.lightness(), 0);
                assertEquals(hue, mapped.hueDeg(), 0);
                assertTrue(mapped.toOkLab().toLinearSrgb().inGamut(), mapped.toString());
                OkLch beyond = new OkLch(lightness, mapped.chroma() + 1e-4, hue);
                assertFalse(beyond.toOkLab().toLinearSrgb().inGamut(), "chroma could be higher: " + mapped);
            }
        }
    }

    @Test
    void inGamutColoursAreUntouched() {
        OkLch grey = new OkLch(0.6, 0.02, 200);
        assertSame(grey, GamutMapping.reduceChroma(grey));
    }

    @Test
    void eightBitResultKeepsTheHue() {
        // compare with clipping the channels, which turns a saturated blue at high lightness towards cyan/purple
        OkLch wanted = new OkLch(0.8, 0.3, 264);
        OkLch seen = OkLch.of(OkLab.fromRgb(GamutMapping.toRgb(wanted)));
        assertEquals(264, seen.hueDeg(), 2.0);
        assertEquals(0.8, seen.lightness(), 0.005);
    }
}
