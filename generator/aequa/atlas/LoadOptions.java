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
 * @param frameNameBandShare the least height of a composite map's frame-name band as a share of the map's drawn
 *                           width, so that names fit at the smallest type of the narrowest drawing (the print);
 *                           0 keeps the layout's own proportions
 */
public record LoadOptions(Rgb pageBackground, Map<String, ProjectionRequest.Previous> previousProjections,
                          Optional<Path> cacheFolder, CacheUse cacheUse, double frameNameBandShare) {

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
        if (!(frameNameBandShare >= 0 && frameNameBandShare < 1)) {
            throw new IllegalArgumentException("frame name band share must be in [0, 1): " + frameNameBandShare);
        }
    }

    /** No geometry cache. */
    public LoadOptions(Rgb pageBackground, Map<String, ProjectionRequest.Previous> previousProjections) {
        this(pageBackground, previousProjections, Optional.empty(), CacheUse.READ, 0);
    }

    public static LoadOptions defaults() {
        return new LoadOptions(new Rgb(255, 255, 255), Map.of());
    }

    /** The same options, with the geometry cache in {@code folder}. */
    public LoadOptions withCache(Path folder, CacheUse use) {
        return new LoadOptions(pageBackground, previousProjections, Optional.of(folder), use, frameNameBandShare);
    }

    /** The same options, with frame-name bands of at least {@code share} of the map's drawn width. */
    public LoadOptions withFrameNameBandShare(double share) {
        return new LoadOptions(pageBackground, previousProjections, cacheFolder, cacheUse, share);
    }

    GeometryCache geometryCache() {
        return cacheFolder.map(f -> GeometryCache.in(f, cacheUse == CacheUse.READ_AND_STORE)).orElseGet(GeometryCache::none);
    }
}
