package aequa.project;

/** How a map shows its figures. */
public enum MapDisplay implements ConfigWord {
    /** Regions filled by class: only for rates, shares and densities. */
    CHOROPLETH,
    /** Proportional symbols: a circle per region with area proportional to the figure; for counts. */
    CIRCLES;

    @Override
    public String configName() {
        return ConfigWord.kebab(this);
    }
}
