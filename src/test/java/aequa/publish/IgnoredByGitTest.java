package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

import aequa.inputs.CacheFolder;

/**
 * What a publish leaves in a working copy of this repository is ignored by git, so it is never committed
 * by accident: the lock file beside the default output folder ({@code .site-out.lock} at the root) and the
 * demo project's cache folder. The repository's own {@code .gitignore} is read with git's rules for
 * patterns without a slash (gitignore(5), "PATTERN FORMAT": such a pattern matches a name at any depth,
 * {@code *} matches anything but a slash, {@code ?} one character, a trailing slash only a directory, a
 * leading {@code !} includes again what an earlier pattern excluded, the last matching pattern wins).
 */
class IgnoredByGitTest {

    private static final Path GITIGNORE = Path.of(".gitignore");

    @Test
    void theLockFileBesideTheDefaultOutputIsIgnored() throws IOException {
        String lockName = SiteLock.lockFileFor(Path.of("site-out").toAbsolutePath()).getFileName().toString();
        assertEquals(".site-out.lock", lockName);
        assertTrue(ignored(lockName, false), lockName + " must match a pattern of " + GITIGNORE);
        assertTrue(ignored(".my-site.lock", false), "the lock file beside any output folder");
        assertFalse(ignored("site.lock", false), "only the hidden lock files aequa writes, not every .lock file");
    }

    @Test
    void theProjectCacheFolderIsIgnored() throws IOException {
        assertTrue(ignored(CacheFolder.NAME, true), CacheFolder.NAME + " must match a pattern of " + GITIGNORE);
    }

    private static boolean ignored(String name, boolean directory) throws IOException {
        List<String> lines = Files.readAllLines(GITIGNORE);
        boolean ignored = false;
        for (String line : lines) {
            String pattern = line.strip();
            if (pattern.isEmpty() || pattern.startsWith("#")) {
                continue;
            }
            boolean include = pattern.startsWith("!");
            if (include) {
                pattern = pattern.substring(1);
            }
            boolean directoryOnly = pattern.endsWith("/");
            if (directoryOnly) {
                pattern = pattern.substring(0, pattern.length() - 1);
            }
            if (pattern.contains("/") || directoryOnly && !directory) {
                continue;
            }
            if (glob(pattern).matcher(name).matches()) {
                ignored = !include;
            }
        }
        return ignored;
    }

    private static Pattern glob(String pattern) {
        StringBuilder regex = new StringBuilder();
        for (char c : pattern.toCharArray()) {
            regex.append(switch (c) {
                case '*' -> "[^/]*";
                case '?' -> "[^/]";
                default -> Pattern.quote(String.valueOf(c));
            });
        }
        return Pattern.compile(regex.toString());
    }
}
