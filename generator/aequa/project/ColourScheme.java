package aequa.project;

/** The kind of colour ramp a map asks for. */
public enum ColourScheme implements ConfigWord {
    /** One hue from light to dark: for figures that run from low to high. */
    SEQUENTIAL,
    /** Two hues meeting at a light middle: for figures above and below a meaningful midpoint. */
    DIVERGING,
    /** Distinct hues of similar lightness: for categories without an order. */
    QUALITATIVE;

    @Override
    public String configName() {
        return ConfigWord.kebab(this);
    }
}
