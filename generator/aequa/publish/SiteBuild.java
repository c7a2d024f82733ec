package aequa.publish;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;
import aequa.findings.Finding;
import aequa.pages.EmbedView;
import aequa.pages.MapPageView;
import aequa.pages.PageRenderer;
import aequa.pages.SiteView;
import aequa.publish.PublishProgress.Stage;
import aequa.wording.Wording;

/** One run of {@link SitePublisher#publish}: holds the state of a single build; used once, under the lock. */
final class SiteBuild {

    /** Allowed in a folder aequa has not published into yet (keeps an empty folder in git). */
    private static final String GIT_KEEP = ".gitkeep";

    private final Atlas atlas;
    private final List<Finding> findings;
    private final MapArtwork artwork;
    private final Path out;
    private final SiteLock lock;
    private final PublishOptions options;
    private final ObjectMapper json = SiteReport.jsonMapper();
    private final Map<String, OutputManifest.Entry> next = new TreeMap<>();
    private final List<String> mapsDrawn = new ArrayList<>();
    private final List<String> mapsReused = new ArrayList<>();
    private OutputManifest previous = OutputManifest.empty();
    private StagingFolder staging;
    private int written;
    private int kept;

    SiteBuild(Atlas atlas, List<Finding> findings, MapArtwork artwork, SiteLock lock, PublishOptions options) {
        this.atlas = atlas;
        this.findings = List.copyOf(findings);
        this.artwork = artwork;
        this.out = lock.outDir();
        this.lock = lock;
        this.options = options;
    }

