package aequa.drawing;

/**
 * What a drawing shows besides the regions.
 *
 * @param title     draw the title and unit above the map (pages show their own heading, so web maps omit it)
 * @param labels    label regions where the name fits
 * @param graticule meridians, parallels and the globe's outline
 * @param histogram draw the histogram legend (values spread along the classes) instead of the list legend
 */
public record DrawOptions(boolean title, boolean labels, Graticule graticule, boolean histogram) {

    /** When to draw meridians, parallels and the projected globe's outline. */
    public enum Graticule {
        /** Only for projections of the whole globe (world maps). */
        AUTO,
        ALWAYS,
        NEVER
    }

    public DrawOptions {
        java.util.Objects.requireNonNull(graticule, "graticule");
    }

    public static DrawOptions print() {
        return new DrawOptions(true, true, Graticule.AUTO, false);
    }

    public static DrawOptions web() {
        return new DrawOptions(false, true, Graticule.AUTO, false);
    }

    public DrawOptions withHistogram(boolean on) {
        return new DrawOptions(title, labels, graticule, on);
    }

    public DrawOptions withTitle(boolean on) {
        return new DrawOptions(on, labels, graticule, histogram);
    }

    public DrawOptions withGraticule(Graticule mode) {
        return new DrawOptions(title, labels, mode, histogram);
    }
}
