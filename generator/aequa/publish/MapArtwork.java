package aequa.publish;

import aequa.atlas.MapModel;
import aequa.wording.Wording;

/**
 * What publishing needs from the drawing stage: the pictures of one map. The publisher asks for them only
 * when the map's inputs changed since the last publish (see {@link #fingerprint()}), so an implementation
 * may be slow.
 *
 * <p>Contract: {@link #webSvg} returns one {@code <svg>} element (UTF-8 text, no XML declaration, no
 * scripts) with a {@code viewBox}, role/aria labelling, a legend and a caption inside, and one element
 * with {@code id="r-KEY"} per drawn region. Every piece of user text in it must already be XML-escaped:
 * the page inserts it as trusted markup. Implementations must be deterministic (same model, same bytes)
 * and safe to call from several threads at once: a publish draws the formats of a map, and several maps,
 * at the same time.
 */
public interface MapArtwork {

    /** The map for the web page, inlined in the map's HTML page. */
    String webSvg(MapModel map);

    /** The print-ready SVG file, offered as a download. */
    byte[] printSvg(MapModel map);

    /** The same print layout as a one-page PDF, offered as a download. */
    byte[] pdf(MapModel map);

    /**
     * A PNG of the map laid out {@code widthPx} pixels wide and rendered at {@code scale} times that many
     * pixels (1 for the download and the index thumbnail, 2 for high-density screens and social previews).
     */
    byte[] png(MapModel map, int widthPx, int scale);

    /**
     * Both PNGs of a map, {@code [scale 1, scale 2]}, as {@link #png} gives them; an implementation may make
     * one from the other instead of painting the map twice.
     */
    default byte[][] pngs(MapModel map, int widthPx) {
        return new byte[][] {png(map, widthPx, 1), png(map, widthPx, 2)};
    }

    /**
     * The same artwork with every word and number in {@code wording}'s language. The default (for artwork
     * without words) is this artwork itself.
     */
    default MapArtwork inLanguage(Wording wording) {
        return this;
    }

    /**
     * Identifies the drawing code and theme. When it changes every map is redrawn; return, for example, the
     * aequa version plus a hash of the theme file. The default (empty) means "depends on the model only".
     */
    default String fingerprint() {
        return "";
    }
}
