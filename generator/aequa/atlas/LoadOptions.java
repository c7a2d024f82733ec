package aequa.atlas;

import java.nio.file.Path;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

import aequa.colour.Rgb;
import aequa.projection.ProjectionRequest;

/**
 * What the load step needs from outside the project file.
 *
 * @param pageBackground     the theme's page colour; ramps, borders and no-data hatches are checked against it
 * @param previousProjections the projection each map had at the previous publish (from its report.json), by
 *                           map id, so a monthly update does not shift a map unless the gain is real
 * @param cacheFolder        where the geometry stage's results are kept between runs, or empty for none
 * @param cacheUse           whether results are only read from that folder or also stored there
 * @param frameNameBands     the least heights of a composite map's frame-name bands, as shares of the drawn map's
 *                           width, on the site's drawings and in print
 */
public record LoadOptions(Rgb pageBackground, Map<String, ProjectionRequest.Previous> previousProjections,
                          Optional<Path> cacheFolder, CacheUse cacheUse, FrameNameBands frameNameBands) {

    /** How the load step uses the geometry cache. */
    public enum CacheUse {
        /** Use entries that are there, store none (for a command that writes nothing). */
        READ,
        /** Use entries and store the ones computed. */
        READ_AND_STORE
    }

    public LoadOptions {
        previousProjections = Map.copyOf(previousProjections);
        Objects.requireNonNull(cacheFolder, "cacheFolder");
        Objects.requireNonNull(cacheUse, "cacheUse");
        Objects.requireNonNull(frameNameBands, "frameNameBands");
    }

    /** No geometry cache. */
    public LoadOptions(Rgb pageBackground, Map<String, ProjectionRequest.Previous> previousProjections) {
        this(pageBackground, previousProjections, Optional.empty(), CacheUse.READ, FrameNameBands.OWN_PROPORTIONS);
    }

    public static LoadOptions defaults() {
        return new LoadOptions(new Rgb(255, 255, 255), Map.of());
    }

    /** The same options, with the geometry cache in {@code folder}. */
    public LoadOptions withCache(Path folder, CacheUse use) {
        return new LoadOptions(pageBackground, previousProjections, Optional.of(folder), use, frameNameBands);
    }

    /** The same options, with frame-name bands of at least these shares of the map's drawn width. */
    public LoadOptions withFrameNameBands(FrameNameBands bands) {
        return new LoadOptions(pageBackground, previousProjections, cacheFolder, cacheUse, bands);
    }

    GeometryCache geometryCache() {
        return cacheFolder.map(f -> GeometryCache.in(f, cacheUse == CacheUse.READ_AND_STORE)).orElseGet(GeometryCache::none);
    }
}
