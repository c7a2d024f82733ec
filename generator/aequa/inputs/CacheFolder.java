package aequa.inputs;

import java.nio.file.Path;

/**
 * The project's cache folder, {@value #NAME}: results aequa can make again from the inputs (the geometry
 * stage of each source, the record of the last publish), kept to make the next run faster. It is safe to
 * delete at any time and belongs in {@code .gitignore}. Nothing in it is trusted without a check: every
 * file carries its format version and a checksum, and one that fails either is ignored and made again.
 * A cache that cannot be written (a read-only project) only costs speed. {@link CacheFile} reads and writes
 * the files.
 */
public final class CacheFolder {

    /** The folder's name inside the project. */
    public static final String NAME = ".aequa-cache";

    private CacheFolder() {
    }

    /** The cache folder of the project in {@code projectDir} (it may not exist yet). */
    public static Path of(Path projectDir) {
        return projectDir.resolve(NAME);
    }
}
