package aequa.findings;

import java.util.Objects;

/**
 * One problem or notice about the user's data or project file.
 *
 * @param severity how much it matters
 * @param code     a stable, kebab-case identifier of the kind of finding (for example {@code join-missing-figure}),
 *                 so scripts and tests can match it without parsing prose
 * @param file     the file it is about, as the user named it (relative to the project), or empty
 * @param place    where in that file: {@code line 12, column 4}, {@code feature "AB-03"}, {@code row 7}; or empty
 * @param message  one sentence saying what is wrong, in the user's terms
 * @param hint     one sentence saying what to do about it, or empty
 */
public record Finding(Severity severity, String code, String file, String place, String message, String hint) {

    public Finding {
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(code, "code");
        file = file == null ? "" : file;
        place = place == null ? "" : place;
        Objects.requireNonNull(message, "message");
        hint = hint == null ? "" : hint;
    }

    public static Finding error(String code, String file, String place, String message, String hint) {
        return new Finding(Severity.ERROR, code, file, place, message, hint);
    }

    public static Finding warning(String code, String file, String place, String message, String hint) {
        return new Finding(Severity.WARNING, code, file, place, message, hint);
    }

    public static Finding note(String code, String file, String place, String message, String hint) {
        return new Finding(Severity.NOTE, code, file, place, message, hint);
    }

    /** One line for a terminal: {@code error: file, place: message (hint)}. */
    public String toLine() {
        StringBuilder line = new StringBuilder(severity.name().toLowerCase(java.util.Locale.ROOT)).append(": ");
        if (!file.isEmpty()) {
            line.append(file);
            line.append(place.isEmpty() ? ": " : ", ");
        }
        if (!place.isEmpty()) {
            line.append(place).append(": ");
        }
        line.append(message);
        if (!hint.isEmpty()) {
            line.append(" Hint: ").append(hint);
        }
        return line.toString();
    }
}
