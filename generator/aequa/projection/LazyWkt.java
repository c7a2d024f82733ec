package aequa.projection;

import java.util.function.Supplier;

/**
 * The WKT 2 of a projection, formatted by Apache SIS on first use and then kept: formatting costs
 * milliseconds and most projections built while searching are never described. Thread-safe; a race
 * formats twice and keeps identical text.
 */
final class LazyWkt {

    private final Supplier<String> format;
    private volatile String text;

    LazyWkt(Supplier<String> format) {
        this.format = format;
    }

    String text() {
        String formatted = text;
        if (formatted == null) {
            formatted = format.get();
            text = formatted;
        }
        return formatted;
    }
}
