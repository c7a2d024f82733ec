package aequa.publish;

import java.io.IOException;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Duration;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;

import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;

/**
 * A local preview of a published site: serves the output folder on 127.0.0.1 only, polls the project folder
 * and calls a rebuild when anything in it changes, and makes open pages reload after a successful rebuild.
 *
 * <p>Reloading: HTML responses (and only those of this server, never the files on disk) get a small script
 * that polls {@value #VERSION_PATH} and reloads the page when the number there changes. The number counts
 * successful rebuilds. A failed rebuild leaves the previous site in place (the publisher is atomic) and
 * reports through the log sink.
 *
 * <p>Containment: a request is answered only with a regular file inside the output folder, after symbolic
 * links are resolved; a path with {@code ..} (also percent-encoded), an absolute path, a backslash or a link
 * that leads outside gets a 404, as does anything missing.
 *
 * <p>Editions: the publisher builds each edition beside the output and swaps it in by renaming
 * ({@code StagingFolder}), so the folder served never holds a half-built edition. A file is answered whole
 * from the one edition it was opened in (an open file survives its edition's retirement); a request that
 * falls between the two renames of a swap, or whose edition was swapped out during its lookup, looks again
 * in the new edition instead of answering 404 (the folder's identity, its file key, tells the two apart on
 * systems that have one).
 *
 * <p>A thin outer layer: what to rebuild is the callback's business (the CLI passes "load the atlas, then
 * publish"); this class only notices changes, serves files and counts editions.
 */
public final class PreviewServer implements AutoCloseable {

    static final String VERSION_PATH = "/__aequa/version";
    static final String RELOAD_SCRIPT_PATH = "/__aequa/reload.js";

    private static final String RELOAD_SCRIPT = """
            (function () {
              var seen = null;
              function check() {
                fetch("%s", {cache: "no-store"}).then(function (r) { return r.text(); }).then(function (v) {
                  if (seen !== null && v !== seen) { location.reload(); }
                  seen = v;
                }).catch(function () {}).finally(function () { setTimeout(check, 1000); });
              }
              check();
            })();
            """.formatted(VERSION_PATH);

    private static final Map<String, String> TYPES = Map.of(
            "html", "text/html; charset=utf-8", "css", "text/css; charset=utf-8",
            "js", "text/javascript; charset=utf-8", "json", "application/json",
            "svg", "image/svg+xml", "png", "image/png", "csv", "text/csv; charset=utf-8", "pdf", "application/pdf");

    /**
     * The longest a request waits for an edition to be swapped in: the swap is two renames, so the output is
     * missing for microseconds; this bound only matters if a publish is killed between them.
     */
    private static final long SWAP_WAIT_NANOS = Duration.ofSeconds(5).toNanos();
    private static final long SWAP_POLL_MILLIS = 2;

    /** The work to redo when the project changes; its exceptions are reported, not thrown. */
    @FunctionalInterface
    public interface Rebuild {
        void run() throws Exception;
    }

    private final Path siteDir;
    private final HttpServer server;
    private final ScheduledExecutorService watcher;
    private final AtomicLong version = new AtomicLong();

    private PreviewServer(Path siteDir, HttpServer server, ScheduledExecutorService watcher) {
        this.siteDir = siteDir;
        this.server = server;
        this.watcher = watcher;
    }

