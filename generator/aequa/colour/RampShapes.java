package aequa.colour;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Generates class fills from hue and lightness parameters in OKLCh (Ottosson 2020), then gamut-maps them
 * into sRGB by reducing chroma ({@link GamutMapping}). No palette is stored anywhere: every colour comes
 * from these formulas.
 *
 * <p>Lightness runs linearly in OKLab L, whose steps Ottosson 2020 fits to perceived lightness, from the
 * "quiet" end (close to the page: light on a light page) to the "loud" end. Chroma grows with distance from
 * the quiet end up to {@value #CHROMA_PEAK_AT} of the way, then eases to {@value #LOUD_CHROMA_SHARE} of the
 * peak at the loud end ({@link #chromaShare}): the quietest class is a faint tint, the middle classes the most
 * saturated, and the darkest class a deep, less saturated shade. Full chroma at OKLab L 0.3 would need
 * more than 240 % total ink in print (newsprint's usual limit) and looks nearly black-and-garish on screen;
 * the eased end keeps every generated sequential ramp within that limit (tested with the naive separation
 * in ColourMeasuresTest). The shape follows the common practice of sequential ramps whose chroma arcs over
 * the lightness range.
 */
final class RampShapes {

    /** Share of the maximum chroma kept at the quiet end of a sequential ramp, so it is a tint, not grey. */
    private static final double QUIET_CHROMA_SHARE = 0.15;
    /** Where along the ramp (0 quiet, 1 loud) chroma peaks. */
    static final double CHROMA_PEAK_AT = 0.7;
    /** Share of the peak chroma kept at the loud end. */
    static final double LOUD_CHROMA_SHARE = 0.5;

    /** The share of the maximum chroma at {@code t} along a ramp, {@code quietShare} at 0 (see class comment). */
    static double chromaShare(double t, double quietShare) {
        if (t <= CHROMA_PEAK_AT) {
            return quietShare + (1 - quietShare) * t / CHROMA_PEAK_AT;
        }
        return 1 - (1 - LOUD_CHROMA_SHARE) * (t - CHROMA_PEAK_AT) / (1 - CHROMA_PEAK_AT);
    }

    private RampShapes() {
    }

    /**
     * The lightness range and chroma of a ramp.
     *
     * @param quietLightness OKLab L of the end closest to the page colour
     * @param loudLightness  OKLab L of the end furthest from it
     * @param maxChroma      OKLCh chroma at the loud end, before gamut mapping
     */
    record Shape(double quietLightness, double loudLightness, double maxChroma) {

        double lightnessAt(double t) {
            return quietLightness + (loudLightness - quietLightness) * t;
        }
    }

    /** {@code count} fills of one hue, quiet to loud: lightness strictly monotonic. */
    static List<Rgb> sequential(double hueDeg, int count, Shape shape) {
        List<Rgb> fills = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            double t = count == 1 ? 1 : (double) i / (count - 1);
            double chroma = shape.maxChroma() * chromaShare(t, QUIET_CHROMA_SHARE);
            fills.add(GamutMapping.toRgb(new OkLch(shape.lightnessAt(t), chroma, hueDeg)));
        }
        return fills;
    }

    /**
     * {@code count} fills from loud {@code lowHueDeg} through a neutral quiet midpoint to loud
     * {@code highHueDeg}. An odd count has a neutral (chroma 0) middle class at the quiet lightness; an even
     * count puts the neutral between the two middle classes, which are the faintest tints of each hue.
     * Arm step {@code j} (1 = next to the centre) of {@code h} sits at {@code t = j / h} (odd count) or
     * {@code t = (2j - 1) / (2h - 1)} (even count) along the lightness range.
     */
    static List<Rgb> diverging(double lowHueDeg, double highHueDeg, int count, Shape shape) {
        int half = count / 2;
        boolean odd = count % 2 == 1;
        List<Rgb> low = new ArrayList<>(half);
        List<Rgb> high = new ArrayList<>(half);
        for (int j = 1; j <= half; j++) {
            double t = odd ? (double) j / half : (2.0 * j - 1) / (2.0 * half - 1);
            double lightness = shape.lightnessAt(t);
            double chroma = shape.maxChroma() * chromaShare(t, 0);
            low.add(GamutMapping.toRgb(new OkLch(lightness, chroma, lowHueDeg)));
            high.add(GamutMapping.toRgb(new OkLch(lightness, chroma, highHueDeg)));
        }
        List<Rgb> fills = new ArrayList<>(count);
        for (int j = half - 1; j >= 0; j--) {
            fills.add(low.get(j));
        }
        if (odd) {
            fills.add(GamutMapping.toRgb(new OkLch(shape.quietLightness(), 0, 0)));
        }
        fills.addAll(high);
        return fills;
    }

    /**
     * {@code count} fills with hues spread evenly round the circle from {@code startHueDeg}, at one lightness
     * and chroma; with {@code alternate}, every other fill moves to {@code otherLightness}, which keeps
     * neighbours apart for readers who cannot separate the hues.
     */
    static List<Rgb> qualitative(double startHueDeg, int count, double lightness, double otherLightness,
                                 double chroma, boolean alternate) {
        return qualitativePoints(startHueDeg, count, lightness, alternate ? otherLightness : lightness, chroma).stream()
                .map(GamutMapping::toRgb).collect(Collectors.toList());
    }

    /** The OKLCh points of {@link #qualitative} with alternating lightness, before gamut mapping. */
    static List<OkLch> qualitativePoints(double startHueDeg, int count, double lightness, double otherLightness,
                                         double chroma) {
        List<OkLch> points = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            points.add(new OkLch(i % 2 == 1 ? otherLightness : lightness, chroma, (startHueDeg + 360.0 * i / count) % 360));
        }
        return points;
    }
}
