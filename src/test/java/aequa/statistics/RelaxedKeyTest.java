package aequa.statistics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The relaxed form: case, whitespace and leading zeros of each digit run ignored. */
class RelaxedKeyTest {

    @ParameterizedTest(name = "[{0}] -> [{1}]")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', value = {
            "AB-007        | ab-7",
            "' ab - 7 '    | ab-7",
            "01001         | 1001",
            "00            | 0",
            "0             | 0",
            "DE\u00A0300   | de300",
            "R10-02-0300   | r10-2-300",
            "X100          | x100",
    })
    void relaxedForm(String key, String expected) {
        assertEquals(expected, RelaxedKey.of(key));
    }
}
