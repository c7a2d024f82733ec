package aequa.project;

/**
 * @param scheme {@code sequential}, {@code diverging} or {@code qualitative}
 * @param hue    the main hue in degrees on the OKLCh hue circle (0-360)
 * @param hueLow for diverging ramps, the hue of the low end (the main hue is the high end)
 */
public record ColoursSpec(ColourScheme scheme, Double hue, Double hueLow) {

    static final ColoursSpec DEFAULT = new ColoursSpec(null, null, null);

    public ColoursSpec {
        scheme = scheme == null ? ColourScheme.SEQUENTIAL : scheme;
        hue = hue == null ? 250.0 : hue;
        hueLow = hueLow == null ? 40.0 : hueLow;
    }
}
