package aequa.publish;

import java.io.IOException;
import java.nio.file.Path;

/** Another publish holds the lock on the same output folder. */
public final class SiteLockedException extends IOException {

    private static final long serialVersionUID = 1L;

    private final Path lockFile;

    SiteLockedException(Path outDir, Path lockFile, String waited) {
        super("Another aequa publish is writing " + outDir + " (lock " + lockFile + ")" + waited
                + ". Let it finish, or run again with --wait SECONDS to wait for it.");
        this.lockFile = lockFile;
    }

    public Path lockFile() {
        return lockFile;
    }
}
