package aequa.atlas;

import java.util.ArrayList;
import java.util.List;

import aequa.findings.Findings;
import aequa.project.LoadedProject;
import aequa.project.MapSpec;
import aequa.wording.SiteWording;
import aequa.wording.Wording;

/**
 * Step 1 of a build: from a checked project file to the immutable {@link Atlas}, with every problem in the
 * data added to {@code findings}. Nothing is written to disk. A map whose data cannot be used at all is left
 * out of the atlas (its findings say why); the caller decides from {@link Findings#hasErrors()} whether to
 * publish.
 */
public final class AtlasLoader {

    private AtlasLoader() {
    }

    public static Atlas load(LoadedProject project, LoadOptions options, Findings findings) {
        MapAssembler assembler = new MapAssembler(project, options, findings);
        List<MapModel> maps = new ArrayList<>();
        List<MapSpec> specs = project.file().maps();
        for (int i = 0; i < specs.size(); i++) {
            assembler.assemble(i, specs.get(i)).ifPresent(maps::add);
        }
        List<Wording> wordings = SiteWording.load(project.dir(), project.file().site().languages(), findings);
        return new Atlas(project.dir(), project.file(), maps, wordings);
    }
}
