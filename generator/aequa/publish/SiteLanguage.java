package aequa.publish;

import java.util.ArrayList;
import java.util.List;

import aequa.wording.Wording;

/**
 * One language of a published site and where its pages go: the first language at the output's root, every
 * other in a folder named by its tag ({@code fr/}, {@code pt-BR/}), each with the same tree of pages and map
 * files. Stylesheets, scripts and report.json are written once, at the root.
 *
 * @param wording its words and numbers
 * @param prefix  its folder from the output's root: "" or "TAG/"
 */
record SiteLanguage(Wording wording, String prefix) {

    static List<SiteLanguage> of(List<Wording> wordings) {
        List<SiteLanguage> languages = new ArrayList<>();
        for (int i = 0; i < wordings.size(); i++) {
            Wording w = wordings.get(i);
            languages.add(new SiteLanguage(w, i == 0 ? "" : w.language().tag() + "/"));
        }
        return languages;
    }

    /** From this language's root back to the output's root. */
    String toSiteRoot() {
        return prefix.isEmpty() ? "" : "../";
    }

    /** The site-wide pages of this language. */
    List<String> sitePages() {
        return List.of(prefix + "index.html", prefix + "method.html", prefix + "changes.html");
    }
}
