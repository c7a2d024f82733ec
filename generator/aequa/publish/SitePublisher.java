package aequa.publish;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import aequa.atlas.Atlas;
import aequa.findings.Finding;

/**
 * Step 2 of a build: writes the site of an {@link Atlas} into an output folder.
 *
 * <p>Guarantees:
 * <ul>
 * <li><b>Deterministic</b>: the same atlas, findings, templates, theme and drawing give byte-identical files,
 *     whatever the time zone, locale or file order; no clock is read for the output.</li>
 * <li><b>Incremental</b>: a map is drawn only when its model or the drawing fingerprint changed since the
 *     previous publish into the same folder (recorded in {@code .aequa-manifest.json}); unchanged files are
 *     carried over with their bytes and modification time; when nothing changed, the folder is not touched.</li>
 * <li><b>Atomic</b>: the new edition is built beside the output and swapped in at the end
 *     ({@link StagingFolder}); any exception, including one thrown by the {@link MapArtwork}, leaves the
 *     previous edition complete and untouched and removes the staging folder.</li>
 * <li><b>Exclusive</b>: a lock file beside the output ({@code .NAME.lock}) keeps two publishes of the same
 *     folder apart; the second waits up to {@link PublishOptions#lockWait()}, then fails with
 *     {@link SiteLockedException}.</li>
 * <li><b>Contained</b>: every file is written inside the output folder; file names come from file-safe ids.
 *     A non-empty folder that aequa did not write is refused ({@link PublishRefusedException}).</li>
 * </ul>
 */
public final class SitePublisher {

    private SitePublisher() {
    }

    /** Publishes with no findings in report.json. */
    public static PublishResult publish(Atlas atlas, MapArtwork artwork, Path outDir, PublishOptions options)
            throws IOException {
        return publish(atlas, List.of(), artwork, outDir, options);
    }

    /**
     * Publishes {@code atlas} into {@code outDir}.
     *
     * @param findings the findings of step 1 (join, area, projection), written to report.json in this order
     * @throws SiteLockedException      when another publish holds the output after waiting
     * @throws PublishRefusedException  when the output folder holds files aequa did not write, or a template
     *                                  switches HTML escaping off
     * @throws IOException              when writing fails; the previous edition is then untouched
     */
    public static PublishResult publish(Atlas atlas, List<Finding> findings, MapArtwork artwork, Path outDir,
                                        PublishOptions options) throws IOException {
        long startNanos = System.nanoTime();
        Path out = outDir.toAbsolutePath().normalize();
        try (SiteLock lock = SiteLock.acquire(out, options.lockWait())) {
            return new SiteBuild(atlas, findings, artwork, out, options).run(startNanos);
        }
    }
}
