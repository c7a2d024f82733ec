package aequa.inputs.regions;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.IllegalCharsetNameException;
import java.nio.charset.StandardCharsets;
import java.nio.charset.UnsupportedCharsetException;
import java.util.Locale;
import java.util.Optional;

import com.linuxense.javadbf.DBFCharsetHelper;

/**
 * Decides the character set of a Shapefile's {@code .dbf} text, and says how it was decided. In order:
 * <ol>
 * <li>the {@code .cpg} file beside it (a convention of Shapefile writers, not in the 1998 description: one line
 *     naming the code page, as {@code UTF-8}, {@code 1252}, {@code ANSI 1252} or {@code 88591});</li>
 * <li>the language driver id in byte 29 of the dBASE header (dBASE IV/V file structure), through javadbf's
 *     table of ids;</li>
 * <li>otherwise nothing says: UTF-8 when the table's bytes are valid UTF-8 and not all ASCII, ISO-8859-1
 *     (which reads every byte) when not; the caller reports this assumption.</li>
 * </ol>
 */
final class DbfCodePage {

    /** How the character set was found. */
    enum Source {
        CPG_FILE, LANGUAGE_DRIVER, ASSUMED
    }

    /** @param cpgProblem the {@code .cpg} text when it named no character set Java knows, else empty */
    record Decision(Charset charset, Source source, String cpgProblem) {
    }

    /** dBASE header byte holding the language driver id (dBASE IV file header, offset 29). */
    private static final int LANGUAGE_DRIVER_OFFSET = 29;

    private DbfCodePage() {
    }

    /**
     * @param cpg the {@code .cpg} text, if the file is there
     * @param dbf the whole {@code .dbf} (a table of attributes, small beside the geometry)
     */
    static Decision decide(Optional<String> cpg, byte[] dbf) {
        String cpgProblem = "";
        if (cpg.isPresent()) {
            Optional<Charset> named = fromCpg(cpg.get());
            if (named.isPresent()) {
                return new Decision(named.get(), Source.CPG_FILE, "");
            }
            cpgProblem = cpg.get();
        }
        int driver = dbf.length > LANGUAGE_DRIVER_OFFSET ? dbf[LANGUAGE_DRIVER_OFFSET] & 0xFF : 0;
        Charset byDriver = driver == 0 ? null : DBFCharsetHelper.getCharsetByByte(driver);
        if (byDriver != null) {
            return new Decision(byDriver, Source.LANGUAGE_DRIVER, cpgProblem);
        }
        return new Decision(validUtf8BeyondAscii(dbf) ? StandardCharsets.UTF_8 : StandardCharsets.ISO_8859_1,
                Source.ASSUMED, cpgProblem);
    }

    /** The character set a {@code .cpg} names: a Java charset name, or a Windows/ISO code page number. */
    static Optional<Charset> fromCpg(String text) {
        String name = text.trim().toUpperCase(Locale.ROOT);
        if (name.startsWith("ANSI ")) {
            name = name.substring(5).trim();
        }
        if (name.matches("\\d+")) {
            name = codePageNumber(Integer.parseInt(name));
        }
        try {
            return name.isEmpty() ? Optional.empty() : Optional.of(Charset.forName(name));
        } catch (IllegalCharsetNameException | UnsupportedCharsetException e) {
            return Optional.empty();
        }
    }

    /** Code page numbers as .cpg files give them: Windows (125x, 874, 932...), OEM (437, 850...), ISO 8859 (8859n). */
    private static String codePageNumber(int number) {
        if (number == 65001) {
            return "UTF-8";
        }
        if (number >= 88591 && number <= 885916) {
            return "ISO-8859-" + String.valueOf(number).substring(4);
        }
        switch (number) {
            case 874:
                return "x-windows-874";
            case 932:
                return "windows-31j";
            case 936:
                return "GBK";
            case 949:
                return "x-windows-949";
            case 950:
                return "x-windows-950";
            default:
                return number >= 1250 && number <= 1258 ? "windows-" + number : "IBM" + number;
        }
    }

    /** Whether the records (after the header, whose length bytes 8-9 give) are UTF-8 with some non-ASCII text. */
    private static boolean validUtf8BeyondAscii(byte[] dbf) {
        int headerBytes = dbf.length < 10 ? dbf.length : (dbf[8] & 0xFF) | (dbf[9] & 0xFF) << 8;
        ByteBuffer records = ByteBuffer.wrap(dbf, Math.min(headerBytes, dbf.length), Math.max(0, dbf.length - headerBytes));
        boolean beyondAscii = false;
        for (int i = records.position(); i < records.limit(); i++) {
            if (dbf[i] < 0) {
                beyondAscii = true;
                break;
            }
        }
        if (!beyondAscii) {
            return false;
        }
        try {
            StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(records);
            return true;
        } catch (CharacterCodingException e) {
            return false;
        }
    }
}
