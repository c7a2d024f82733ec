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
 *     {@link SiteLockedException}. The output's real path (links resolved) names the lock and is where the
 *     site is built, so an output that is a link stays a link.</li>
 * <li><b>Contained</b>: every file is written inside the output folder; file names come from file-safe ids.
 *     A non-empty folder that aequa did not write is refused ({@link PublishRefusedException}).</li>
 * <li><b>Keeps the user's files</b>: publish replaces or deletes only files listed in the previous
 *     edition's manifest; every other file, link and folder in the output is carried over unchanged
 *     ({@link UserFiles}), or, when one stands where the new edition writes, the publish is refused before
 *     anything is touched. Beside the output, only its lock file and the staging and retired folders
 *     marked with a run's id are ever written, moved or deleted ({@link StagingFolder}).</li>
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
        try (SiteLock lock = SiteLock.acquire(outDir, options.lockWait())) {
            return new SiteBuild(atlas, findings, artwork, lock, options).run(startNanos);
        }
    }

    /**
     * Publishes {@code atlas} into the output folder of {@code heldLock}, which the caller took (before its
     * load step, so a busy output is reported at once) and closes afterwards; {@link PublishOptions#lockWait()}
     * is not used.
     */
    public static PublishResult publish(Atlas atlas, List<Finding> findings, MapArtwork artwork, SiteLock heldLock,
                                        PublishOptions options) throws IOException {
        return new SiteBuild(atlas, findings, artwork, heldLock, options).run(System.nanoTime());
    }
}
