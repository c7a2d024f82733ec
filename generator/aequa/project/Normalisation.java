package aequa.project;

/** How a figure is made comparable between regions before it is mapped. */
public enum Normalisation implements ConfigWord {
    /** Mapped as given. */
    NONE,
    /** Divided by the region's geodesic area in km2, times the multiplier. */
    AREA,
    /** Divided by another column (the denominator, for example population), times the multiplier. */
    COLUMN;

    @Override
    public String configName() {
        return ConfigWord.kebab(this);
    }
}
