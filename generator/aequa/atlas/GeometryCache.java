package aequa.atlas;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Supplier;
import java.util.stream.Stream;

import aequa.composite.PartPlan;
import aequa.findings.Findings;
import aequa.inputs.CacheFile;
import aequa.inputs.CodeStamp;
import aequa.inputs.FileStamp;
import aequa.inputs.regions.Region;
import aequa.project.InsetsSpec;
import aequa.project.RegionSourceSpec;
import aequa.projection.EqualAreaProjection;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionParameter;
import aequa.projection.ProjectionRequest;
import aequa.projection.Projections;

/**
 * The geometry stage's results kept between runs in the project's cache folder, so a run whose geometry
 * did not change (the monthly update of figures) neither reads, checks, measures, chooses nor projects it
 * again.
 *
 * <p>Three kinds of entry, each keyed by everything that shapes it:
 * <ul>
 * <li>a source's {@link RegionLayer} with its findings: the geometry file's bytes (SHA-256, through a
 *     {@link FileStamp} so an unchanged file is not read), its settings in the project file and aequa's
 *     code ({@link CodeStamp});</li>
 * <li>a {@link ProjectionChoice}: that layer key, the keys of the regions in the layer and the projection
 *     request;</li>
 * <li>a {@link PlanarLayer}: that layer key, the projection (WKT 2), the keys of the regions projected (so a
 *     layer of part of a source, such as an inset, has its own entry) and the area tolerance;</li>
 * <li>a map's parts ({@link PartPlan}s: the detached-part search and each part's projection choice): that
 *     layer key, the keys of the regions, the insets setting and the projection request.</li>
 * </ul>
 * Every file is a {@link CacheFile} (versioned, checksummed); a missing, damaged or stale entry is computed
 * again, never trusted and never fatal. Entries of a source whose geometry changed are deleted when the new
 * layer is stored. A read-only cache (for {@code audit}, which writes nothing) uses entries but stores none.
 */
final class GeometryCache {

    /** 5: a projection choice stores its reason as facts (basis, setting, comparison), not as an English sentence. */
    private static final int FORMAT = 5;

    private final Optional<Path> folder;
    private final boolean writable;
    /** The file-name prefix and layer key of each source loaded in this run, by source id. */
    private final Map<String, SourceKey> sourceKeys = new HashMap<>();

    private record SourceKey(String prefix, String layerKey) {
    }

    private GeometryCache(Optional<Path> folder, boolean writable) {
        this.folder = folder;
        this.writable = writable;
    }

    /** No cache: everything is computed. */
    static GeometryCache none() {
        return new GeometryCache(Optional.empty(), false);
    }

    static GeometryCache in(Path folder, boolean writable) {
        return new GeometryCache(Optional.of(folder), writable);
    }

    /** The layer of {@code sourceId}, from the cache or from {@code compute}, its findings added to {@code findings}. */
    RegionLayer layer(Path projectDir, String sourceId, RegionSourceSpec spec, Findings findings,
                      Supplier<GeometryCodec.LayerWithFindings> compute) {
        if (folder.isEmpty()) {
            return addFindings(compute.get(), findings);
        }
        String prefix = hex(spec.toString()).substring(0, 16);
        Optional<FileStamp> geometry = stampGeometry(projectDir.resolve(spec.file()), spec.file(), prefix);
        if (geometry.isEmpty()) {
            return addFindings(compute.get(), findings); // unreadable: the reader reports it
        }
        String key = hex(CodeStamp.current() + "\n" + spec + "\n" + geometry.get().sizeBytes() + " " + geometry.get().sha256());
        sourceKeys.put(sourceId, new SourceKey(prefix, key));
        Path file = folder.get().resolve(prefix + "-layer-" + key.substring(0, 32) + ".bin");
        Optional<GeometryCodec.LayerWithFindings> cached = CacheFile.read(file, "region-layer", FORMAT, in -> {
            keyed(in, key);
            return GeometryCodec.readLayer(in);
        }).filter(c -> c.layer().sourceId().equals(sourceId));
        if (cached.isPresent()) {
            return addFindings(cached.get(), findings);
        }
        GeometryCodec.LayerWithFindings computed = compute.get();
        if (writable) {
            deleteEntries(prefix);
            CacheFile.write(file, "region-layer", FORMAT, out -> {
                CacheFile.writeText(out, key);
                GeometryCodec.writeLayer(out, computed);
            });
        }
        return addFindings(computed, findings);
    }

