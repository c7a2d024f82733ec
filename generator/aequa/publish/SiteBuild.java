package aequa.publish;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;
import aequa.findings.Finding;
import aequa.pages.PageRenderer;
import aequa.publish.PublishProgress.Stage;

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
            String digest = edition.hex();
            String pagesHash = new Sha256().add(siteHash).add(digest).add(CanonicalBytes.of(findings)).hex();
            List<String> sitePages = new ArrayList<>(List.of(SiteReport.FILE_NAME));
            languages.forEach(language -> sitePages.addAll(language.sitePages()));
            // each edition: the maps' and the site's own words in its language; fingerprints come from the whole
            // project file, translations included, so a changed translation redraws
            List<Atlas> editions = languages.stream().map(language -> atlas.inLanguage(language.wording())).toList();
            // the report and site pages depend on no drawing: made beside the first maps when they changed
            SitePages site = reusable(sitePages, pagesHash) ? null
                    : new SitePages(atlas, editions, languages, fileIds, findings, digest, renderer, out, json);
            Runnable siteJob = site == null ? null : site::make;
            int steps = count * languages.size();
            for (int l = 0; l < languages.size(); l++) {
                SiteLanguage language = languages.get(l);
                Atlas inLanguage = editions.get(l);
                MapArtwork artwork = this.artwork.inLanguage(language.wording());
                MapBuild.Makers makers = new MapBuild.Makers(artwork, options.pngWidthPx(), renderer,
                        SiteViews.site(inLanguage.project().site(), language, languages), out);
                List<MapFiles> files = fileIds.stream().map(id -> MapFiles.of(language.prefix(), id)).toList();
                int atOnce = ParallelJobs.threads();
                for (int first = 0; first < count; first += atOnce) {
                    // the maps of a batch are made at the same time; their files are written one map after another
                    List<MapBuild> batch = new ArrayList<>();
                    for (int i = first; i < Math.min(count, first + atOnce); i++) {
                        String drawHash = drawHash(fingerprints.get(i), artwork);
                        String pageHash = new Sha256().add(drawHash).add(siteHash).hex();
                        MapFiles mapFiles = files.get(i);
                        batch.add(new MapBuild(inLanguage.maps().get(i), mapFiles, drawHash, pageHash,
                                !reusable(mapFiles.drawn(), drawHash), !reusable(mapFiles.written(), pageHash), makers));
                    }
                    List<Runnable> jobs = new ArrayList<>();
                    for (MapBuild.Job job : MapBuild.Job.values()) {
                        batch.forEach(map -> map.job(job).ifPresent(jobs::add));
                    }
                    if (siteJob != null) {
                        jobs.add(siteJob);
                        siteJob = null;
                    }
                    ParallelJobs.runAll(jobs);
                    for (int i = first; i < Math.min(count, first + atOnce); i++) {
                        progress.step(Stage.MAPS, l * count + i, steps);
                        MapBuild map = batch.get(i - first);
                        if (language.prefix().isEmpty()) { // counted once: every language draws the same maps
                            (map.draws() ? mapsDrawn : mapsReused).add(atlas.maps().get(i).id());
                        }
                        map.writeTo(mapOutput);
                    }
                }
            }
            progress.step(Stage.MAPS, steps, steps);

            progress.step(Stage.REPORT, 0, 1);
            int changedMaps;
            if (site == null) {
                sitePages.forEach(path -> carryOver(path, pagesHash));
                changedMaps = -1;
            } else {
                if (siteJob != null) {
                    siteJob.run(); // a site without maps
                }
                for (MadeFile file : site.files()) {
                    put(file, pagesHash);
                }
                changedMaps = site.changedMaps();
            }
            progress.step(Stage.REPORT, 1, 1);
            progress.step(Stage.PAGES, 0, 1);
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
        put(MadeFile.of(path, bytes), inputs);
    }

    private void put(MadeFile file, String inputs) throws IOException {
        String path = file.path();
        String content = file.sha256();
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
        write(file, inputs);
    }

    private void write(MadeFile file, String inputs) throws IOException {
        staging.write(file.path(), file.bytes());
        next.put(file.path(), new OutputManifest.Entry(inputs, file.sha256()));
        written++;
    }

    /** A map's files go through the same bookkeeping as the site's. */
    private final MapBuild.Output mapOutput = new MapBuild.Output() {
        @Override
        public void write(MadeFile file, String inputs) throws IOException {
            SiteBuild.this.write(file, inputs);
        }

        @Override
        public void carryOver(String path, String inputs) {
            SiteBuild.this.carryOver(path, inputs);
        }
    };

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

}
