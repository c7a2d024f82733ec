package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The published folders and files get the modes any program's would under the user's umask (0755 and 0644
 * under the usual umask 022), the top folder included, so a web server running as another user can read
 * the site. The reference is a folder and a file made here the ordinary way, under the same umask.
 */
class OutputPermissionsTest {

    @TempDir
    Path tmp;

    @Test
    void theTopFolderSubfoldersAndFilesFollowTheUmask() throws IOException {
        assumeTrue(FileSystems.getDefault().supportedFileAttributeViews().contains("posix"), "POSIX modes only");
        String folderMode = mode(Files.createDirectory(tmp.resolve("reference-folder")));
        String fileMode = mode(Files.write(tmp.resolve("reference-file"), new byte[1]));
        Path out = tmp.resolve("site");
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), 1, 12),
                new FakeArtwork(), out, PublishOptions.defaults());
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), 2, 12),
                new FakeArtwork(), out, PublishOptions.defaults());

        assertEquals(folderMode, mode(out), "top folder");
        assertEquals(folderMode, mode(out.resolve("maps")), "subfolder");
        assertEquals(fileMode, mode(out.resolve("index.html")), "page");
        assertEquals(fileMode, mode(out.resolve("maps/map-b/map-b.png")), "picture");
    }

    private static String mode(Path path) throws IOException {
        return PosixFilePermissions.toString(Files.getPosixFilePermissions(path));
    }
}