    /** The projection choice for {@code layer} and {@code request}, from the cache or from {@code compute}. */
    ProjectionChoice choice(RegionLayer layer, ProjectionRequest request, Supplier<ProjectionChoice> compute) {
        if (request.previous().isPresent()) {
            // ProjectionChooser keeps its own best choice when the previous one has the same family and
            // parameters, so the answer is then the one made without a previous choice, which the first
            // publish stored: the monthly rebuild after it need not choose again
            ProjectionRequest.Previous previous = request.previous().get();
            Optional<ProjectionChoice> first = lookup(layer, "choice", "choice\n" + regionsHash(layer) + "\n"
                    + requestText(withoutPrevious(request)), in -> rebuild(GeometryCodec.readChoice(in)));
            if (first.isPresent() && sameProjection(first.get(), previous)) {
                return first.get();
            }
        }
        return entry(layer, "choice", "choice\n" + regionsHash(layer) + "\n" + requestText(request),
                in -> rebuild(GeometryCodec.readChoice(in)), GeometryCodec::writeChoice, compute);
    }

    /**
     * The parts of a map of {@code layer} with these insets and request, from the cache or from {@code plan};
     * an empty plan (the setting had errors, reported as findings by {@code plan}) is never stored.
     */
    List<PartPlan> parts(RegionLayer layer, InsetsSpec insets, ProjectionRequest request, Supplier<List<PartPlan>> plan) {
        String what = "parts\n" + regionsHash(layer) + "\n" + insets;
        if (request.previous().isPresent()) {
            // as for a choice: the main part keeps the plan made without a previous choice when it is the same
            ProjectionRequest.Previous previous = request.previous().get();
            Optional<List<PartPlan>> first = lookup(layer, "parts", what + "\n" + requestText(withoutPrevious(request)),
                    in -> PartPlanCodec.readParts(in, this::rebuild));
            if (first.isPresent() && sameProjection(first.get().get(0).choice(), previous)) {
                return first.get();
            }
        }
        String key = what + "\n" + requestText(request);
        Optional<List<PartPlan>> cached = lookup(layer, "parts", key, in -> PartPlanCodec.readParts(in, this::rebuild));
        if (cached.isPresent()) {
            return cached.get();
        }
        List<PartPlan> planned = plan.get();
        if (!planned.isEmpty()) {
            store(layer, "parts", key, PartPlanCodec::writeParts, planned);
        }
        return planned;
    }

    /** The planar layer of {@code layer} in {@code projection}, from the cache or from {@code compute}. */
    PlanarLayer planar(RegionLayer layer, EqualAreaProjection projection, double tolerance, double areaScale,
                       double minDrawnWidthM, Supplier<PlanarLayer> compute) {
        List<String> keys = layer.regions().stream().map(Region::key).toList();
        return entry(layer, "planar", "planar\n" + projection.wkt2() + "\n" + regionsHash(layer) + "\n"
                        + Double.doubleToLongBits(tolerance) + "\n" + Double.doubleToLongBits(areaScale) + "\n"
                        + Double.doubleToLongBits(minDrawnWidthM),
                in -> Optional.of(GeometryCodec.readPlanar(in)).filter(p -> List.copyOf(p.simplifiedM().keySet()).equals(keys)),
                GeometryCodec::writePlanar, compute);
    }

    private static ProjectionRequest withoutPrevious(ProjectionRequest request) {
        return new ProjectionRequest(request.family(), request.forcedParameters(), Optional.empty());
    }

    private static boolean sameProjection(ProjectionChoice choice, ProjectionRequest.Previous previous) {
        return choice.projection().family() == previous.family() && choice.projection().parameters().equals(
                Projections.create(previous.family(), previous.parameters()).parameters());
    }

    /** The keys of the regions a layer holds: a layer of part of a source (an inset) has entries of its own. */
    private static String regionsHash(RegionLayer layer) {
        StringBuilder regions = new StringBuilder();
        layer.regions().forEach(r -> regions.append(r.key()).append('\n'));
        return hex(regions.toString());
    }

    /** Writes an entry's value after its key. */
    private interface EntryWriter<T> {
        void write(java.io.DataOutputStream out, T value) throws IOException;
    }

    /**
     * An entry derived from {@code layer}: read when its file holds the same key and {@code read} accepts it,
     * otherwise computed and, when the cache is writable, stored.
     */
    private <T> T entry(RegionLayer layer, String kind, String what, CacheFile.PayloadReader<Optional<T>> read,
                        EntryWriter<T> write, Supplier<T> compute) {
        Optional<String> key = entryKey(layer, what);
        if (key.isEmpty()) {
            return compute.get();
        }
        Optional<T> cached = lookup(layer, kind, what, read);
        if (cached.isPresent()) {
            return cached.get();
        }
        T computed = compute.get();
        store(layer, kind, what, write, computed);
        return computed;
    }

