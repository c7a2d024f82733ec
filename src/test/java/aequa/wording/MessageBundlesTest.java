package aequa.wording;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

import com.ibm.icu.text.MessagePattern;
import com.ibm.icu.text.PluralRules;
import com.ibm.icu.util.ULocale;

import aequa.projection.ProjectionFamily;

/**
 * The shipped bundles stay complete and in use: every language has exactly English's keys with the same named
 * arguments, plural forms use only the CLDR plural categories of their language (CLDR "Language Plural Rules"
 * chart, through ICU4J's PluralRules) and always have "other", and every key is used by a template or the
 * code. Keys read by a computed name are the projection words ({@code family.*}, one per
 * {@link ProjectionFamily}, and {@code parameter.*}, EPSG parameter names in camel case).
 */
class MessageBundlesTest {

    private static final Pattern QUOTED = Pattern.compile("\"([a-z][a-zA-Z0-9]*(?:\\.[a-z][a-zA-Z0-9]*)+)\"");

    @Test
    void everyLanguageHasEveryKeyWithTheSameArguments() {
        MessageFile english = Wording.bundle("en");
        for (String language : Language.SHIPPED) {
            MessageFile bundle = Wording.bundle(language);
            assertEquals(List.of(), bundle.problems(), language);
            assertEquals(new TreeSet<>(english.messages().keySet()), new TreeSet<>(bundle.messages().keySet()), language);
            bundle.messages().forEach((key, message) -> assertEquals(arguments(english.messages().get(key).pattern()),
                    arguments(message.pattern()), language + " " + key + " (line " + message.line() + ")"));
        }
    }

    @Test
    void pluralFormsAreTheLanguagesCldrCategories() {
        for (String language : Language.SHIPPED) {
            Set<String> categories = PluralRules.forLocale(ULocale.forLanguageTag(language)).getKeywords();
            Wording.bundle(language).messages().forEach((key, message) -> {
                for (List<String> selectors : pluralSelectors(message.pattern())) {
                    assertTrue(selectors.contains("other"), language + " " + key + ": a plural needs \"other\"");
                    for (String selector : selectors) {
                        assertTrue(selector.startsWith("=") || categories.contains(selector),
                                language + " " + key + ": \"" + selector + "\" is not a plural category of " + language
                                        + " " + categories);
                    }
                }
            });
        }
    }

    @Test
    void everyKeyIsUsed() throws IOException {
        Set<String> used = new TreeSet<>();
        for (Path root : List.of(Path.of("templates"), Path.of("generator"))) {
            try (Stream<Path> files = Files.walk(root)) {
                for (Path file : files.filter(f -> f.toString().endsWith(".ftlh") || f.toString().endsWith(".java")).toList()) {
                    Matcher quoted = QUOTED.matcher(Files.readString(file));
                    while (quoted.find()) {
                        used.add(quoted.group(1));
                    }
                }
            }
        }
        for (ProjectionFamily family : ProjectionFamily.values()) {
            used.add(ProjectionWords.familyKey(family));
        }
        List<String> unused = new ArrayList<>();
        for (String key : Wording.bundle("en").messages().keySet()) {
            if (!used.contains(key) && !key.startsWith("parameter.")) {
                unused.add(key);
            }
        }
        assertEquals(List.of(), unused);
        for (ProjectionFamily family : ProjectionFamily.values()) {
            assertTrue(Wording.english().has(ProjectionWords.familyKey(family)), family.name());
        }
    }

    @Test
    void everyKeyTheTemplatesAskForExists() throws IOException {
        Pattern call = Pattern.compile("t\\(\"([^\"]+)\"");
        try (Stream<Path> files = Files.list(Path.of("templates"))) {
            for (Path file : files.filter(f -> f.toString().endsWith(".ftlh")).toList()) {
                Matcher m = call.matcher(Files.readString(file));
                while (m.find()) {
                    assertTrue(Wording.english().has(m.group(1)), file + ": " + m.group(1));
                }
            }
        }
    }

    private static Set<String> arguments(String pattern) {
        return MessageArguments.of(pattern);
    }

    /** The selectors of each plural argument of a pattern. */
    private static List<List<String>> pluralSelectors(String pattern) {
        MessagePattern parsed = new MessagePattern(pattern);
        List<List<String>> plurals = new ArrayList<>();
        for (int i = 0; i < parsed.countParts(); i++) {
            MessagePattern.Part part = parsed.getPart(i);
            if (part.getType() == MessagePattern.Part.Type.ARG_START && part.getArgType() == MessagePattern.ArgType.PLURAL) {
                List<String> selectors = new ArrayList<>();
                int limit = parsed.getLimitPartIndex(i);
                for (int j = i + 1; j < limit; j++) {
                    MessagePattern.Part inner = parsed.getPart(j);
                    if (inner.getType() == MessagePattern.Part.Type.ARG_SELECTOR) {
                        selectors.add(parsed.getSubstring(inner));
                    } else if (inner.getType() == MessagePattern.Part.Type.MSG_START) {
                        j = parsed.getLimitPartIndex(j); // skip nested messages
                    }
                }
                plurals.add(selectors);
            }
        }
        return plurals;
    }
}
