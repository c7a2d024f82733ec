package aequa.project;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.JsonDeserializer;
import com.fasterxml.jackson.databind.module.SimpleModule;

/**
 * Reads a mode's word into its {@link ConfigWord} constant while the project file is bound. An unknown word
 * does not stop the reading: it is noted (with the place it stands, for a {@code project-unknown-value}
 * finding with line and column) and the setting takes its default, so one run reports every unknown word.
 * Words are compared after trimming and in lower case.
 */
final class ConfigWordReader<E extends Enum<E> & ConfigWord> extends JsonDeserializer<E> {

    /** A word that names no constant. */
    record UnknownWord(String word, String choices, JsonLocation location) {
    }

    /** The reading's list of unknown words, as a deserialization attribute. */
    static final Object UNKNOWN_WORDS = UnknownWord.class;

    private final Class<E> type;

    private ConfigWordReader(Class<E> type) {
        this.type = type;
    }

    /** The module that reads every mode of the project file. */
    static SimpleModule module() {
        SimpleModule module = new SimpleModule("aequa-config-words");
        add(module, MapDisplay.class);
        add(module, Measure.class);
        add(module, Normalisation.class);
        add(module, ClassMethod.class);
        add(module, ColourScheme.class);
        add(module, MissingFigures.class);
        add(module, TableLayout.class);
        add(module, KeyMatching.class);
        return module;
    }

    /** A fresh list to pass as the {@link #UNKNOWN_WORDS} attribute of one reading. */
    static List<UnknownWord> newList() {
        return new ArrayList<>();
    }

    private static <E extends Enum<E> & ConfigWord> void add(SimpleModule module, Class<E> type) {
        module.addDeserializer(type, new ConfigWordReader<>(type));
    }

    @Override
    @SuppressWarnings("unchecked")
    public E deserialize(JsonParser parser, DeserializationContext context) throws IOException {
        String word = parser.getValueAsString();
        if (word == null) {
            return (E) context.handleUnexpectedToken(type, parser);
        }
        Optional<E> constant = ConfigWord.parse(type, word.strip().toLowerCase(Locale.ROOT));
        if (constant.isPresent()) {
            return constant.get();
        }
        ((List<UnknownWord>) context.getAttribute(UNKNOWN_WORDS))
                .add(new UnknownWord(word, ConfigWord.choices(type), parser.currentTokenLocation()));
        return null;
    }
}
