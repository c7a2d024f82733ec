package aequa.project;

/** How the region keys of a statistics source are matched to the keys of the geometry. */
public enum KeyMatching implements ConfigWord {
    /** Keys must be equal, character for character. */
    EXACT,
    /**
     * Opt-in: keys also match when they differ only in letter case, whitespace or leading zeros of a
     * run of digits ({@code " ab-03"} matches {@code "AB-3"}). Each such match is reported.
     */
    RELAXED;

    @Override
    public String configName() {
        return ConfigWord.kebab(this);
    }
}
