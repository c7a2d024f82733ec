package aequa.publish;

/**
 * A file made by a publish, not yet written: its path relative to the output root, its bytes, and the
 * SHA-256 of those bytes (the manifest's record of them), computed by the thread that made the file.
 */
record MadeFile(String path, byte[] bytes, String sha256) {

    static MadeFile of(String path, byte[] bytes) {
        return new MadeFile(path, bytes, Sha256.of(bytes));
    }

    static MadeFile of(String path, String text) {
        return of(path, text.getBytes(java.nio.charset.StandardCharsets.UTF_8));
    }
}
