package aequa.drawing;

import aequa.wording.Wording;

/**
 * What a drawing shows besides the regions.
 *
 * @param title     draw the title and unit above the map (pages show their own heading, so web maps omit it)
 * @param labels    label regions where the name fits
 * @param graticule meridians, parallels and the globe's outline
 * @param histogram draw the histogram legend (values spread along the classes) instead of the list legend
 * @param wording   the language of every word and number drawn (English unless asked)
 */
public record DrawOptions(boolean title, boolean labels, Graticule graticule, boolean histogram, Wording wording) {

    /** When to draw meridians, parallels and the projected globe's outline. */
    public enum Graticule {
        /** Only for projections of the whole globe (world maps). */
        AUTO,
        ALWAYS,
        NEVER
    }

    public DrawOptions {
        java.util.Objects.requireNonNull(graticule, "graticule");
        java.util.Objects.requireNonNull(wording, "wording");
    }

    public static DrawOptions print() {
        return new DrawOptions(true, true, Graticule.AUTO, false, Wording.english());
    }

    public static DrawOptions web() {
        return new DrawOptions(false, true, Graticule.AUTO, false, Wording.english());
    }

    public DrawOptions withHistogram(boolean on) {
        return new DrawOptions(title, labels, graticule, on, wording);
    }

    public DrawOptions withTitle(boolean on) {
        return new DrawOptions(on, labels, graticule, histogram, wording);
    }

    public DrawOptions withGraticule(Graticule mode) {
        return new DrawOptions(title, labels, mode, histogram, wording);
    }

    public DrawOptions inLanguage(Wording other) {
        return new DrawOptions(title, labels, graticule, histogram, other);
    }
}
