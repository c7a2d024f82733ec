package aequa.publish;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Locale;

/**
 * What a publish did. Only {@link #summary()} mentions time; nothing timed is written into the site.
 *
 * @param outDir        the output folder
 * @param replaced      true when a new edition was swapped in; false when nothing changed and the
 *                      previous edition was left exactly as it was
 * @param mapsDrawn     ids of the maps whose pictures were drawn
 * @param mapsReused    ids of the maps whose pictures were reused because their inputs were unchanged
 * @param filesWritten  files written new
 * @param filesKept     files carried over unchanged from the previous edition (same bytes and mtime)
 * @param filesRemoved  files of the previous edition that the new one no longer has
 * @param changedMaps   maps listed on the changes page (added, removed or changed); -1 when the report was
 *                      carried over unchanged from the previous edition
 * @param elapsed       wall time of the publish, for the terminal only
 * @param userFilesKept files, links and empty folders in the output that aequa did not write, carried over
 *                      unchanged into the new edition ({@link UserFiles}); 0 when nothing was replaced
 */
public record PublishResult(Path outDir, boolean replaced, List<String> mapsDrawn, List<String> mapsReused,
                            int filesWritten, int filesKept, int filesRemoved, int changedMaps, Duration elapsed,
                            int userFilesKept) {

    public PublishResult {
        mapsDrawn = List.copyOf(mapsDrawn);
        mapsReused = List.copyOf(mapsReused);
    }

    /** A few lines for the terminal. */
    public String summary() {
        int maps = mapsDrawn.size() + mapsReused.size();
        String took = String.format(Locale.ROOT, "%.2f s", elapsed.toNanos() / 1e9);
        if (!replaced) {
            return String.format(Locale.ROOT, "Nothing changed: %s was left as it was (%d %s checked in %s).",
                    outDir, maps, maps == 1 ? "map" : "maps", took);
        }
        StringBuilder text = new StringBuilder(String.format(Locale.ROOT,
                "Published %d %s to %s (%d drawn, %d unchanged): %d files written, %d kept, %d removed, in %s.",
                maps, maps == 1 ? "map" : "maps", outDir, mapsDrawn.size(), mapsReused.size(), filesWritten,
                filesKept, filesRemoved, took));
        if (userFilesKept > 0) {
            text.append(String.format(Locale.ROOT, "%n%d %s that aequa did not write carried over unchanged.",
                    userFilesKept, userFilesKept == 1 ? "file" : "files"));
        }
        if (changedMaps > 0) {
            text.append(String.format(Locale.ROOT, "%n%d %s changed since the previous edition: see changes.html.",
                    changedMaps, changedMaps == 1 ? "map" : "maps"));
        }
        return text.toString();
    }
}
