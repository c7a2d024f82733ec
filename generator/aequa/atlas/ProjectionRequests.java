package aequa.atlas;

import java.util.Arrays;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.LoadedProject;
import aequa.project.MapSpec;
import aequa.project.ProjectFile;
import aequa.project.ProjectionSpec;
import aequa.projection.ProjectionFamily;
import aequa.projection.ProjectionRequest;

/**
 * Turns the project file's projection settings into a request: the map's own settings override the
 * project-wide ones, parameter by parameter; an unknown family is reported where it stands.
 */
final class ProjectionRequests {

    private ProjectionRequests() {
    }

    static Optional<ProjectionRequest> of(LoadedProject project, int mapIndex, MapSpec map,
                                          Optional<ProjectionRequest.Previous> previous, Findings findings) {
        ProjectionSpec wide = project.file().projection();
        ProjectionSpec own = map.projection() == null ? ProjectionSpec.AUTOMATIC : map.projection();
        boolean ownFamily = !"auto".equals(own.family());
        String familyName = ownFamily ? own.family() : wide.family();
        String pointer = ownFamily ? "/maps/" + mapIndex + "/projection/family" : "/projection/family";
        Optional<ProjectionFamily> family = Optional.empty();
        if (!"auto".equals(familyName)) {
            family = ProjectionFamily.fromConfigName(familyName);
            if (family.isEmpty()) {
                findings.add(Finding.error("project-unknown-value", ProjectFile.FILE_NAME, project.places().place(pointer),
                        "Unknown projection family '" + familyName + "'.",
                        "Use 'auto' or one of: " + String.join(", ", Arrays.stream(ProjectionFamily.values())
                                .map(ProjectionFamily::configName).toList()) + "."));
                return Optional.empty();
            }
        }
        Map<String, Double> parameters = new TreeMap<>(wide.parameters());
        parameters.putAll(own.parameters());
        if (!parameters.isEmpty() && family.isEmpty()) {
            findings.add(Finding.error("project-projection-parameters-without-family", ProjectFile.FILE_NAME,
                    project.places().place("/maps/" + mapIndex + "/projection"),
                    "Map '" + map.id() + "' forces projection parameters but no family.",
                    "Name the family too, for example 'family: albers-conic'; parameters differ between families."));
            return Optional.empty();
        }
        return Optional.of(new ProjectionRequest(family, parameters, previous));
    }
}
