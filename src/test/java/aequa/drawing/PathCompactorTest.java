package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.junit.jupiter.api.Test;

class PathCompactorTest {

    @Test
    void writesRelativeStepsThatAddBackToTheSamePoints() {
        // SVG 1.1 section 8.3: "M10,10 l5,0 -2.5,4.5 z" is the same path as "M10,10 L15,10 L12.5,14.5 Z"
        assertEquals("M10,10l5,0-2.5,4.5z", new PathCompactor(2).compact("M10,10L15,10L12.5,14.5Z"));
        assertEquals("M.5,1l.25.25-.75-1.25z", new PathCompactor(2).compact("M0.5,1L0.75,1.25L0,0Z"));
        assertEquals("M1,1C2,2,3,3,4,4", new PathCompactor(2).compact("M1,1C2,2,3,3,4,4"), "curves stay as they are");
    }

    @Test
    void seededRandomPathsKeepTheirArea() {
        Random random = new Random(7);
        FixedDecimal one = new FixedDecimal(1);
        for (int n = 0; n < 200; n++) {
            StringBuilder d = new StringBuilder();
            for (int ring = 0; ring < 2; ring++) {
                for (int k = 0; k < 12; k++) {
                    double angle = 2 * Math.PI * k / 12;
                    double r = 50 + 40 * random.nextDouble() - 30 * ring;
                    d.append(k == 0 ? 'M' : 'L').append(one.apply(500 + r * Math.cos(angle))).append(',')
                            .append(one.apply(400 + r * Math.sin(angle)));
                }
                d.append('Z');
            }
            String absolute = d.toString();
            assertEquals(SvgDoc.pathArea(absolute), SvgDoc.pathArea(new PathCompactor(1).compact(absolute)), 1e-6);
        }
    }
}
