package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The preview server: loopback only, contained in the site folder, rebuilds on change, bumps the version. */
class PreviewServerTest {

    @TempDir
    Path tmp;

    private final HttpClient http = HttpClient.newHttpClient();

    private HttpResponse<String> get(URI base, String path) throws Exception {
        return http.send(HttpRequest.newBuilder(base.resolve(path)).build(), HttpResponse.BodyHandlers.ofString());
    }

    @Test
    void servesTheSiteWithTheReloadHookAndRebuildsOnChange() throws Exception {
        Path project = Files.createDirectories(tmp.resolve("project"));
        Files.writeString(project.resolve("aequa.yaml"), "site: {}\n");
        Path site = Files.createDirectories(tmp.resolve("site"));
        Files.writeString(site.resolve("index.html"), "<!DOCTYPE html><html><body><p>hello</p></body></html>");
        Files.writeString(tmp.resolve("secret.txt"), "outside");
        AtomicInteger rebuilds = new AtomicInteger();
        List<String> log = Collections.synchronizedList(new ArrayList<>());
        try (PreviewServer preview = PreviewServer.start(site, project, rebuilds::incrementAndGet, 0,
                Duration.ofMillis(100), log::add)) {
            URI base = preview.address();
            assertEquals("127.0.0.1", base.getHost());
            HttpResponse<String> index = get(base, "/");
            assertEquals(200, index.statusCode());
            assertTrue(index.body().contains("<p>hello</p><script src=\"/__aequa/reload.js\"></script></body>"));
            assertTrue(Files.readString(site.resolve("index.html")).indexOf("reload.js") < 0, "disk file untouched");
            assertEquals(200, get(base, "/__aequa/reload.js").statusCode());
            assertEquals("0", get(base, "/__aequa/version").body());
            assertEquals(404, get(base, "/../secret.txt").statusCode());
            assertEquals(404, get(base, "/%2e%2e/secret.txt").statusCode());
            assertEquals(404, get(base, "/missing.html").statusCode());

            Files.writeString(project.resolve("aequa.yaml"), "site: {title: Changed}\n");
            long deadline = System.nanoTime() + Duration.ofSeconds(10).toNanos();
            while (preview.version() == 0 && System.nanoTime() < deadline) {
                Thread.sleep(50);
            }
            assertEquals(1, rebuilds.get());
            assertEquals("1", get(base, "/__aequa/version").body());
            assertEquals(List.of("rebuilt edition 1"), log);
        }
    }

    /**
     * Only files inside the site folder, after links are resolved: traversal written plainly, percent-encoded
     * (RFC 3986, section 2.1) or as an absolute path, and symbolic links leading out, are all refused alike.
     */
    @Test
    void servesOnlyFilesInsideTheSiteFolder() throws Exception {
        Path project = Files.createDirectories(tmp.resolve("project"));
        Path site = Files.createDirectories(tmp.resolve("site"));
        Path outside = Files.createDirectories(tmp.resolve("outside"));
        Files.writeString(outside.resolve("secret.txt"), "outside");
        Files.write(site.resolve("map.pdf"), "%PDF-1.4\n%%EOF".getBytes(StandardCharsets.US_ASCII));
        Files.createDirectories(site.resolve("maps"));
        Files.writeString(site.resolve("maps").resolve("page.html"), "<p>inside</p>");
        Files.createSymbolicLink(site.resolve("leak.txt"), outside.resolve("secret.txt"));
        Files.createSymbolicLink(site.resolve("leak-dir"), outside);
        Files.createSymbolicLink(site.resolve("alias.html"), site.resolve("maps").resolve("page.html"));
        try (PreviewServer preview = PreviewServer.start(site, project, () -> { }, 0, Duration.ofMillis(100), line -> { })) {
            URI base = preview.address();
            HttpResponse<String> pdf = get(base, "/map.pdf");
            assertEquals(200, pdf.statusCode());
            assertEquals("application/pdf", pdf.headers().firstValue("Content-Type").orElse(""), "RFC 8118: application/pdf");
            assertEquals(200, RawHttp.status(base, "/maps/page.html"));
            assertEquals(200, RawHttp.status(base, "/maps/../maps/page.html"), "a '..' that stays inside is harmless");
            assertEquals(200, get(base, "/alias.html").statusCode(), "a link that stays inside is served");
            for (String target : List.of("/../outside/secret.txt", "/%2e%2e/outside/secret.txt", "/%2E%2E%2Foutside%2Fsecret.txt",
                    "/maps/..%2f..%2foutside/secret.txt", "/..\\outside\\secret.txt", "/%00", "/leak.txt", "/leak-dir/secret.txt",
                    "//" + outside.resolve("secret.txt").toString().substring(1), "/" + outside.resolve("secret.txt"))) {
                int status = RawHttp.status(base, target);
                assertTrue(status == 400 || status == 404, target + " refused, not " + status);
            }
        }
    }

    @Test
    void aFailedRebuildKeepsTheVersionAndSaysWhy() throws Exception {
        Path project = Files.createDirectories(tmp.resolve("project"));
        Path site = Files.createDirectories(tmp.resolve("site"));
        List<String> log = Collections.synchronizedList(new ArrayList<>());
        try (PreviewServer preview = PreviewServer.start(site, project, () -> {
            throw new IllegalStateException("bad figures");
        }, 0, Duration.ofMillis(100), log::add)) {
            Files.writeString(project.resolve("figures.csv"), "key,value\n");
            long deadline = System.nanoTime() + Duration.ofSeconds(10).toNanos();
            while (log.isEmpty() && System.nanoTime() < deadline) {
                Thread.sleep(50);
            }
            assertEquals(0, preview.version());
            assertTrue(log.get(0).contains("bad figures"), log.toString());
        }
    }
}
