package aequa.atlas;

import java.nio.file.Path;
import java.util.List;

import aequa.project.ProjectFile;

/**
 * The loaded, computed model of a whole site: the outcome of step 1 of a build. Nothing here has been
 * written to disk; {@code audit} stops after building it.
 *
 * @param projectDir the project folder
 * @param project    the parsed project file
 * @param maps       the maps, in project-file order
 */
public record Atlas(Path projectDir, ProjectFile project, List<MapModel> maps) {

    public Atlas {
        maps = List.copyOf(maps);
    }
}
