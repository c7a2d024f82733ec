package aequa.project;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * Checks the project's own translations against the languages the site is published in: a translation for a
 * language the site does not publish is never shown (a warning at its line); a published language other than
 * the first in which some maps keep the titles as written is worth a note, since its readers see those titles
 * in the first language.
 */
final class TranslationChecks {

    private final ProjectFile project;
    private final YamlLocations locations;
    private final Findings findings;

    TranslationChecks(ProjectFile project, YamlLocations locations, Findings findings) {
        this.project = project;
        this.locations = locations;
        this.findings = findings;
    }

    void run() {
        List<String> languages = project.site().languages();
        unused("/site/translations", project.site().translations(), languages);
        for (int i = 0; i < project.maps().size(); i++) {
            unused("/maps/" + i + "/translations", project.maps().get(i).translations(), languages);
        }
        for (String tag : languages.subList(1, languages.size())) {
            List<String> untitled = new ArrayList<>();
            for (MapSpec map : project.maps()) {
                if (Translations.of(map.translations(), tag).map(MapTexts::title).isEmpty()) {
                    untitled.add(map.id());
                }
            }
            if (!untitled.isEmpty()) {
                findings.add(Finding.note("translation-missing", ProjectFile.FILE_NAME, locations.place("/site/languages"),
                        String.format(java.util.Locale.ROOT, "%d of %d maps have no title in \"%s\" (first: '%s'); its pages show them as written.",
                                untitled.size(), project.maps().size(), tag, untitled.get(0)),
                        "Give each map translations: {" + tag + ": {title: ..., unit: ...}} to translate its own words."));
            }
        }
    }

    private void unused(String at, Map<String, ?> translations, List<String> languages) {
        for (String key : translations.keySet()) {
            if (!Translations.serves(key, languages)) {
                findings.add(Finding.warning("translation-language-unused", ProjectFile.FILE_NAME,
                        locations.place(at + "/" + key),
                        "The site is not published in \"" + key + "\", so this translation is not shown.",
                        "Add the language to site: languages (" + String.join(", ", languages) + "), or remove the translation."));
            }
        }
    }
}