    /**
     * Starts serving {@code siteDir} and watching {@code projectDir}.
     *
     * @param port         the port on 127.0.0.1, or 0 for any free port (see {@link #address()})
     * @param pollInterval how often the project folder is checked for changes
     * @param log          receives one line per rebuild (done or failed)
     */
    public static PreviewServer start(Path siteDir, Path projectDir, Rebuild rebuild, int port, Duration pollInterval,
                                      Consumer<String> log) throws IOException {
        Path site = siteDir.toAbsolutePath().normalize();
        HttpServer http = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), port), 0);
        ScheduledExecutorService watch = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "aequa-preview-watch");
            t.setDaemon(true);
            return t;
        });
        PreviewServer preview = new PreviewServer(site, http, watch);
        http.createContext("/", preview::serve);
        http.setExecutor(Executors.newFixedThreadPool(2, r -> {
            Thread t = new Thread(r, "aequa-preview-http");
            t.setDaemon(true);
            return t;
        }));
        ProjectSnapshot initial = ProjectSnapshot.of(projectDir, site);
        ProjectSnapshot[] last = {initial};
        watch.scheduleWithFixedDelay(() -> {
            ProjectSnapshot now = ProjectSnapshot.of(projectDir, site);
            if (now.equals(last[0])) {
                return;
            }
            last[0] = now;
            try {
                rebuild.run();
                log.accept("rebuilt edition " + preview.version.incrementAndGet());
            } catch (Exception e) {
                log.accept("rebuild failed, still showing the previous edition: " + e.getMessage());
            }
        }, pollInterval.toMillis(), pollInterval.toMillis(), TimeUnit.MILLISECONDS);
        http.start();
        return preview;
    }

    /** The address to open, for example {@code http://127.0.0.1:8123/}. */
    public URI address() {
        return URI.create("http://127.0.0.1:" + server.getAddress().getPort() + "/");
    }

    /** How many rebuilds succeeded since the start. */
    public long version() {
        return version.get();
    }

    @Override
    public void close() {
        watcher.shutdownNow();
        server.stop(0);
    }

    private void serve(HttpExchange exchange) throws IOException {
        try (exchange) {
            String method = exchange.getRequestMethod();
            if (!method.equals("GET") && !method.equals("HEAD")) {
                send(exchange, 405, "text/plain; charset=utf-8", "only GET and HEAD".getBytes(StandardCharsets.UTF_8));
                return;
            }
            String path = exchange.getRequestURI().getPath();
            if (path.equals(VERSION_PATH)) {
                send(exchange, 200, "text/plain; charset=utf-8", Long.toString(version.get()).getBytes(StandardCharsets.UTF_8));
                return;
            }
            if (path.equals(RELOAD_SCRIPT_PATH)) {
                send(exchange, 200, TYPES.get("js"), RELOAD_SCRIPT.getBytes(StandardCharsets.UTF_8));
                return;
            }
            Path file = resolve(path);
            byte[] body = file == null ? null : readThroughSwaps(file);
            if (body == null) {
                send(exchange, 404, "text/plain; charset=utf-8", "not found".getBytes(StandardCharsets.UTF_8));
                return;
            }
            String name = file.getFileName().toString();
            String extension = name.substring(name.lastIndexOf('.') + 1).toLowerCase(Locale.ROOT);
            if (extension.equals("html")) {
                body = withReloadScript(body);
            }
            send(exchange, 200, TYPES.getOrDefault(extension, "application/octet-stream"), body);
        }
    }

    /** The file for a request path, or null when it would leave the site folder. */
    private Path resolve(String requestPath) {
        String relative = requestPath.startsWith("/") ? requestPath.substring(1) : requestPath;
        if (relative.isEmpty() || relative.endsWith("/")) {
            relative += "index.html";
        }
        try {
            return SafePaths.inside(siteDir, relative);
        } catch (IllegalArgumentException outside) { // also InvalidPathException
            return null;
        }
    }

    /** The bytes of {@code file} from one whole edition, or null when no edition has it inside the site folder. */
    private byte[] readThroughSwaps(Path file) throws IOException {
        long deadline = System.nanoTime() + SWAP_WAIT_NANOS;
        while (System.nanoTime() < deadline) {
            Optional<Object> edition = editionKey();
            if (edition.isEmpty()) {
                if (!pause()) {
                    return null;
                }
                continue; // between the two renames of a swap
            }
            try {
                if (isContained(file)) {
                    return Files.readAllBytes(file);
                }
            } catch (NoSuchFileException swappedOut) {
                // its edition was retired between the lookup and the read
            }
            if (edition.equals(editionKey())) {
                return null; // the same edition throughout: the file is not there
            }
        }
        return null;
    }

    /** Whether {@code file} is a regular file whose real path, links resolved, lies inside the site folder's. */
    private boolean isContained(Path file) throws IOException {
        return Files.isRegularFile(file) && file.toRealPath().startsWith(siteDir.toRealPath());
    }

    /** The identity of the edition now in place (its folder's file key), empty while none is. */
    private Optional<Object> editionKey() {
        try {
            Object key = Files.readAttributes(siteDir, BasicFileAttributes.class).fileKey();
            return Optional.of(key == null ? siteDir : key);
        } catch (IOException missing) {
            return Optional.empty();
        }
    }

    private static boolean pause() {
        try {
            Thread.sleep(SWAP_POLL_MILLIS);
            return true;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    static byte[] withReloadScript(byte[] html) {
        String page = new String(html, StandardCharsets.UTF_8);
        String tag = "<script src=\"" + RELOAD_SCRIPT_PATH + "\"></script>";
        int end = page.lastIndexOf("</body>");
        String out = end < 0 ? page + tag : page.substring(0, end) + tag + page.substring(end);
        return out.getBytes(StandardCharsets.UTF_8);
    }

    private static void send(HttpExchange exchange, int status, String type, byte[] body) throws IOException {
        exchange.getResponseHeaders().set("Content-Type", type);
        exchange.getResponseHeaders().set("Cache-Control", "no-store");
        exchange.getResponseHeaders().set("X-Content-Type-Options", "nosniff");
        boolean head = exchange.getRequestMethod().equals("HEAD");
        exchange.sendResponseHeaders(status, head ? -1 : body.length);
        if (!head) {
            try (OutputStream out = exchange.getResponseBody()) {
                out.write(body);
            }
        }
    }
}
