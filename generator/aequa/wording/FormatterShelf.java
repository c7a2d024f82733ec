package aequa.wording;

import java.util.concurrent.atomic.AtomicReferenceArray;
import java.util.function.IntFunction;

import com.ibm.icu.number.LocalizedNumberFormatter;

/**
 * The formatters of one kind of number (fixed decimals, a percentage, an angle, ...) by their number of
 * decimals, each made once on first use and then reused. Reuse is what makes ICU fast: a
 * {@link LocalizedNumberFormatter} compiles its formatting pipeline only after it has been called a few times
 * (ICU4J's {@code LocalizedNumberFormatter.computeCompiled}), so a formatter made afresh for every number never
 * gets past the slow first calls; a page of 3,000 figures spent most of its formatting time there.
 *
 * <p>Thread-safe: two threads may both make a missing formatter; they are equal, and either is kept. Counts
 * of decimals outside {@code 0..}{@value #SHELF_SIZE}{@code -1} get a new formatter each time (no data needs
 * them).
 */
final class FormatterShelf {

    /** More decimals than any reader-facing number of aequa's uses. */
    static final int SHELF_SIZE = 24;

    private final IntFunction<LocalizedNumberFormatter> make;
    private final AtomicReferenceArray<LocalizedNumberFormatter> byDecimals = new AtomicReferenceArray<>(SHELF_SIZE);

    /** {@code make} builds the formatter for a number of decimals; it must depend on nothing else. */
    FormatterShelf(IntFunction<LocalizedNumberFormatter> make) {
        this.make = make;
    }

    /** The formatter for {@code decimals}, the same object on every call within the shelf's range. */
    LocalizedNumberFormatter forDecimals(int decimals) {
        if (decimals < 0 || decimals >= SHELF_SIZE) {
            return make.apply(decimals);
        }
        LocalizedNumberFormatter kept = byDecimals.get(decimals);
        if (kept == null) {
            kept = make.apply(decimals);
            if (!byDecimals.compareAndSet(decimals, null, kept)) {
                kept = byDecimals.get(decimals);
            }
        }
        return kept;
    }
}
