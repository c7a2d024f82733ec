package aequa.project;

import java.util.List;

import com.fasterxml.jackson.annotation.JsonCreator;

/**
 * How a map's detached parts are drawn (the {@code insets} setting of a map or a region source): {@code auto}
 * (the default: parts far from the main mass are found and drawn in frames, each on its own projection),
 * {@code off} (one projection for everything), or a list of the parts to frame.
 *
 * @param word  {@code auto} or {@code off} when the setting is a word (any other word is reported by the
 *              project checks); empty when it is a list
 * @param parts the listed parts, empty unless the setting is a list
 */
public record InsetsSpec(String word, List<InsetPartSpec> parts) {

    public static final InsetsSpec AUTO = new InsetsSpec("auto", List.of());

    public InsetsSpec {
        word = word == null ? "" : word;
        parts = parts == null ? List.of() : List.copyOf(parts);
    }

    /** The setting written as a word: {@code insets: off}. */
    @JsonCreator
    public static InsetsSpec valueOf(String word) {
        return new InsetsSpec(word, List.of());
    }

    /** The setting written as a list of parts. */
    @JsonCreator(mode = JsonCreator.Mode.DELEGATING)
    public static InsetsSpec listed(List<InsetPartSpec> parts) {
        return new InsetsSpec("", parts);
    }

    public boolean off() {
        return word.equals("off");
    }

    public boolean listed() {
        return word.isEmpty();
    }

    /**
     * One listed part: the regions given by key, or whose representative point lies in a lon/lat box, or both.
     *
     * @param name    the name on the part's frame; empty to name it after its largest region
     * @param regions region keys
     * @param box     {@code [west, south, east, north]} in degrees; west greater than east crosses 180 deg
     * @param scale   the part's area scale relative to the main map (1, the default, keeps areas comparable)
     * @param corner  where the part should go: {@code top-left}, {@code top-right}, {@code bottom-left},
     *                {@code bottom-right}, or empty to let the layout choose
     */
    public record InsetPartSpec(String name, List<String> regions, List<Double> box, Double scale, String corner) {

        public InsetPartSpec {
            name = name == null ? "" : name;
            regions = regions == null ? List.of() : List.copyOf(regions);
            box = box == null ? List.of() : List.copyOf(box);
            scale = scale == null ? 1.0 : scale;
            corner = corner == null ? "" : corner;
        }
    }
}
