package aequa.wording;

import java.util.Set;
import java.util.TreeSet;

import com.ibm.icu.text.MessagePattern;

/** The named arguments of an ICU message pattern, so a translation or override can be checked against the original. */
public final class MessageArguments {

    private MessageArguments() {
    }

    /** The argument names of {@code pattern}, sorted; the pattern must parse ({@link MessageFile} checks that). */
    public static Set<String> of(String pattern) {
        MessagePattern parsed = new MessagePattern(pattern);
        Set<String> names = new TreeSet<>();
        for (int i = 0; i < parsed.countParts(); i++) {
            if (parsed.getPart(i).getType() == MessagePattern.Part.Type.ARG_NAME) {
                names.add(parsed.getSubstring(parsed.getPart(i)));
            }
        }
        return names;
    }
}
