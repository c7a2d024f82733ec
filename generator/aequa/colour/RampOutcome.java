package aequa.colour;

import java.util.List;

import aequa.findings.Finding;

/**
 * What {@link ColourRamps#generate} produced.
 *
 * @param ramp     the fills with their label colours and checks. It may hold fewer fills than classes were asked for (see {@code colours-fewer-classes})
 * @param nonText  the border and no-data hatch colours the ramp was checked against
 * @param findings adjustments made (NOTE), fewer classes or failed checks (WARNING)
 */
public record RampOutcome(ColourRamp ramp, NonTextColours nonText, List<Finding> findings) {

    public RampOutcome {
        findings = List.copyOf(findings);
    }
}
