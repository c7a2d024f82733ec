package aequa.publish;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.net.URI;
import java.nio.charset.StandardCharsets;

/**
 * Sends a request line exactly as written, which an HTTP client library would normalise first (it resolves
 * {@code ..} and may re-encode): what a hostile client can send (RFC 9112, section 3: request-line).
 */
final class RawHttp {

    private RawHttp() {
    }

    /** The status code the server at {@code base} answers to {@code GET rawTarget}. */
    static int status(URI base, String rawTarget) throws IOException {
        try (Socket socket = new Socket(base.getHost(), base.getPort())) {
            socket.setSoTimeout(20_000);
            OutputStream out = socket.getOutputStream();
            out.write(("GET " + rawTarget + " HTTP/1.1\r\nHost: " + base.getHost() + "\r\nConnection: close\r\n\r\n")
                    .getBytes(StandardCharsets.US_ASCII));
            out.flush();
            InputStream in = socket.getInputStream();
            StringBuilder statusLine = new StringBuilder();
            for (int b = in.read(); b != -1 && b != '\n'; b = in.read()) {
                statusLine.append((char) b);
            }
            String[] parts = statusLine.toString().split(" ");
            if (parts.length < 2 || !parts[0].startsWith("HTTP/")) {
                throw new IOException("not an HTTP status line: " + statusLine);
            }
            return Integer.parseInt(parts[1]);
        }
    }
}
