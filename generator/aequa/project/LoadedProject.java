package aequa.project;

import java.nio.file.Path;

/**
 * A project file that parsed and passed its own checks.
 *
 * @param dir    the project folder; every file name in the project is relative to it
 * @param file   the bound project file
 * @param places where each value stands in the file, for findings of later stages
 */
public record LoadedProject(Path dir, ProjectFile file, ProjectPlaces places) {
}
