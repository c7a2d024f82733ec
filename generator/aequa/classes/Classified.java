package aequa.classes;

import java.util.List;
import java.util.Optional;

import aequa.findings.Finding;

/**
 * What {@link Classifier#classify} produced: the classes, if any could be made, and the findings about
 * the spec and the values (errors in the spec, non-finite values, fewer classes than asked for and why).
 *
 * @param classification empty when the spec has an error or there is no finite value to classify
 * @param findings       in the order found; an empty classification always comes with at least one
 */
public record Classified(Optional<Classification> classification, List<Finding> findings) {

    public Classified {
        findings = List.copyOf(findings);
    }
}
