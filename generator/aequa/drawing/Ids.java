package aequa.drawing;

import java.nio.charset.StandardCharsets;

/**
 * Element ids for SVG. JFreeSVG 5.0.7 writes ids without XML escaping (an id {@code bad'id} gives the malformed
 * {@code <g id='bad'id'>}, while other attribute values are escaped), so
 * every id passes through here. The mapping is injective, so two different keys never share an id and
 * an id stays the same from one build to the next.
 */
public final class Ids {

    private Ids() {
    }

    /**
     * {@code prefix + "-" + key}, where the key keeps ASCII letters, digits and {@code -}; every other byte of
     * its UTF-8 form (including {@code _} itself) becomes {@code _xx} in lower-case hex. Examples: key
     * {@code "FR 01"} gives {@code r-FR_2001}, key {@code "FR_01"} gives {@code r-FR_5f01}.
     */
    public static String of(String prefix, String key) {
        StringBuilder id = new StringBuilder(prefix.length() + key.length() + 1).append(prefix).append('-');
        for (byte b : key.getBytes(StandardCharsets.UTF_8)) {
            int c = b & 0xff;
            boolean safe = (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '-';
            if (safe) {
                id.append((char) c);
            } else {
                id.append('_').append(Character.forDigit(c >> 4, 16)).append(Character.forDigit(c & 0xf, 16));
            }
        }
        return id.toString();
    }
}
