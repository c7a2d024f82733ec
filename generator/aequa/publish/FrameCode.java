package aequa.publish;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The code a desk pastes into an article to show a map's embed page: an {@code <iframe>} as wide as its column,
 * with a fallback height for pages where scripts do not run, and the host script ({@code assets/embed-host.js})
 * that sets the frame's height to the embed page's content height as the page reflows. Links are relative to
 * the map's folder; the map page's copy script makes them full addresses.
 */
final class FrameCode {

    /** The column width the fallback height is estimated for: a common article column, in CSS pixels. */
    static final int TYPICAL_COLUMN_PX = 640;

    /**
     * Height of everything but the map in the embed page at {@link #TYPICAL_COLUMN_PX}, in CSS pixels: title
     * (about 30), caption, source and cautions (about eight lines of 21), links and margins (about 40). An
     * estimate that errs on the tall side: a frame a little too tall leaves a gap, one too short scrolls.
     */
    static final int TEXT_ALLOWANCE_PX = 250;

    /** Height per line of the colour key at that width, which holds about three classes a line. */
    static final int KEY_LINE_PX = 28;

    private static final Pattern VIEW_BOX = Pattern.compile("viewBox='0 0 ([0-9.]+) ([0-9.]+)'");

    private FrameCode() {
    }

    /**
     * @param title       the map's title, for the frame's accessible name
     * @param embedHref   the embed page, relative to the map's folder
     * @param hostHref    the host script, relative to the map's folder
     * @param fallbackPx  the frame's height when the host script does not run
     */
    static String of(String title, String embedHref, String hostHref, int fallbackPx) {
        return "<iframe src=\"" + attribute(embedHref) + "\" title=\"" + attribute(title) + "\" data-aequa-embed=\"\""
                + " height=\"" + fallbackPx + "\" style=\"display: block; width: 100%; border: 0;\" loading=\"lazy\"></iframe>\n"
                + "<script src=\"" + attribute(hostHref) + "\" async=\"async\"></script>";
    }

    /**
     * The embed page's height at {@link #TYPICAL_COLUMN_PX} estimated from the web SVG's proportions and the
     * number of key rows, rounded up to 10 px.
     */
    static int fallbackHeightPx(String webSvg, int keyRows) {
        Matcher box = VIEW_BOX.matcher(webSvg);
        double mapPx = box.find() ? TYPICAL_COLUMN_PX * Double.parseDouble(box.group(2)) / Double.parseDouble(box.group(1))
                : TYPICAL_COLUMN_PX * 0.75;
        double heightPx = mapPx + TEXT_ALLOWANCE_PX + KEY_LINE_PX * Math.ceil(keyRows / 3.0);
        return (int) (Math.ceil(heightPx / 10) * 10);
    }

    /** Escapes text for a double-quoted HTML attribute (HTML Living Standard, 13.1.2.3). */
    static String attribute(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (char ch : text.toCharArray()) {
            switch (ch) {
                case '&': out.append("&amp;"); break;
                case '"': out.append("&quot;"); break;
                case '<': out.append("&lt;"); break;
                case '>': out.append("&gt;"); break;
                default: out.append(ch);
            }
        }
        return out.toString();
    }
}
