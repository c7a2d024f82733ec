package aequa.publish;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import aequa.drawing.PrintPreset;
import aequa.drawing.PrintSize;

/** Reads the project file's {@code site.print-width}: a column preset or a width such as "120 mm". */
final class PrintWidths {

    private static final Pattern MILLIMETRES = Pattern.compile("\\s*(\\d+(?:\\.\\d+)?)\\s*mm\\s*");

    private PrintWidths() {
    }

    static Optional<PrintSize> parse(String text) {
        Optional<PrintPreset> preset = PrintPreset.fromConfigName(text.trim().toLowerCase(Locale.ROOT));
        if (preset.isPresent()) {
            return Optional.of(PrintSize.of(preset.get()));
        }
        Matcher mm = MILLIMETRES.matcher(text);
        if (mm.matches()) {
            double widthMm = Double.parseDouble(mm.group(1));
            if (widthMm >= 20 && widthMm <= 1000) {
                return Optional.of(PrintSize.width(widthMm));
            }
        }
        return Optional.empty();
    }

    static String choices() {
        return String.join(", ", Arrays.stream(PrintPreset.values()).map(PrintPreset::configName).toList())
                + ", or a width from 20 to 1000 mm such as \"120 mm\"";
    }
}
