package aequa.findings;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Collects the findings of one load step, in the order they were found. Problems in user data are
 * data: stages add findings here and carry on where they can, so the user sees every problem at once.
 * Not thread-safe; each stage that runs in parallel collects into its own instance and merges.
 */
public final class Findings {

    private final List<Finding> list = new ArrayList<>();

    public void add(Finding finding) {
        list.add(finding);
    }

    public void addAll(Findings other) {
        list.addAll(other.list);
    }

    public boolean hasErrors() {
        return list.stream().anyMatch(f -> f.severity() == Severity.ERROR);
    }

    public long count(Severity severity) {
        return list.stream().filter(f -> f.severity() == severity).count();
    }

    /** An unmodifiable view, in order of discovery. */
    public List<Finding> list() {
        return Collections.unmodifiableList(list);
    }
}