    PublishResult run(long startNanos) throws IOException {
        PublishProgress progress = options.progress();
        progress.step(Stage.PREPARE, 0, 1);
        StagingFolder.recover(out, lock.previousRunId());
        lock.recordRun();
        refuseForeignFolder();
        PageRenderer renderer = new PageRenderer(atlas.projectDir().resolve("templates"));
        List<String> unsafe = renderer.checkTemplates();
        if (!unsafe.isEmpty()) {
            throw new PublishRefusedException("Template " + String.join(", ", unsafe) + " switches HTML escaping off"
                    + " (?no_esc, noautoesc, auto_esc=false or outputformat). Remove it: aequa escapes all data.");
        }
        previous = OutputManifest.read(out, json);
        List<String> ids = atlas.maps().stream().map(MapModel::id).toList();
        List<String> fileIds = SafePaths.distinctFileSafeIds(ids);
        List<SiteLanguage> languages = SiteLanguage.of(atlas.wordings());
        byte[] themeCss = ThemeStyles.find(atlas.projectDir(), atlas.project().site().theme());
        // templates and assets read once: the hash and the copied assets come from the same bytes
        Map<String, byte[]> sources = new LinkedHashMap<>();
        Stream.concat(PageRenderer.TEMPLATE_NAMES.stream(), PageRenderer.ASSET_NAMES.stream())
                .forEach(name -> sources.put(name, renderer.source(name)));
        Sha256 wordingHash = new Sha256();
        atlas.wordings().forEach(w -> wordingHash.add(w.fingerprint()));
        String siteHash = new Sha256().add(siteHash(sources, themeCss)).add(wordingHash.hex()).hex();
        progress.step(Stage.PREPARE, 1, 1);

        try (StagingFolder folder = StagingFolder.create(out, lock.runId())) {
            staging = folder;
            int count = atlas.maps().size();
            Sha256 edition = new Sha256();
            List<String> fingerprints = IntStream.range(0, count).parallel()
                    .mapToObj(i -> MapFingerprint.of(atlas.maps().get(i))).toList();
            for (int i = 0; i < count; i++) {
                edition.add(fileIds.get(i)).add(fingerprints.get(i));
            }
            int steps = count * languages.size();
            for (int l = 0; l < languages.size(); l++) {
                SiteLanguage language = languages.get(l);
                // the maps' and the site's own words in this language; fingerprints come from the whole project
                // file, translations included, so a changed translation redraws
                Atlas inLanguage = atlas.inLanguage(language.wording());
                SiteView site = SiteViews.site(inLanguage.project().site(), language, languages);
                MapArtwork artwork = this.artwork.inLanguage(language.wording());
                List<MapFiles> files = fileIds.stream().map(id -> MapFiles.of(language.prefix(), id)).toList();
                List<String> drawHashes = fingerprints.stream().map(f -> drawHash(f, artwork)).toList();
                int atOnce = MapPictures.mapsAtOnce();
                for (int first = 0; first < count; first += atOnce) {
                    // the maps of a batch are drawn at the same time; their files are written one map after another
                    List<Optional<MapPictures>> pictures = IntStream.range(first, Math.min(count, first + atOnce)).parallel()
                            .mapToObj(i -> reusable(files.get(i).drawn(), drawHashes.get(i)) ? Optional.<MapPictures>empty()
                                    : Optional.of(MapPictures.draw(artwork, inLanguage.maps().get(i), options.pngWidthPx())))
                            .toList();
                    for (int i = first; i < Math.min(count, first + atOnce); i++) {
                        progress.step(Stage.MAPS, l * count + i, steps);
                        buildMap(inLanguage.maps().get(i), drawHashes.get(i), pictures.get(i - first), files.get(i),
                                renderer, site, siteHash);
                    }
                }
            }
            progress.step(Stage.MAPS, steps, steps);

            progress.step(Stage.REPORT, 0, 1);
            String digest = edition.hex();
            String pagesHash = new Sha256().add(siteHash).add(digest).add(CanonicalBytes.of(findings)).hex();
            List<String> sitePages = new ArrayList<>(List.of(SiteReport.FILE_NAME));
            languages.forEach(language -> sitePages.addAll(language.sitePages()));
            int changedMaps;
            if (reusable(sitePages, pagesHash)) {
                sitePages.forEach(path -> carryOver(path, pagesHash));
                changedMaps = -1;
                progress.step(Stage.REPORT, 1, 1);
            } else {
                List<MapFiles> rootFiles = fileIds.stream().map(MapFiles::of).toList();
                ArrayNode maps = SiteReport.maps(atlas, rootFiles, json);
                Optional<JsonNode> previousReport = SiteReport.readPrevious(out, json);
                JsonNode changes = EditionChanges.compare(previousReport, maps, digest, json);
                changedMaps = changes.path("maps").size();
                put(SiteReport.FILE_NAME, SiteReport.write(atlas, maps, digest, findings, changes, json), pagesHash);
                progress.step(Stage.REPORT, 1, 1);
                progress.step(Stage.PAGES, 0, 1);
                for (SiteLanguage language : languages) {
                    Atlas inLanguage = atlas.inLanguage(language.wording());
                    SiteView site = SiteViews.site(inLanguage.project().site(), language, languages);
                    Wording wording = language.wording();
                    // links from a language's site pages to its map pages are relative to that language's root
                    List<MapFiles> files = fileIds.stream().map(MapFiles::of).toList();
                    String p = language.prefix();
                    put(p + "index.html", utf8(renderer.renderIndex(site, SiteViews.index(inLanguage, files, wording))), pagesHash);
                    put(p + "method.html", utf8(renderer.renderMethod(site, SiteViews.method(inLanguage, files, wording))), pagesHash);
                    put(p + "changes.html", utf8(renderer.renderChanges(site, SiteViews.changes(changes, ids, files, wording))), pagesHash);
                }
            }
            for (String asset : PageRenderer.ASSET_NAMES) {
                put(asset, sources.get(asset), siteHash);
            }
            put("assets/theme.css", themeCss, siteHash);
            progress.step(Stage.PAGES, 1, 1);

            progress.step(Stage.SWAP, 0, 1);
            OutputManifest manifest = new OutputManifest(next);
            byte[] manifestBytes = manifest.toJson(json);
            int removed = (int) previous.entries().keySet().stream()
                    .filter(p -> !next.containsKey(p) && Files.exists(out.resolve(p))).count();
            boolean unchanged = written == 0 && removed == 0 && sameBytes(OutputManifest.FILE_NAME, manifestBytes);
            int userFilesKept = 0;
            if (!unchanged) {
                UserFiles userFiles = UserFiles.scan(out, previous.entries().keySet());
                userFiles.refuseConflicts(out, next.keySet());
                userFiles.carryInto(staging);
                userFilesKept = userFiles.count();
                staging.write(OutputManifest.FILE_NAME, manifestBytes);
                staging.commit();
            }
            progress.step(Stage.SWAP, 1, 1);
            return new PublishResult(out, !unchanged, mapsDrawn, mapsReused, written, kept, removed, changedMaps,
                    Duration.ofNanos(System.nanoTime() - startNanos), userFilesKept);
        }
    }

    private String drawHash(String fingerprint, MapArtwork artwork) {
        return new Sha256().add(fingerprint).add(artwork.fingerprint()).add(Integer.toString(options.pngWidthPx())).hex();
    }

