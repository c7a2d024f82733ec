package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.Atlas;

/**
 * The preview server under load while editions are swapped in underneath it: 8 clients on 127.0.0.1 send
 * 1,000 requests in all while a rebuild publishes edition after edition into the folder served. Every
 * request for a file that every edition has is answered 200 with the bytes of one whole published edition
 * (never a 404 from the moment of a swap, never a staging folder's file); requests that try to leave the
 * folder are refused throughout.
 */
class PreviewServerLoadTest {

    private static final int CLIENTS = 8;
    private static final int REQUESTS_PER_CLIENT = 125;

    @TempDir
    Path tmp;

    @Test
    @Timeout(value = 3, unit = TimeUnit.MINUTES)
    void thousandRequestsFromEightClientsDuringRebuildsGetWholeEditions() throws Exception {
        Path project = Files.createDirectories(tmp.resolve("project"));
        Path site = tmp.resolve("site");
        Files.writeString(tmp.resolve("secret.txt"), "outside the site");
        Atlas[] editions = {SiteFixtures.atlas(project, SiteFixtures.Texts.plain(), 2, 8),
                SiteFixtures.atlas(project, SiteFixtures.Texts.plain(), 2, 11)};
        Map<String, Set<String>> published = new ConcurrentHashMap<>(); // path -> SHA-256 of every edition's bytes
        publish(editions[0], site, published);

        AtomicBoolean clientsDone = new AtomicBoolean();
        CountDownLatch rebuilding = new CountDownLatch(1);
        AtomicInteger swapsDuringLoad = new AtomicInteger();
        PreviewServer.Rebuild rebuild = () -> {
            rebuilding.countDown();
            for (int n = 1; !clientsDone.get(); n++) {
                publish(editions[n % 2], site, published);
                swapsDuringLoad.incrementAndGet();
            }
        };
        List<String> paths = List.of("/", "/index.html", "/method.html", "/report.json", "/maps/map-a/index.html",
                "/maps/map-b/figures.html", "/maps/map-a/map-a.pdf", "/maps/map-b/map-b.png", "/maps/map-a/map-a.csv");
        List<String> outside = List.of("/../secret.txt", "/%2e%2e/secret.txt", "/%2E%2E%2Fsecret.txt",
                "/maps/..%2f..%2fsecret.txt", "//" + tmp.resolve("secret.txt").toString().substring(1));
        List<String> problems = new ArrayList<>();
        List<Map.Entry<String, byte[]>> answers = new ArrayList<>();
        long startNanos;
        long elapsedNanos;
        try (PreviewServer preview = PreviewServer.start(site, project, rebuild, 0, Duration.ofMillis(20), line -> { })) {
            URI base = preview.address();
            Files.writeString(project.resolve("figures.csv"), "changed\n"); // starts the rebuild
            assertTrue(rebuilding.await(30, TimeUnit.SECONDS), "the rebuild started");
            HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();
            ExecutorService pool = Executors.newFixedThreadPool(CLIENTS);
            try {
                List<Future<List<String>>> clients = new ArrayList<>();
                startNanos = System.nanoTime();
                for (int c = 0; c < CLIENTS; c++) {
                    int client = c;
                    clients.add(pool.submit(() -> {
                        List<String> seen = new ArrayList<>();
                        for (int r = 0; r < REQUESTS_PER_CLIENT; r++) {
                            if (r % 25 == 7) {
                                String path = outside.get((client + r) % outside.size());
                                int status = RawHttp.status(base, path);
                                if (status != 404) {
                                    seen.add(path + " -> " + status + ", expected 404");
                                }
                                continue;
                            }
                            String path = paths.get((client * 7 + r) % paths.size());
                            HttpResponse<byte[]> response = http.send(HttpRequest.newBuilder(base.resolve(path))
                                    .timeout(Duration.ofSeconds(20)).build(), HttpResponse.BodyHandlers.ofByteArray());
                            if (response.statusCode() != 200) {
                                seen.add(path + " -> " + response.statusCode());
                            } else {
                                synchronized (answers) {
                                    answers.add(Map.entry(path, response.body()));
                                }
                            }
                        }
                        return seen;
                    }));
                }
                for (Future<List<String>> client : clients) {
                    problems.addAll(client.get(2, TimeUnit.MINUTES));
                }
                elapsedNanos = System.nanoTime() - startNanos;
            } finally {
                clientsDone.set(true);
                pool.shutdownNow();
            }
            long deadline = System.nanoTime() + Duration.ofSeconds(30).toNanos();
            while (preview.version() == 0 && System.nanoTime() < deadline) {
                Thread.sleep(20);
            }
        }
        assertEquals(List.of(), problems, "every request answered as expected");
        assertEquals(CLIENTS * (REQUESTS_PER_CLIENT - REQUESTS_PER_CLIENT / 25), answers.size());
        assertTrue(swapsDuringLoad.get() >= 2, "editions were swapped in during the load: " + swapsDuringLoad.get());
        List<String> foreign = new ArrayList<>();
        for (Map.Entry<String, byte[]> answer : answers) {
            String file = answer.getKey().endsWith("/") ? answer.getKey().substring(1) + "index.html" : answer.getKey().substring(1);
            byte[] body = answer.getValue();
            if (file.endsWith(".html")) {
                body = withoutReloadScript(body);
            }
            if (!published.getOrDefault(file, Set.of()).contains(sha256(body))) {
                foreign.add(file);
            }
        }
        assertEquals(List.of(), foreign, "answers that are not a file of any published edition");
        System.out.printf("preview load: %d requests from %d clients in %.1f s during %d swaps%n",
                CLIENTS * REQUESTS_PER_CLIENT, CLIENTS, elapsedNanos / 1e9, swapsDuringLoad.get());
    }

    /** Publishes an edition and records the hash of each of its files once it is in place. */
    private static void publish(Atlas atlas, Path site, Map<String, Set<String>> published) throws IOException {
        SitePublisher.publish(atlas, new FakeArtwork(), site, PublishOptions.defaults().withLockWait(Duration.ofSeconds(30)));
        for (Map.Entry<String, byte[]> file : PublishTestSupport.files(site).entrySet()) {
            published.computeIfAbsent(file.getKey(), k -> ConcurrentHashMap.newKeySet()).add(sha256(file.getValue()));
        }
    }

    private static byte[] withoutReloadScript(byte[] page) {
        String tag = "<script src=\"" + PreviewServer.RELOAD_SCRIPT_PATH + "\"></script>";
        return new String(page, StandardCharsets.UTF_8).replace(tag, "").getBytes(StandardCharsets.UTF_8);
    }

    private static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
