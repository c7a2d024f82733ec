package aequa.project;

/** What kind of figure an indicator is, as the map declares it. */
public enum Measure implements ConfigWord {
    /** Already a rate, share or density: comparable between regions of different sizes as given. */
    RATE,
    /** A number of things or people: grows with the size of the region. */
    COUNT,
    /**
     * Not declared (the key left out, or the word {@code undeclared}): taken as a rate unless the values look
     * like counts (the statistics stage's count guard).
     */
    UNDECLARED;

    @Override
    public String configName() {
        return ConfigWord.kebab(this);
    }
}
