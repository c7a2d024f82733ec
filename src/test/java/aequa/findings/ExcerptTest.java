package aequa.findings;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Excerpts of file content in messages are short and cannot steer a terminal. */
class ExcerptTest {

    @Test
    void longTextIsCutAndItsLengthSaid() {
        assertEquals("abcde... (1,000 characters)", Excerpt.of("abcde".repeat(200), 5));
        assertEquals("short", Excerpt.of("short"));
    }

    @Test
    void controlAndDirectionCharactersAreEscaped() {
        // U+202E RIGHT-TO-LEFT OVERRIDE reorders the rest of a line (Unicode Bidirectional Algorithm, UAX #9);
        // ESC starts a terminal control sequence (ECMA-48)
        assertEquals("a\\u000ab\\u202ec\\u001b[2J", Excerpt.of("a\nb\u202ec\u001b[2J", 40));
    }

    @Test
    void aSurrogatePairIsNeverSplit() {
        String text = "ab\uD83D\uDE00cd"; // U+1F600 as a UTF-16 surrogate pair
        assertEquals("ab... (6 characters)", Excerpt.of(text, 3));
    }

    @Test
    void quotedPartsOfAParsersMessageAreCut() {
        String token = "ghp_" + "x".repeat(200);
        assertEquals("Unrecognized token 'ghp_xxxxxxxxxxxxxxxxxxxx... (204 characters)': was expecting a value",
                Excerpt.quotedParts("Unrecognized token '" + token + "': was expecting a value"));
    }
}
