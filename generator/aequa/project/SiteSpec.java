package aequa.project;

/**
 * @param title     the site's title
 * @param publisher who publishes it
 * @param notice    a sentence shown on every page (for example that the data is invented), or empty
 * @param theme     a theme name from themes/ or the project's own themes/ folder
 * @param language  the pages' language tag (BCP 47): the first of {@code languages}
 * @param printWidth the width of the print SVGs: a column preset ({@code one-column}, {@code two-columns},
 *                   {@code three-columns}, {@code full-width}) or a width in millimetres such as {@code "120 mm"}
 * @param printTheme the theme of the print SVGs (the pages and web maps use {@code theme})
 * @param languages the languages the site is published in, first at the output's root, each other in a folder
 *                  named by its tag; {@code language: fr} alone means {@code languages: [fr]}
 * @param translations the site's own words in more languages, by language tag (see {@link Translations})
 */
public record SiteSpec(String title, String publisher, String notice, String theme, String language, String printWidth,
                       String printTheme, java.util.List<String> languages, java.util.Map<String, SiteTexts> translations) {

    static final SiteSpec DEFAULT = new SiteSpec(null, null, null, null, null, null, null, null, null);

    /** A site without translations of its own words. */
    public SiteSpec(String title, String publisher, String notice, String theme, String language, String printWidth,
                    String printTheme, java.util.List<String> languages) {
        this(title, publisher, notice, theme, language, printWidth, printTheme, languages, null);
    }

    /** A site with the default print settings. */
    public SiteSpec(String title, String publisher, String notice, String theme, String language) {
        this(title, publisher, notice, theme, language, null, null, null);
    }

    public SiteSpec {
        title = title == null ? "Maps" : title;
        publisher = publisher == null ? "" : publisher;
        notice = notice == null ? "" : notice;
        theme = theme == null ? "daylight" : theme;
        if (languages == null || languages.isEmpty()) {
            language = language == null ? "en" : language;
            languages = java.util.List.of(language);
        } else {
            languages = java.util.List.copyOf(languages);
            language = languages.get(0);
        }
        printWidth = printWidth == null ? "two-columns" : printWidth;
        printTheme = printTheme == null ? "newsprint" : printTheme;
        translations = translations == null ? java.util.Map.of()
                : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(translations));
    }

    /** This site with its own words (title, publisher, notice) in the language {@code tag}, where translated. */
    public SiteSpec inLanguage(String tag) {
        return Translations.of(translations, tag).map(t -> new SiteSpec(t.title() == null ? title : t.title(),
                t.publisher() == null ? publisher : t.publisher(), t.notice() == null ? notice : t.notice(), theme,
                language, printWidth, printTheme, languages, translations)).orElse(this);
    }
}
