package aequa.project;

import java.util.List;
import java.util.Map;

/**
 * The parsed project file ({@value #FILE_NAME}), exactly as the user wrote it, with defaults filled in.
 * Keys are kebab-case in YAML ({@code area-tolerance}); unknown keys are errors.
 *
 * @param site       what the whole site says about itself
 * @param regions    geometry sources by id
 * @param figures    statistics sources by id
 * @param projection projection settings applied to every map unless a map overrides them
 * @param checks     thresholds that decide when the data has a problem
 * @param maps       the maps, in the order the site lists them
 */
public record ProjectFile(SiteSpec site, Map<String, RegionSourceSpec> regions, Map<String, FigureSourceSpec> figures,
                          ProjectionSpec projection, ChecksSpec checks, List<MapSpec> maps) {

    public static final String FILE_NAME = "aequa.yaml";

    public ProjectFile {
        site = site == null ? SiteSpec.DEFAULT : site;
        regions = regions == null ? Map.of() : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(regions));
        figures = figures == null ? Map.of() : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(figures));
        projection = projection == null ? ProjectionSpec.AUTOMATIC : projection;
        checks = checks == null ? ChecksSpec.DEFAULT : checks;
        maps = maps == null ? List.of() : List.copyOf(maps);
    }
}
