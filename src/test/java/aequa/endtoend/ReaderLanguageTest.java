package aequa.endtoend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * No English word of aequa's own reaches a French or Arabic reader. The demo publishes English, French and
 * Arabic; every page (site pages, map pages, figures tables, embed pages and fragments) and every SVG map of the
 * French and Arabic editions is read as a reader sees it ({@link VisibleText}), the author's own text is taken
 * out, and what is left must hold none of a list of common English words.
 *
 * <p>The author's text is what the project supplies for readers: the titles, units, notes, sources, dates and
 * part names of its project file, the site's title, publisher and notice (with their translations), and the
 * region names of its region files. The demo's author writes English, so without taking it out the test could
 * not tell aequa's words from the author's. The PNG and PDF of a map are painted by the same painter, in the
 * same language, as its SVG ({@code MapPainter}; the PDF draws its text as outlines, so its only text is its
 * title, the map's title), so the SVG stands for all three here; ArtworkLanguageTest checks the PNGs' language.
 *
 * <p>The words: the English function words that any sentence of aequa's bundles uses ("the", "of", "and", "to",
 * "is", "are", "at", "by", "for", "with", "because") and the nouns of its headings and captions ("Areas",
 * "Figures", "map", "regions", "shapes", "data"), none of which is a word of French or Arabic. Before the
 * method page's projection reasons were worded per language, this test found them on every French and Arabic
 * method page.
 */
class ReaderLanguageTest {

    private static final Path PROJECT = Path.of("data-demo");

    /** Enough places per file to see what is left without drowning the report. */
    private static final int SHOWN_PER_FILE = 3;

    /** Case-insensitive, Unicode word boundaries (so the French "thé" or "àreas" would not match). */
    private static final Pattern ENGLISH = Pattern.compile(
            "\\b(the|of|and|to|is|are|at|by|for|with|because|map|regions|shapes|data|areas)\\b|\\bFigures\\b",
            Pattern.CASE_INSENSITIVE | Pattern.UNICODE_CHARACTER_CLASS);

    @ParameterizedTest
    @ValueSource(strings = {"fr", "ar"})
    void noEnglishWordOfAequasOwnOnAnyPageOrMap(String language) throws IOException {
        Path edition = DemoSite.folder().resolve(language);
        List<String> authorTexts = authorTexts(PROJECT);
        List<String> leftovers = new ArrayList<>();
        List<Path> read = new ArrayList<>();
        try (Stream<Path> files = Files.walk(edition)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".html") || f.toString().endsWith(".svg")).sorted().toList()) {
                read.add(file);
                String text = withoutAuthorTexts(VisibleText.of(Files.readString(file, StandardCharsets.UTF_8)), authorTexts);
                Matcher english = ENGLISH.matcher(text);
                for (int shown = 0; english.find() && shown < SHOWN_PER_FILE; shown++) {
                    leftovers.add(edition.relativize(file) + ": \u2026" + text.substring(Math.max(0, english.start() - 60),
                            Math.min(text.length(), english.end() + 60)) + "\u2026");
                }
            }
        }
        // 3 site pages, and per map (7) a page, a figures page, an embed page, a fragment and two SVGs
        assertEquals(3 + 7 * 6, read.size(), "every page and SVG of the edition is read: " + read);
        assertEquals(List.of(), leftovers, "English words on the " + language + " edition, outside the author's text");
    }

    /** The check itself: it finds an English sentence, and it does not mistake the author's text for aequa's. */
    @ParameterizedTest
    @ValueSource(strings = {"fr", "ar"})
    void theCheckFindsEnglishAndSparesTheAuthor(String language) throws IOException {
        List<String> authorTexts = authorTexts(PROJECT);
        assertTrue(authorTexts.contains("Households on a community microgrid"), "map titles are the author's: " + authorTexts);
        assertTrue(authorTexts.contains("Mevaern"), "region names are the author's");
        String page = "<p title=\"Areas\">Households on a community microgrid</p><p>Projection de Mollweide</p>";
        String text = withoutAuthorTexts(VisibleText.of(page), authorTexts);
        Matcher english = ENGLISH.matcher(text);
        assertTrue(english.find(), text);
        assertEquals("Areas", english.group());
        assertTrue(!english.find(), "the title's English words are the author's: " + text);
        String declaredEnglish = "<ul lang=\"en\"><li>One region has no figure.</li></ul><p>Contr\u00f4les</p>";
        assertEquals("Contr\u00f4les", VisibleText.of(declaredEnglish), "text marked lang=en is English on purpose");
    }

    /**
     * Every text the project supplies for readers, longest first, each also with its first letter in upper case
     * (a unit that begins a sentence): the site's title, publisher and notice; each map's title, unit, notes,
     * source, date and inset names; the translations of all of these; each region's name (the property its region source names). Settings (file
     * names, column names, method names) are not taken: "quantile" or "area" left on a page would be aequa's.
     */
    static List<String> authorTexts(Path project) throws IOException {
        JsonNode file = new ObjectMapper(new YAMLFactory()).readTree(project.resolve("aequa.yaml").toFile());
        TreeSet<String> texts = new TreeSet<>();
        addTexts(file.path("site"), List.of("title", "publisher", "notice"), texts);
        for (JsonNode map : file.path("maps")) {
            addTexts(map, List.of("title", "unit", "notes", "source", "as-of"), texts);
            map.path("insets").forEach(inset -> texts.add(inset.path("name").asText()));
        }
        for (JsonNode source : file.path("regions")) {
            JsonNode regions = new ObjectMapper().readTree(project.resolve(source.path("file").asText()).toFile());
            regions.path("features").forEach(f -> texts.add(f.path("properties").path(source.path("name").asText()).asText()));
        }
        List<String> variants = new ArrayList<>();
        for (String text : texts) {
            String normal = VisibleText.normalise(text);
            if (!normal.isEmpty()) {
                variants.add(normal);
                variants.add(normal.substring(0, 1).toUpperCase(Locale.ROOT) + normal.substring(1));
            }
        }
        return variants.stream().distinct().sorted(Comparator.comparingInt(String::length).reversed()
                .thenComparing(Comparator.naturalOrder())).toList();
    }

    /** The {@code keys} of {@code node}, and of each of its translations ({@code translations: LANG: key}). */
    private static void addTexts(JsonNode node, List<String> keys, TreeSet<String> texts) {
        for (String key : keys) {
            texts.add(node.path(key).asText());
            node.path("translations").forEach(language -> texts.add(language.path(key).asText()));
        }
    }

    private static String withoutAuthorTexts(String text, List<String> authorTexts) {
        String rest = text;
        for (String authorText : authorTexts) {
            rest = rest.replace(authorText, " \u00a7 ");
        }
        return rest;
    }
}
