package aequa.pages;

/**
 * What the map page offers a desk that wants the map inside its own article, and what the embed page and the
 * HTML fragment link to. Every link is relative to the map's folder ({@code maps/ID/}); the map page's copy
 * script turns them into full addresses from the address the page is read at.
 *
 * @param frameCode    the code to paste: an {@code <iframe>} of the embed page with its fallback height, and the
 *                     host script that keeps the frame's height equal to its content's
 * @param fragmentHref the HTML fragment's file, for systems that forbid frames
 * @param mapHref      the full map page
 * @param cautionsHref the cautions on the method page
 */
public record EmbedView(String frameCode, String fragmentHref, String mapHref, String cautionsHref) {
}
