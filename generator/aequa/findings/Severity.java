package aequa.findings;

/** How much a finding matters to a build. */
public enum Severity {
    /** The data cannot be published as it is; the build stops with exit code 1. */
    ERROR,
    /** Published, but a reader or analyst should know. */
    WARNING,
    /** Something aequa did on the user's behalf (a repair, a dropped island). */
    NOTE
}
