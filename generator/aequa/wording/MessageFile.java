package aequa.wording;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.ibm.icu.text.MessagePattern;

/**
 * A file of messages, one per line: {@code key = ICU MessageFormat pattern}, UTF-8. Blank lines and lines
 * starting with {@code #} are ignored; spaces around the first {@code =} are trimmed; a pattern that needs
 * leading spaces or a line break cannot be written (no message needs one). The same format serves the bundled
 * {@code messages/LANG.txt} and a project's overrides.
 *
 * <p>Parsing never throws: a line without {@code =}, an empty key, a key given twice or a pattern ICU cannot
 * parse is a {@link Problem} with its line number, and the line is skipped.
 */
public record MessageFile(Map<String, Message> messages, List<Problem> problems) {

    /** One message and the line it came from. */
    public record Message(String pattern, int line) {
    }

    /** Something wrong on one line. */
    public record Problem(int line, String message) {
    }

    public MessageFile {
        messages = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(messages));
        problems = List.copyOf(problems);
    }

    public static MessageFile parse(String text) {
        Map<String, Message> messages = new LinkedHashMap<>();
        List<Problem> problems = new ArrayList<>();
        String[] lines = text.split("\r?\n", -1);
        for (int i = 0; i < lines.length; i++) {
            int lineNumber = i + 1;
            String line = i == 0 && lines[i].startsWith("\ufeff") ? lines[i].substring(1) : lines[i];
            String trimmed = line.strip();
            if (trimmed.isEmpty() || trimmed.startsWith("#")) {
                continue;
            }
            int equals = line.indexOf('=');
            if (equals < 0) {
                problems.add(new Problem(lineNumber, "a line must read key = message"));
                continue;
            }
            String key = line.substring(0, equals).strip();
            String pattern = line.substring(equals + 1).strip();
            if (!key.matches("[a-z][a-zA-Z0-9]*(\\.[a-z][a-zA-Z0-9]*)*")) {
                problems.add(new Problem(lineNumber, "\"" + key + "\" is not a message key (words joined by dots)"));
                continue;
            }
            if (messages.containsKey(key)) {
                problems.add(new Problem(lineNumber, "the key " + key + " is given twice (first on line "
                        + messages.get(key).line() + ")"));
                continue;
            }
            String patternProblem = patternProblem(pattern);
            if (patternProblem != null) {
                problems.add(new Problem(lineNumber, "the message of " + key + " is not a valid ICU pattern: " + patternProblem));
                continue;
            }
            messages.put(key, new Message(pattern, lineNumber));
        }
        return new MessageFile(messages, problems);
    }

    /** Why ICU refuses {@code pattern}, or null when it parses. */
    static String patternProblem(String pattern) {
        try {
            new MessagePattern(pattern);
            return null;
        } catch (IllegalArgumentException | IndexOutOfBoundsException e) {
            return e.getMessage();
        }
    }
}
