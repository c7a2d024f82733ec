package aequa.wording;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;

import com.ibm.icu.text.MessageFormat;
import com.ibm.icu.util.ULocale;

/**
 * Every word aequa puts in front of a reader, in one language: the bundled messages of that language
 * ({@code messages/LANG.txt} on the class path, ICU MessageFormat patterns with named arguments and CLDR plural
 * and select forms), with a project's overrides on top, and the {@link NumberWriter} of the same locale.
 *
 * <p>Guarantees: a key missing from a shipped language falls back to English (the bundle test keeps that from
 * happening); a key that exists in no bundle is a programming error ({@link IllegalArgumentException}). Numbers
 * formatted by ICU inside a message ({@code #} in a plural) follow the same CLDR locale as the
 * {@link NumberWriter}. Immutable and thread-safe.
 */
public final class Wording {

    /** Class-path folder of the bundled messages. */
    public static final String BUNDLE_FOLDER = "/messages/";

    private static final Map<String, MessageFile> BUNDLES = new ConcurrentHashMap<>();

    private final Language language;
    private final ULocale locale;
    private final Map<String, String> patterns;
    private final NumberWriter numbers;

    private Wording(Language language, Map<String, String> patterns) {
        this.language = language;
        this.locale = ULocale.forLanguageTag(language.tag());
        this.patterns = Map.copyOf(patterns);
        this.numbers = new NumberWriter(locale);
    }

    /** The shipped wording of {@code language}, without project overrides. */
    public static Wording of(Language language) {
        return withOverrides(language, Map.of());
    }

    /** English, aequa's first language. */
    public static Wording english() {
        return of(Language.ENGLISH);
    }

    /**
     * The shipped wording with {@code overrides} (key to ICU pattern) on top. Overrides are expected to have
     * been checked ({@link WordingOverrides}); an unknown key among them is ignored.
     */
    public static Wording withOverrides(Language language, Map<String, String> overrides) {
        Map<String, String> patterns = new HashMap<>(patternsOf(bundle(Language.ENGLISH.bundleName())));
        patterns.putAll(patternsOf(bundle(language.bundleName())));
        overrides.forEach((key, pattern) -> {
            if (patterns.containsKey(key)) {
                patterns.put(key, pattern);
            }
        });
        return new Wording(language, patterns);
    }

    /** The bundled message file of a shipped language ({@link Language#bundleName()}). */
    public static MessageFile bundle(String bundleName) {
        return BUNDLES.computeIfAbsent(bundleName, Wording::readBundle);
    }

    private static MessageFile readBundle(String bundleName) {
        try (InputStream in = Wording.class.getResourceAsStream(BUNDLE_FOLDER + bundleName + ".txt")) {
            if (in == null) {
                throw new IllegalStateException("message bundle missing from the jar: " + bundleName);
            }
            MessageFile file = MessageFile.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8));
            if (!file.problems().isEmpty()) {
                throw new IllegalStateException("bundled messages " + bundleName + " line " + file.problems().get(0).line()
                        + ": " + file.problems().get(0).message());
            }
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read bundled messages " + bundleName, e);
        }
    }

    private static Map<String, String> patternsOf(MessageFile file) {
        Map<String, String> out = new LinkedHashMap<>();
        file.messages().forEach((key, message) -> out.put(key, message.pattern()));
        return out;
    }

    /**
     * The message {@code key} with its named arguments, given as name, value pairs: strings are inserted as
     * they are, numbers select plural forms and are written in the language's digits.
     */
    public String text(String key, Object... namesAndValues) {
        String pattern = patterns.get(key);
        if (pattern == null) {
            throw new IllegalArgumentException("no message " + key);
        }
        if (namesAndValues.length % 2 != 0) {
            throw new IllegalArgumentException("arguments of " + key + " must come in name, value pairs");
        }
        Map<String, Object> arguments = new HashMap<>();
        for (int i = 0; i < namesAndValues.length; i += 2) {
            arguments.put(String.valueOf(namesAndValues[i]), Objects.requireNonNull(namesAndValues[i + 1],
                    () -> "argument of " + key));
        }
        return new MessageFormat(pattern, locale).format(arguments);
    }

    /**
     * What identifies this wording for the rebuild check: the language and every message pattern, in key
     * order (overrides included), as text.
     */
    public String fingerprint() {
        StringBuilder text = new StringBuilder(language.tag());
        new java.util.TreeMap<>(patterns).forEach((key, pattern) -> text.append('\n').append(key).append('=').append(pattern));
        return text.toString();
    }

    /** "A, B and C" as the language joins a list (CLDR list patterns). */
    public String list(java.util.List<String> items) {
        return com.ibm.icu.text.ListFormatter.getInstance(locale).format(items);
    }

    /** {@code text} with its first letter in upper case, by the language's rules: a sentence that begins with a name. */
    public String sentence(String text) {
        if (text.isEmpty()) {
            return text;
        }
        int first = text.offsetByCodePoints(0, 1);
        return com.ibm.icu.lang.UCharacter.toUpperCase(locale, text.substring(0, first)) + text.substring(first);
    }

    /** "a, b, c": items joined by the language's comma ("a، b" in Arabic), without a conjunction. */
    public String unitList(java.util.List<String> items) {
        String joined = items.isEmpty() ? "" : items.get(0);
        for (int i = 1; i < items.size(); i++) {
            joined = text("list.item", "list", joined, "item", items.get(i));
        }
        return joined;
    }

    /** "a; b; c": clauses joined as the language separates them ("a ; b" in French, "a؛ b" in Arabic). */
    public String clauseList(java.util.List<String> items) {
        String joined = items.isEmpty() ? "" : items.get(0);
        for (int i = 1; i < items.size(); i++) {
            joined = text("list.clause", "list", joined, "item", items.get(i));
        }
        return joined;
    }

    /**
     * The range of class {@code i} in words, as every key of a map says it (the drawn legend, the page's key):
     * "1 to under 2" for every class but the last, which holds its upper limit too ("9 to 10"), following
     * {@code Classification.classOf}: a value equal to a break is in the upper class. Limits as
     * {@link NumberWriter#limit} writes them.
     */
    public String classRange(java.util.List<Double> limits, int i) {
        boolean last = i == limits.size() - 2;
        return text(last ? "legend.lastRange" : "legend.range", "from", numbers.limit(limits.get(i), limits),
                "to", numbers.limit(limits.get(i + 1), limits));
    }

    /** Whether {@code key} names a message. */
    public boolean has(String key) {
        return patterns.containsKey(key);
    }

    public Language language() {
        return language;
    }

    public NumberWriter numbers() {
        return numbers;
    }
}
