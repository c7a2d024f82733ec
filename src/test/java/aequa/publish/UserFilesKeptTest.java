package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.Atlas;

/**
 * Publish deletes or replaces only what its manifest says it wrote: a user's files, links, empty folders and
 * a whole {@code .git} folder in the output survive a changed edition, or the publish refuses untouched.
 */
class UserFilesKeptTest {

    @TempDir
    Path tmp;

    private Atlas atlas(double shift, String... mapIds) {
        SiteFixtures.Texts texts = SiteFixtures.Texts.plain();
        return SiteFixtures.atlas(tmp.resolve("project"), texts,
                List.of(mapIds).stream().map(id -> SiteFixtures.map(id, texts, 12, shift)).toList());
    }

    /** What a user adds to a published site: a domain file, notes, a git repository with one commit's objects. */
    private static void addUserFiles(Path out) throws IOException {
        Files.writeString(out.resolve("CNAME"), "maps.example.org\n");
        Files.writeString(out.resolve("keep.txt"), "my notes");
        Files.writeString(out.resolve("maps/map-a/annotations.txt"), "inside a folder aequa writes");
        Path git = out.resolve(".git");
        Files.createDirectories(git.resolve("objects/3b"));
        Files.createDirectories(git.resolve("refs/heads"));
        Files.createDirectories(git.resolve("refs/tags")); // empty, as git leaves it
        Files.writeString(git.resolve("HEAD"), "ref: refs/heads/main\n");
        Files.writeString(git.resolve("refs/heads/main"), "3b18e512dba79e4c8300dd08aeb37f8e728b8dad\n");
        Files.write(git.resolve("objects/3b/18e512dba79e4c8300dd08aeb37f8e728b8dad"), new byte[] {120, 1, 75, -54});
        Files.createSymbolicLink(out.resolve("latest"), Path.of("maps/map-a/index.html"));
    }

    @Test
    void aChangedEditionCarriesOverEveryFileAequaDidNotWrite() throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(atlas(0, "map-a", "map-b"), new FakeArtwork(), out, PublishOptions.defaults());
        addUserFiles(out);
        Map<String, byte[]> before = PublishTestSupport.files(out);

        PublishResult result = SitePublisher.publish(atlas(9, "map-a", "map-b"), new FakeArtwork(), out,
                PublishOptions.defaults());

        assertTrue(result.replaced());
        Map<String, byte[]> after = PublishTestSupport.files(out);
        for (String path : List.of("CNAME", "keep.txt", "maps/map-a/annotations.txt", ".git/HEAD",
                ".git/refs/heads/main", ".git/objects/3b/18e512dba79e4c8300dd08aeb37f8e728b8dad")) {
            assertArrayEquals(before.get(path), after.get(path), path);
        }
        assertTrue(Files.isDirectory(out.resolve(".git/refs/tags")), "empty folder kept");
        assertTrue(Files.isSymbolicLink(out.resolve("latest")), "link kept as a link");
        assertEquals(Path.of("maps/map-a/index.html"), Files.readSymbolicLink(out.resolve("latest")));
        // 7 files and links and 1 empty folder; nothing of aequa's was dropped
        assertEquals(8, result.userFilesKept());
        assertEquals(0, result.filesRemoved());
        assertTrue(result.summary().contains("8 files that aequa did not write carried over"), result.summary());
    }

    @Test
    void theRemovedCountIsExactlyTheFilesOfADroppedMap() throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(atlas(0, "map-a", "map-b"), new FakeArtwork(), out, PublishOptions.defaults());
        addUserFiles(out);
        long mapBFiles;
        try (var walk = Files.walk(out.resolve("maps/map-b"))) {
            mapBFiles = walk.filter(Files::isRegularFile).count();
        }

        PublishResult result = SitePublisher.publish(atlas(0, "map-a"), new FakeArtwork(), out, PublishOptions.defaults());

        assertEquals(mapBFiles, result.filesRemoved());
        assertTrue(Files.notExists(out.resolve("maps/map-b")));
        assertEquals("my notes", Files.readString(out.resolve("keep.txt")));
        assertTrue(Files.isRegularFile(out.resolve(".git/objects/3b/18e512dba79e4c8300dd08aeb37f8e728b8dad")));
    }

    @Test
    void aUserFileWhereTheNewEditionWritesIsRefusedWithItsNameAndNothingIsTouched() throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(atlas(0, "map-a"), new FakeArtwork(), out, PublishOptions.defaults());
        addUserFiles(out);
        Files.createDirectories(out.resolve("maps/map-c"));
        Files.writeString(out.resolve("maps/map-c/index.html"), "<p>my own page</p>", StandardCharsets.UTF_8);
        Map<String, byte[]> before = PublishTestSupport.files(out);

        PublishRefusedException refused = assertThrows(PublishRefusedException.class,
                () -> SitePublisher.publish(atlas(0, "map-a", "map-c"), new FakeArtwork(), out, PublishOptions.defaults()));

        assertTrue(refused.getMessage().contains("maps/map-c/index.html"), refused.getMessage());
        Map<String, byte[]> after = PublishTestSupport.files(out);
        assertEquals(before.keySet(), after.keySet());
        before.forEach((path, bytes) -> assertArrayEquals(bytes, after.get(path), path));
    }
}
