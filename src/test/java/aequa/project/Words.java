package aequa.project;

/** For tests that write a mode as the project file does: the constant of a word, null for null. */
public final class Words {

    private Words() {
    }

    /** The constant of {@code type} named {@code word}; null when {@code word} is null; throws for an unknown word. */
    public static <E extends Enum<E> & ConfigWord> E of(Class<E> type, String word) {
        return word == null ? null
                : ConfigWord.parse(type, word).orElseThrow(() -> new IllegalArgumentException("no " + type.getSimpleName() + " " + word));
    }
}
