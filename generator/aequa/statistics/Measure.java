package aequa.statistics;

/** What kind of figure an indicator is, as the map declares it. */
public enum Measure {
    /** Already a rate, share or density: comparable between regions of different sizes as given. */
    RATE,
    /** A number of things or people: grows with the size of the region. */
    COUNT,
    /** Not declared: taken as a rate unless the values look like counts ({@link CountGuard}). */
    UNDECLARED
}
