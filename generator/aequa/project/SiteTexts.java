package aequa.project;

/**
 * The site's own words in one more language, as the project file gives them under
 * {@code site: translations: {TAG: {...}}}. A field left out is shown as written in the site's settings.
 *
 * @param title     the site's title
 * @param publisher who publishes it
 * @param notice    the sentence shown on every page
 */
public record SiteTexts(String title, String publisher, String notice) {
}
