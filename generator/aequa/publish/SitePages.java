package aequa.publish;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;
import aequa.findings.Finding;
import aequa.pages.PageRenderer;
import aequa.pages.SiteView;
import aequa.wording.Wording;

/**
 * The files of a site that depend on no drawing: report.json (with the comparison with the previous
 * edition's) and, in each language, the index, method and changes pages. {@link #make} may run on any thread,
 * beside the maps' jobs ({@link ParallelJobs}); {@link #files} and {@link #changedMaps} are read after it ended.
 */
final class SitePages {

    private final Atlas atlas;
    private final List<Atlas> editions;
    private final List<SiteLanguage> languages;
    private final List<String> fileIds;
    private final List<Finding> findings;
    private final String digest;
    private final PageRenderer renderer;
    private final Path out;
    private final ObjectMapper json;
    private List<MadeFile> files = List.of();
    private int changedMaps;

    /**
     * @param editions the atlas in each of {@code languages}, in their order
     * @param digest   the edition's digest (the maps' fingerprints)
     * @param out      the output folder, holding the previous edition's report
     */
    SitePages(Atlas atlas, List<Atlas> editions, List<SiteLanguage> languages, List<String> fileIds, List<Finding> findings,
              String digest, PageRenderer renderer, Path out, ObjectMapper json) {
        this.atlas = atlas;
        this.editions = editions;
        this.languages = languages;
        this.fileIds = fileIds;
        this.findings = findings;
        this.digest = digest;
        this.renderer = renderer;
        this.out = out;
        this.json = json;
    }

    /** Makes report.json, then each language's site pages, in that order. */
    void make() {
        List<MapFiles> rootFiles = fileIds.stream().map(MapFiles::of).toList();
        ArrayNode maps = SiteReport.maps(atlas, rootFiles, json);
        Optional<JsonNode> previousReport = SiteReport.readPrevious(out, json);
        JsonNode changes = EditionChanges.compare(previousReport, maps, digest, json);
        List<MadeFile> made = new ArrayList<>();
        try {
            made.add(MadeFile.of(SiteReport.FILE_NAME, SiteReport.write(atlas, maps, digest, findings, changes, json)));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + SiteReport.FILE_NAME + " in memory", e);
        }
        List<String> ids = atlas.maps().stream().map(MapModel::id).toList();
        for (int l = 0; l < languages.size(); l++) {
            SiteLanguage language = languages.get(l);
            Atlas inLanguage = editions.get(l);
            SiteView site = SiteViews.site(inLanguage.project().site(), language, languages);
            Wording wording = language.wording();
            // links from a language's site pages to its map pages are relative to that language's root
            List<MapFiles> files = fileIds.stream().map(MapFiles::of).toList();
            String p = language.prefix();
            made.add(MadeFile.of(p + "index.html", renderer.renderIndex(site, SiteViews.index(inLanguage, files, wording))));
            made.add(MadeFile.of(p + "method.html", renderer.renderMethod(site, SiteViews.method(inLanguage, files, wording))));
            made.add(MadeFile.of(p + "changes.html", renderer.renderChanges(site, SiteViews.changes(changes, ids, files, wording))));
        }
        this.files = List.copyOf(made);
        this.changedMaps = changes.path("maps").size();
    }

    /** report.json, then each language's index, method and changes pages. */
    List<MadeFile> files() {
        return files;
    }

    /** How many maps the changes section lists. */
    int changedMaps() {
        return changedMaps;
    }
}
