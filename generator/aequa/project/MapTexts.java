package aequa.project;

/**
 * A map's own words in one more language, as the project file gives them under the map's
 * {@code translations: {TAG: {...}}}. A field left out is shown as written in the map's own settings.
 *
 * @param title  the map's title
 * @param unit   the unit readers see
 * @param notes  the notes under the map
 * @param source the credit for the figures
 * @param asOf   the date or period the figures refer to, as readers should see it
 */
public record MapTexts(String title, String unit, String notes, String source, String asOf) {
}
