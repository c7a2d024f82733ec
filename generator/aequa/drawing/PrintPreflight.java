package aequa.drawing;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import aequa.atlas.MapModel;
import aequa.colour.Rgb;
import aequa.colour.WcagContrast;
import aequa.findings.Finding;

/**
 * Checks a print drawing before it is written, from the {@link Inventory} recorded while it was painted:
 * <ul>
 *   <li>{@code print-type-too-small}: type below the theme's minimum, or below the larger minimum for
 *       reversed (light on dark) type, which fills in on press (common practice);</li>
 *   <li>{@code print-line-too-thin}: lines below the theme's thinnest line (0.25 pt in the bundled themes,
 *       common practice for rules that hold on press);</li>
 *   <li>{@code print-ink-too-heavy}: fill or line colours whose total ink in the naive CMYK separation
 *       ({@link ColourMeasures#naiveTotalInkPercent}) exceeds the theme's limit;</li>
 *   <li>{@code print-classes-grey}: adjacent class fills whose greyscale lightness (CIE L*) differs by less
 *       than the theme's minimum, so a greyscale print cannot tell them apart.</li>
 * </ul>
 * Findings are warnings: the file can still be written, but a desk should look first. Each problem is
 * reported once per distinct value and layer.
 */
public final class PrintPreflight {

    private PrintPreflight() {
    }

    /**
     * @param file the name the drawing will be written under, for the findings
     */
    public static List<Finding> check(MapModel model, Theme theme, DrawnMap drawing, String file) {
        List<Finding> findings = new ArrayList<>();
        Inventory inventory = drawing.inventory();
        Set<String> seen = new LinkedHashSet<>();
        for (Inventory.TextMark t : inventory.texts()) {
            boolean reversed = WcagContrast.relativeLuminance(t.colour()) > WcagContrast.relativeLuminance(t.background());
            double minimum = reversed ? theme.typePt().minimumReversed() : theme.typePt().minimum();
            // sizes are recorded to 1/100 of a page unit; allow that rounding
            if (t.sizePt() < minimum - 0.02 && seen.add("type|" + t.layer() + "|" + t.sizePt() + "|" + reversed)) {
                findings.add(Finding.warning("print-type-too-small", file, "layer " + t.layer(),
                        String.format(Locale.ROOT, "%s type is set at %.2f pt, below the theme's minimum of %.2f pt (for example \"%s\").",
                                reversed ? "Reversed (light on dark)" : "Dark on light", t.sizePt(), minimum, t.text()),
                        "Raise the type sizes in the theme, or draw at a wider print size."));
            }
        }
        for (Inventory.LineMark line : inventory.lines()) {
            if (line.widthPt() < theme.print().thinnestLinePt() - 1e-9 && seen.add("line|" + line.layer() + "|" + line.widthPt())) {
                findings.add(Finding.warning("print-line-too-thin", file, "layer " + line.layer(),
                        String.format(Locale.ROOT, "Lines of %.3f pt are thinner than %.2f pt and may break up on press.",
                                line.widthPt(), theme.print().thinnestLinePt()),
                        "Use the \"hairline\" weight (0.25 pt) or heavier in the theme."));
            }
        }
        List<Rgb> colours = new ArrayList<>();
        inventory.fills().forEach(f -> colours.add(f.colour()));
        inventory.lines().forEach(l -> colours.add(l.colour()));
        inventory.texts().forEach(t -> colours.add(t.colour()));
        for (Rgb colour : colours) {
            double ink = ColourMeasures.naiveTotalInkPercent(colour);
            if (ink > theme.print().inkLimitPercent() + 1e-9 && seen.add("ink|" + colour.hex())) {
                findings.add(Finding.warning("print-ink-too-heavy", file, "colour " + colour.hex(),
                        String.format(Locale.ROOT, "The colour %s needs about %.0f %% total ink, above the limit of %.0f %%.",
                                colour.hex(), ink, theme.print().inkLimitPercent()),
                        "Lighten the colour, or ask the desk for a separation with more black generation."));
            }
        }
        findings.addAll(greyClasses(model, theme, file));
        return findings;
    }

    private static List<Finding> greyClasses(MapModel model, Theme theme, String file) {
        List<Finding> findings = new ArrayList<>();
        List<Rgb> fills = model.ramp().fills();
        for (int i = 0; i + 1 < fills.size(); i++) {
            double delta = Math.abs(ColourMeasures.greyLightness(fills.get(i)) - ColourMeasures.greyLightness(fills.get(i + 1)));
            if (delta < theme.print().greyMinDeltaL()) {
                findings.add(Finding.warning("print-classes-grey", file, "classes " + (i + 1) + " and " + (i + 2),
                        String.format(Locale.ROOT, "In greyscale, classes %d (%s) and %d (%s) differ by only %.1f L* (minimum %.1f).",
                                i + 1, fills.get(i).hex(), i + 2, fills.get(i + 1).hex(), delta, theme.print().greyMinDeltaL()),
                        "Use fewer classes or a ramp with a wider lightness range for greyscale print."));
            }
        }
        return findings;
    }
}