    private void buildMap(MapModel map, String drawHash, Optional<MapPictures> drawn, MapFiles files,
                          PageRenderer renderer, SiteView site, String siteHash) throws IOException {
        String pageHash = new Sha256().add(drawHash).add(siteHash).hex();
        String webSvg = null;
        if (drawn.isEmpty()) {
            files.drawn().forEach(path -> carryOver(path, drawHash));
            if (files.languagePrefix().isEmpty()) {
                mapsReused.add(map.id()); // counted once, in the first language: every language draws the same maps
            }
        } else {
            MapPictures pictures = drawn.get();
            webSvg = pictures.webSvg();
            if (webSvg.toLowerCase(Locale.ROOT).contains("<script")) {
                throw new IllegalStateException("the web SVG of map " + map.id() + " contains a script; refusing to inline it");
            }
            write(files.webSvg(), utf8(webSvg), drawHash);
            write(files.printSvg(), pictures.printSvg(), drawHash);
            write(files.pdf(), pictures.pdf(), drawHash);
            write(files.png(), pictures.png(), drawHash);
            write(files.pngDouble(), pictures.pngDouble(), drawHash);
            if (files.languagePrefix().isEmpty()) {
                mapsDrawn.add(map.id());
            }
        }
        if (reusable(files.written(), pageHash)) {
            files.written().forEach(path -> carryOver(path, pageHash));
            return;
        }
        if (webSvg == null) {
            webSvg = Files.readString(out.resolve(files.webSvg()), StandardCharsets.UTF_8);
        }
        String prefix = files.languagePrefix();
        MapPageView page = MapViews.page(map, files, webSvg, site.wording());
        EmbedView embed = MapViews.embed(map, files, webSvg);
        write(files.page(), utf8(renderer.renderMap(site, page, files.page().substring(prefix.length()), embed)), pageHash);
        write(files.embed(), utf8(renderer.renderEmbed(site, page, files.embed().substring(prefix.length()), embed)), pageHash);
        write(files.fragment(), utf8(renderer.renderFragment(site, page, files.fragment().substring(prefix.length()), embed,
                FragmentSvg.of(webSvg))), pageHash);
        write(files.figures(), utf8(renderer.renderFigures(site, MapViews.figures(map, files, site.wording()),
                files.figures().substring(prefix.length()))), pageHash);
        write(files.csv(), FiguresCsv.write(map), pageHash);
    }

    /** True when every file is recorded with {@code inputs} and is still on disk with the recorded bytes. */
    private boolean reusable(List<String> paths, String inputs) {
        return paths.stream().allMatch(path -> previous.get(path)
                .filter(entry -> entry.inputs().equals(inputs))
                .map(entry -> onDiskMatches(path, entry.content()))
                .orElse(false));
    }

    private boolean onDiskMatches(String path, String content) {
        Path file = out.resolve(path);
        try {
            return Files.isRegularFile(file) && Sha256.of(Files.readAllBytes(file)).equals(content);
        } catch (IOException unreadable) {
            return false;
        }
    }

    private boolean sameBytes(String path, byte[] bytes) {
        return onDiskMatches(path, Sha256.of(bytes));
    }

    /** Writes a file made in this build, or carries the previous one over when its bytes are the same. */
    private void put(String path, byte[] bytes, String inputs) throws IOException {
        String content = Sha256.of(bytes);
        Optional<OutputManifest.Entry> before = previous.get(path);
        if (before.isPresent() && before.get().content().equals(content) && onDiskMatches(path, content)) {
            staging.reuse(path);
            next.put(path, new OutputManifest.Entry(inputs, content));
            if (!before.get().inputs().equals(inputs)) {
                written++; // same bytes, new inputs: the manifest changes, so the edition does too
            } else {
                kept++;
            }
            return;
        }
        write(path, bytes, inputs);
    }

    private void write(String path, byte[] bytes, String inputs) throws IOException {
        staging.write(path, bytes);
        next.put(path, new OutputManifest.Entry(inputs, Sha256.of(bytes)));
        written++;
    }

    private void carryOver(String path, String inputs) {
        try {
            staging.reuse(path);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException("cannot carry over " + path, e);
        }
        next.put(path, new OutputManifest.Entry(inputs, previous.get(path).orElseThrow().content()));
        kept++;
    }

    private String siteHash(Map<String, byte[]> sources, byte[] themeCss) {
        Sha256 sha = new Sha256().add(CanonicalBytes.of(atlas.project().site()));
        sources.forEach((name, bytes) -> sha.add(name).add(bytes));
        return sha.add(themeCss).hex();
    }

    private void refuseForeignFolder() throws IOException {
        if (!Files.exists(out)) {
            return;
        }
        if (!Files.isDirectory(out)) {
            throw new PublishRefusedException("The output " + out + " is a file, not a folder. Choose a folder.");
        }
        if (Files.isRegularFile(out.resolve(OutputManifest.FILE_NAME))) {
            return;
        }
        try (Stream<Path> entries = Files.list(out)) {
            if (entries.anyMatch(p -> !p.getFileName().toString().equals(GIT_KEEP))) {
                throw new PublishRefusedException("Refusing to replace " + out + ": it holds files aequa did not write"
                        + " (no " + OutputManifest.FILE_NAME + "). Choose an empty or new output folder.");
            }
        }
    }

    private static byte[] utf8(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }
}
