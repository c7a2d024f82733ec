package aequa.project;

/** How a statistics table holds its figures. */
public enum TableLayout implements ConfigWord {
    /** One row per region (and period, when there is a period column); one column per indicator. */
    WIDE,
    /** One row per region, indicator and period; the figure in a single value column. */
    LONG;

    @Override
    public String configName() {
        return ConfigWord.kebab(this);
    }
}
