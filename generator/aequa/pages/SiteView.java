package aequa.pages;

/**
 * What every page says about the site.
 *
 * @param title     the site's title
 * @param publisher who publishes it, or empty
 * @param notice    the sentence every page shows (for example that the data is invented), or empty
 * @param language  the pages' BCP 47 language tag
 */
public record SiteView(String title, String publisher, String notice, String language) {
}
