package aequa.publish;

import java.io.IOException;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import com.sun.net.httpserver.HttpServer;

/**
 * Serves test folders over HTTP from the loopback interface, each under its own path prefix; nothing outside a
 * folder is served. One server reached as {@code 127.0.0.1} and as {@code localhost} gives two origins
 * (RFC 6454: scheme, host and port), as a map framed in a newsroom's article has.
 */
final class LoopbackFileServer implements AutoCloseable {

    private final HttpServer server;

    private LoopbackFileServer(HttpServer server) {
        this.server = server;
    }

    /** Starts serving each folder of {@code rootsByPrefix} (prefixes such as {@code /site/}) on a free port. */
    static LoopbackFileServer start(Map<String, Path> rootsByPrefix) throws IOException {
        HttpServer server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), 0), 0);
        rootsByPrefix.forEach((prefix, root) -> serve(server, prefix, root));
        server.start();
        return new LoopbackFileServer(server);
    }

    /** The address of {@code prefix} on this server through {@code host} (127.0.0.1 or localhost). */
    String address(String host, String prefix) {
        return "http://" + host + ":" + server.getAddress().getPort() + prefix;
    }

    @Override
    public void close() {
        server.stop(0);
    }

    private static void serve(HttpServer server, String prefix, Path root) {
        server.createContext(prefix, exchange -> {
            Path file = root.resolve(exchange.getRequestURI().getPath().substring(prefix.length())).normalize();
            boolean ok = file.startsWith(root) && Files.isRegularFile(file);
            byte[] bytes = ok ? Files.readAllBytes(file) : new byte[0];
            String name = file.getFileName() == null ? "" : file.getFileName().toString();
            String type = name.endsWith(".html") ? "text/html; charset=utf-8" : name.endsWith(".js") ? "text/javascript"
                    : name.endsWith(".css") ? "text/css" : name.endsWith(".svg") ? "image/svg+xml"
                    : name.endsWith(".png") ? "image/png" : "application/octet-stream";
            exchange.getResponseHeaders().set("Content-Type", type);
            exchange.sendResponseHeaders(ok ? 200 : 404, ok ? bytes.length : -1);
            try (OutputStream out = exchange.getResponseBody()) {
                out.write(bytes);
            }
        });
    }
}
