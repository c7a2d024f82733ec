package aequa.statistics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import aequa.findings.Excerpt;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;

/**
 * The longest region keys and names aequa works with. Longer ones are reported with a short excerpt
 * (never printed whole) and kept out of every later step, where a key is compared, hashed, written into
 * pages and repeated in findings: a region key of a million characters once took minutes and printed
 * itself whole.
 *
 * <p>The limits are our choice, far above real codes (ISO 3166-2 and NUTS codes have at most 6 characters,
 * census area codes about a dozen) and names (the longest official place names run to about 170 letters).
 */
public final class TextLengths {

    /** The longest region or statistics key, in characters. */
    public static final int MAX_KEY_CHARS = 100;
    /** The longest region name, in characters; a longer one is shortened. */
    public static final int MAX_NAME_CHARS = 200;

    private TextLengths() {
    }

    /** True when a statistics or region key is longer than {@value #MAX_KEY_CHARS} characters. */
    static boolean keyTooLong(String key) {
        return key.length() > MAX_KEY_CHARS;
    }

    /** The finding for a key that is too long, at {@code place} of {@code file}. */
    static Finding keyTooLongFinding(String code, String file, String place, String key, String consequence) {
        return Finding.error(code, file, place,
                String.format(Locale.ROOT, "The key \"%s\" is too long: keys may have at most %d characters. %s",
                        Excerpt.of(key), MAX_KEY_CHARS, consequence),
                "Check that the key column or property is the right one: a key is a short code.");
    }

    /**
     * The regions with keys of at most {@value #MAX_KEY_CHARS} characters, names shortened to
     * {@value #MAX_NAME_CHARS}; an error {@code region-key-too-long} for each region left out and a warning
     * {@code region-name-too-long} for each name shortened.
     */
    public static List<Region> withinLimits(List<Region> regions, String file, Findings findings) {
        List<Region> kept = new ArrayList<>(regions.size());
        for (int i = 0; i < regions.size(); i++) {
            Region region = regions.get(i);
            if (keyTooLong(region.key())) {
                findings.add(keyTooLongFinding("region-key-too-long", file, "feature " + (i + 1), region.key(),
                        "The region is left out."));
                continue;
            }
            if (region.name().length() > MAX_NAME_CHARS) {
                findings.add(Finding.warning("region-name-too-long", file, "feature \"" + region.key() + "\"",
                        String.format(Locale.ROOT, "The name \"%s\" is too long; it is shortened to %d characters.",
                                Excerpt.of(region.name()), MAX_NAME_CHARS),
                        "Check that the name property is the right one."));
                region = region.withName(shorten(region.name()));
            }
            kept.add(region);
        }
        return kept;
    }

    private static String shorten(String name) {
        int end = MAX_NAME_CHARS - 1;
        if (Character.isHighSurrogate(name.charAt(end - 1))) {
            end--;
        }
        return name.substring(0, end) + "\u2026";
    }
}
