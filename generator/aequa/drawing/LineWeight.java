package aequa.drawing;

import java.util.Locale;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;

/**
 * A line weight in points (1 pt = 1/72 inch). Theme files give either a number of points or one of
 * aequa's preset names:
 * <ul>
 *   <li>{@code hairline} 0.25 pt: the thinnest rule that holds on press (common practice; also the
 *       preflight's lower limit),</li>
 *   <li>{@code fine} 0.35 pt, {@code medium} 0.5 pt, {@code strong} 1 pt.</li>
 * </ul>
 *
 * @param pt the weight in points, positive
 */
public record LineWeight(double pt) {

    public static final LineWeight HAIRLINE = new LineWeight(0.25);
    public static final LineWeight FINE = new LineWeight(0.35);
    public static final LineWeight MEDIUM = new LineWeight(0.5);
    public static final LineWeight STRONG = new LineWeight(1.0);

    public LineWeight {
        if (!(pt > 0) || pt > 72) {
            throw new IllegalArgumentException("line weight must be in (0, 72] pt: " + pt);
        }
    }

    /** A preset name or a number of points, as written in a theme file ({@code hairline}, {@code "0.3"}, {@code "0.3pt"}). */
    @JsonCreator
    public static LineWeight parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        switch (t) {
            case "hairline":
                return HAIRLINE;
            case "fine":
                return FINE;
            case "medium":
                return MEDIUM;
            case "strong":
                return STRONG;
            default:
                try {
                    return new LineWeight(Double.parseDouble(t.endsWith("pt") ? t.substring(0, t.length() - 2) : t));
                } catch (NumberFormatException e) {
                    throw new IllegalArgumentException("not a line weight (hairline, fine, medium, strong or points): " + text, e);
                }
        }
    }

    /** A number of points, as a theme file gives it unquoted ({@code border: 0.3}). */
    @JsonCreator
    public static LineWeight ofPoints(double pt) {
        return new LineWeight(pt);
    }

    @JsonValue
    public double toJson() {
        return pt;
    }
}