    /** Stores {@code value} as the entry {@code what} derived from {@code layer}, when the cache is writable. */
    private <T> void store(RegionLayer layer, String kind, String what, EntryWriter<T> write, T value) {
        Optional<String> key = entryKey(layer, what);
        if (writable && key.isPresent()) {
            CacheFile.write(entryFile(layer, kind, key.get()), kind, FORMAT, out -> {
                CacheFile.writeText(out, key.get());
                write.write(out, value);
            });
        }
    }

    /** The entry derived from {@code layer}, when its file holds the same key and {@code read} accepts it. */
    private <T> Optional<T> lookup(RegionLayer layer, String kind, String what, CacheFile.PayloadReader<Optional<T>> read) {
        Optional<String> key = entryKey(layer, what);
        if (key.isEmpty()) {
            return Optional.empty();
        }
        return CacheFile.read(entryFile(layer, kind, key.get()), kind, FORMAT, in -> {
            keyed(in, key.get());
            return read.read(in);
        }).flatMap(value -> value);
    }

    private Optional<String> entryKey(RegionLayer layer, String what) {
        SourceKey source = sourceKeys.get(layer.sourceId());
        return folder.isEmpty() || source == null ? Optional.empty() : Optional.of(hex(source.layerKey() + "\n" + what));
    }

    /** Entries are named after their source, so a source's entries go when its geometry changes. */
    private Path entryFile(RegionLayer layer, String kind, String key) {
        String prefix = sourceKeys.get(layer.sourceId()).prefix();
        return folder.orElseThrow().resolve(prefix + "-" + kind + "-" + key.substring(0, 32) + ".bin");
    }

    private Optional<ProjectionChoice> rebuild(GeometryCodec.StoredChoice stored) {
        Map<String, Double> values = new TreeMap<>();
        for (ProjectionParameter p : stored.parameters()) {
            values.put(p.key(), p.value());
        }
        EqualAreaProjection projection = Projections.create(stored.family(), values);
        if (!projection.wkt2().equals(stored.wkt2()) || !projection.parameters().equals(stored.parameters())) {
            return Optional.empty(); // made again rather than trusted
        }
        return Optional.of(new ProjectionChoice(projection, stored.omegaMaxDeg(), stored.omegaMeanDeg(),
                stored.worstLonDeg(), stored.worstLatDeg(), stored.runnersUp(), stored.reason(), stored.spread()));
    }

    /** The request in a stable form (the maps inside a request iterate in an order that changes per run). */
    private static String requestText(ProjectionRequest request) {
        return request.family().map(Enum::name).orElse("auto") + " " + new TreeMap<>(request.forcedParameters())
                + " " + request.previous().map(p -> p.family().name() + " " + new TreeMap<>(p.parameters())).orElse("none");
    }

    private Optional<FileStamp> stampGeometry(Path geometryFile, String name, String prefix) {
        Path stampFile = folder.orElseThrow().resolve(prefix + "-stamp.bin");
        Optional<FileStamp> before = CacheFile.read(stampFile, "file-stamp", FORMAT, in -> new FileStamp(
                CacheFile.readText(in), in.readLong(), in.readLong(), CacheFile.readText(in), in.readBoolean()));
        try {
            FileStamp now = FileStamp.of(geometryFile, name, before);
            if (now.sizeBytes() < 0) {
                return Optional.empty();
            }
            if (writable && !before.equals(Optional.of(now))) {
                CacheFile.write(stampFile, "file-stamp", FORMAT, out -> {
                    CacheFile.writeText(out, now.name());
                    out.writeLong(now.sizeBytes());
                    out.writeLong(now.modifiedNanos());
                    CacheFile.writeText(out, now.sha256());
                    out.writeBoolean(now.settled());
                });
            }
            return Optional.of(now);
        } catch (IOException unreadable) {
            return Optional.empty();
        }
    }

    private void deleteEntries(String prefix) {
        try (Stream<Path> files = Files.list(folder.orElseThrow())) {
            for (Path f : files.filter(f -> f.getFileName().toString().startsWith(prefix + "-")
                    && !f.getFileName().toString().equals(prefix + "-stamp.bin")).toList()) {
                Files.deleteIfExists(f);
            }
        } catch (IOException absentOrUnwritable) {
            // nothing to delete, or a cache we cannot tidy: stale entries are never read (their keys differ)
        }
    }

    private static void keyed(java.io.DataInputStream in, String key) throws IOException {
        if (!CacheFile.readText(in).equals(key)) {
            throw new IOException("another entry under the same short name");
        }
    }

    private static RegionLayer addFindings(GeometryCodec.LayerWithFindings layer, Findings findings) {
        layer.findings().forEach(findings::add);
        return layer.layer();
    }

    private static String hex(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("this Java has no SHA-256", e);
        }
    }
}
