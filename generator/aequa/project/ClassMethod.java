package aequa.project;

import java.util.Arrays;
import java.util.Optional;

/** The classification methods aequa offers; {@link #configName()} is the project-file spelling. */
public enum ClassMethod implements ConfigWord {
    QUANTILE("quantile"),
    EQUAL_INTERVAL("equal-interval"),
    NATURAL_BREAKS("natural-breaks"),
    STANDARD_DEVIATION("std-dev"),
    DIVERGING("diverging"),
    MANUAL("manual"),
    UNCLASSED("unclassed");

    private final String configName;

    ClassMethod(String configName) {
        this.configName = configName;
    }

    @Override
    public String configName() {
        return configName;
    }

    public static Optional<ClassMethod> fromConfigName(String name) {
        return Arrays.stream(values()).filter(m -> m.configName.equals(name)).findFirst();
    }
}
