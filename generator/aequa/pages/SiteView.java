package aequa.pages;

import java.util.List;

import aequa.wording.Wording;

/**
 * What every page says about the site, in one of its languages.
 *
 * @param title        the site's title
 * @param publisher    who publishes it, or empty
 * @param notice       the sentence every page shows (for example that the data is invented), or empty
 * @param wording      the language of these pages: its messages (the templates' {@code t}) and numbers
 * @param alternates   the site's other languages, each with the way to its pages; empty for one language
 * @param assetsPrefix from this language's root to the site's root, where the stylesheets and report.json
 *                     are shared by every language ("" for the first language, "../" for the others)
 */
public record SiteView(String title, String publisher, String notice, Wording wording, List<Alternate> alternates,
                       String assetsPrefix) {

    public SiteView {
        alternates = List.copyOf(alternates);
    }

    /** A site in one language. */
    public SiteView(String title, String publisher, String notice, Wording wording) {
        this(title, publisher, notice, wording, List.of(), "");
    }

    /**
     * Another language of the same pages.
     *
     * @param language its BCP 47 tag, for {@code hreflang} and {@code lang}
     * @param name     its name in itself ("français"), as the language link reads
     * @param prefix   from this language's root to that language's root ("fr/", "../")
     * @param current  whether it is the language of this page
     */
    public record Alternate(String language, String name, String prefix, boolean current) {
    }

    /** The pages' BCP 47 language tag. */
    public String language() {
        return wording.language().tag();
    }

    /** {@code rtl} for a language written right to left, else {@code ltr}. */
    public String direction() {
        return wording.language().direction();
    }
}
