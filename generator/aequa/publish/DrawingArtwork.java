package aequa.publish;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentSkipListMap;

import aequa.atlas.MapModel;
import aequa.drawing.DrawOptions;
import aequa.drawing.DrawnMap;
import aequa.drawing.MapDrawings;
import aequa.drawing.PrintPreflight;
import aequa.drawing.PrintSize;
import aequa.drawing.Theme;
import aequa.drawing.WebSize;
import aequa.findings.Finding;
import aequa.wording.Wording;

/**
 * The pictures of each map, drawn by the drawing stage in one theme. Every print drawing passes the print
 * preflight before it is handed over; what the preflight finds is kept for the terminal summary. Safe to
 * use from several threads at once.
 */
public final class DrawingArtwork implements MapArtwork {

    private final Theme theme;
    private final Theme printTheme;
    private final PrintSize printSize;
    private final String version;
    private final Wording wording;
    /**
     * What the print preflight found, by map id (maps are drawn in parallel; the order stays stable); shared
     * with the copies in other languages, the first drawing of a map giving its findings.
     */
    private final Map<String, List<Finding>> preflight;
    private volatile String fingerprint;

    /**
     * @param theme      the site's theme, for web maps and PNGs
     * @param printTheme the theme of the print SVGs
     * @param printSize  the physical size of the print SVGs
     * @param version    aequa's version, part of the fingerprint (with a hash of the drawing code) so a new
     *                   release or build redraws every map
     */
    public DrawingArtwork(Theme theme, Theme printTheme, PrintSize printSize, String version) {
        this(theme, printTheme, printSize, version, Wording.english(), new ConcurrentSkipListMap<>());
    }

    private DrawingArtwork(Theme theme, Theme printTheme, PrintSize printSize, String version, Wording wording,
                           Map<String, List<Finding>> preflight) {
        this.preflight = preflight;
        this.theme = theme;
        this.printTheme = printTheme;
        this.printSize = printSize;
        this.version = version;
        this.wording = wording;
    }

    /**
     * The same themes and sizes in another language. Its print preflight's findings join this artwork's
     * {@link #preflightFindings()}: a site's editions are drawn each by such a copy, the first language first,
     * and a map's findings are those of its first print drawing (its type, lines and colours are the same in
     * every language).
     */
    @Override
    public DrawingArtwork inLanguage(Wording other) {
        return new DrawingArtwork(theme, printTheme, printSize, version, other, preflight);
    }

    @Override
    public String webSvg(MapModel map) {
        return new String(MapDrawings.webSvg(map, theme, WebSize.STANDARD, DrawOptions.web().inLanguage(wording)).bytes(),
                StandardCharsets.UTF_8);
    }

    @Override
    public byte[] printSvg(MapModel map) {
        DrawnMap drawn = MapDrawings.printSvg(map, printTheme, printSize, DrawOptions.print().inLanguage(wording));
        preflight.putIfAbsent(map.id(), PrintPreflight.check(map, printTheme, drawn, "maps/" + map.id() + "/" + map.id() + ".svg"));
        return drawn.bytes();
    }

    @Override
    public byte[] pdf(MapModel map) {
        return MapDrawings.pdf(map, printTheme, printSize, DrawOptions.print().inLanguage(wording)).bytes();
    }

    @Override
    public byte[] png(MapModel map, int widthPx, int scale) {
        return MapDrawings.png(map, theme, widthPx, scale, DrawOptions.web().withTitle(true).inLanguage(wording)).bytes();
    }

    /** The 2x PNG, and the 1x made from it ({@link MapDrawings#pngPair}): the map is painted once for both. */
    @Override
    public byte[][] pngs(MapModel map, int widthPx) {
        List<DrawnMap> pair = MapDrawings.pngPair(map, theme, widthPx, DrawOptions.web().withTitle(true).inLanguage(wording));
        return new byte[][] {pair.get(0).bytes(), pair.get(1).bytes()};
    }

    @Override
    public String fingerprint() {
        if (fingerprint == null) {
            fingerprint = new Sha256().add(version).add(DrawingCode.fingerprint()).add(theme.toString())
                    .add(printTheme.toString()).add(printSize.toString()).add(wording.fingerprint()).hex();
        }
        return fingerprint;
    }

    /**
     * What the print preflight found in the drawings made so far (maps carried over are not redrawn), map
     * by map in the order of their ids.
     */
    public List<Finding> preflightFindings() {
        return preflight.values().stream().flatMap(List::stream).toList();
    }
}
