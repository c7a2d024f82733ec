package aequa.atlas;

import java.nio.file.Path;
import java.util.List;

import aequa.project.ProjectFile;
import aequa.wording.Language;
import aequa.wording.Wording;

/**
 * The loaded, computed model of a whole site: the outcome of step 1 of a build. Nothing here has been
 * written to disk; {@code audit} stops after building it.
 *
 * @param projectDir the project folder
 * @param project    the parsed project file
 * @param maps       the maps, in project-file order
 * @param wordings   one per language the site is published in, first language first, the project's checked
 *                   overrides applied
 */
public record Atlas(Path projectDir, ProjectFile project, List<MapModel> maps, List<Wording> wordings) {

    public Atlas {
        maps = List.copyOf(maps);
        wordings = List.copyOf(wordings);
        if (wordings.isEmpty()) {
            throw new IllegalArgumentException("a site has at least one language");
        }
    }

    /**
     * The atlas as readers of {@code wording}'s language see it: the site's and the maps' own words in that
     * language where the project translates them (the project file's {@code translations}), and that wording
     * alone. Everything computed (geometry, classes, colours, audits) is shared, not recomputed.
     */
    public Atlas inLanguage(Wording wording) {
        String tag = wording.language().tag();
        List<MapModel> translated = maps.stream().map(m -> m.inLanguage(tag)).toList();
        ProjectFile file = new ProjectFile(project.site().inLanguage(tag), project.regions(), project.figures(),
                project.projection(), project.checks(), translated.stream().map(MapModel::spec).toList());
        return new Atlas(projectDir, file, translated, List.of(wording));
    }

    /** An atlas in the shipped wording of the project's languages (English for a tag aequa does not ship). */
    public Atlas(Path projectDir, ProjectFile project, List<MapModel> maps) {
        this(projectDir, project, maps, project.site().languages().stream()
                .map(tag -> Language.parse(tag).map(Wording::of).orElse(Wording.english())).distinct().toList());
    }
}
