package aequa.publish;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** SHA-256 (FIPS 180-4) over a sequence of parts, as lower-case hex; each part is length-prefixed. */
final class Sha256 {

    private final MessageDigest digest;

    Sha256() {
        try {
            digest = MessageDigest.getInstance("SHA-256"); // every Java SE platform must provide it
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("this Java has no SHA-256", e);
        }
    }

    /** Adds a part; the length prefix keeps ("ab", "c") and ("a", "bc") apart. */
    Sha256 add(byte[] part) {
        long length = part.length;
        for (int shift = 56; shift >= 0; shift -= 8) {
            digest.update((byte) (length >>> shift));
        }
        digest.update(part);
        return this;
    }

    Sha256 add(String part) {
        return add(part.getBytes(StandardCharsets.UTF_8));
    }

    String hex() {
        return HexFormat.of().formatHex(digest.digest());
    }

    static String of(byte[] bytes) {
        return HexFormat.of().formatHex(new Sha256().digest.digest(bytes));
    }
}
