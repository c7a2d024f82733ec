package aequa.project;

/** What a region of the geometry without any figure in the statistics is. */
public enum MissingFigures implements ConfigWord {
    /** Reported as a warning; the region is drawn as no data. */
    WARNING,
    /** Reported as an error; the build stops. */
    ERROR;

    @Override
    public String configName() {
        return ConfigWord.kebab(this);
    }
}
