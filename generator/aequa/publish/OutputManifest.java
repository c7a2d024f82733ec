package aequa.publish;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * The record of what a publish wrote, kept in the output folder as {@value #FILE_NAME}: for every output
 * file (path relative to the output root, '/'-separated) the SHA-256 of its inputs (model, settings,
 * templates, drawing fingerprint) and of its bytes. The next publish reuses a file when its inputs hash is
 * unchanged and the file on disk still has the recorded bytes.
 *
 * <p>The file holds no time stamps, so it is byte-identical for identical builds. A missing or unreadable
 * manifest is treated as empty (everything is rebuilt).
 */
final class OutputManifest {

    static final String FILE_NAME = ".aequa-manifest.json";
    private static final int FORMAT = 1;

    /**
     * @param inputs  SHA-256 of what the file was made from
     * @param content SHA-256 of the file's bytes
     */
    record Entry(String inputs, String content) {
    }

    private final Map<String, Entry> entries;

    OutputManifest(Map<String, Entry> entries) {
        this.entries = Collections.unmodifiableMap(new TreeMap<>(entries));
    }

    static OutputManifest empty() {
        return new OutputManifest(Map.of());
    }

    static OutputManifest read(Path outDir, ObjectMapper json) {
        Path file = outDir.resolve(FILE_NAME);
        if (!Files.isRegularFile(file)) {
            return empty();
        }
        try {
            JsonNode root = json.readTree(file.toFile());
            if (root == null || root.path("aequaManifest").asInt() != FORMAT) {
                return empty();
            }
            Map<String, Entry> entries = new TreeMap<>();
            root.path("files").fields().forEachRemaining(e -> entries.put(e.getKey(),
                    new Entry(e.getValue().path("inputs").asText(), e.getValue().path("sha256").asText())));
            return new OutputManifest(entries);
        } catch (IOException unreadable) {
            return empty(); // a damaged manifest only costs a full rebuild
        }
    }

    Map<String, Entry> entries() {
        return entries;
    }

    Optional<Entry> get(String path) {
        return Optional.ofNullable(entries.get(path));
    }

    byte[] toJson(ObjectMapper json) throws IOException {
        ObjectNode root = json.createObjectNode();
        root.put("aequaManifest", FORMAT);
        ObjectNode files = root.putObject("files");
        entries.forEach((path, entry) -> files.putObject(path).put("inputs", entry.inputs()).put("sha256", entry.content()));
        return json.writeValueAsBytes(root);
    }
}
