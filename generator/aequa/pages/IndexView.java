package aequa.pages;

import java.util.List;

/**
 * The list of maps on the front page.
 *
 * @param cards one card per map, in project-file order
 */
public record IndexView(List<Card> cards) {

    public IndexView {
        cards = List.copyOf(cards);
    }

    /**
     * @param title    the map's title
     * @param asOf     the date the figures refer to, as readers see it
     * @param unit     what the colours measure
     * @param pageHref link to the map's page, relative to the site root
     * @param thumbHref link to the small picture of the map, relative to the site root
     * @param thumbAlt  the picture's text alternative
     */
    public record Card(String title, String asOf, String unit, String pageHref, String thumbHref, String thumbAlt) {
    }
}
