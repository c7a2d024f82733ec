package aequa.drawing;

import java.util.List;
import java.util.Objects;
import java.util.regex.Pattern;

import aequa.colour.Rgb;

/**
 * How maps look: colours, fonts, type sizes, line weights and print limits, read from
 * {@code themes/<name>/theme.yaml} (see themes/README.md). The page stylesheet {@code site.css} beside it is the
 * publishing stage's business.
 * Class fills are not part of a theme: they come from the map's {@link aequa.colour.ColourRamp}.
 *
 * @param name        the theme's name (its folder name)
 * @param description one line saying what the theme is for
 * @param colours     the colours of everything that is not a class fill
 * @param fonts       the font stack
 * @param typePt      type sizes in points
 * @param lines       line weights
 * @param print       limits the print preflight applies
 */
public record Theme(String name, String description, Colours colours, Fonts fonts, TypeSizes typePt, Lines lines,
                    PrintLimits print) {

    public Theme {
        Objects.requireNonNull(name, "name");
        description = description == null ? "" : description;
        Objects.requireNonNull(colours, "colours");
        Objects.requireNonNull(fonts, "fonts");
        Objects.requireNonNull(typePt, "type-pt");
        Objects.requireNonNull(lines, "lines");
        Objects.requireNonNull(print, "print");
    }

    /**
     * @param background     page background
     * @param text           main text; never pure black in print themes
     * @param textMuted      secondary text (caption, credits)
     * @param border         lines between regions
     * @param outline        the outer edge of the mapped area
     * @param graticule      meridians and parallels
     * @param sea            the fill of the projected globe on world maps
     * @param noData         fill of regions without a figure
     * @param noDataHatch    pattern lines over no-data, withheld and not-applicable regions
     * @param notApplicable  fill of regions where the indicator does not apply
     * @param unreliableHatch hatch lines over unreliable values
     * @param land           fill of regions under proportional symbols
     * @param symbol         fill of proportional symbols
     * @param symbolEdge     edge of proportional symbols
     */
    public record Colours(Rgb background, Rgb text, Rgb textMuted, Rgb border, Rgb outline, Rgb graticule, Rgb sea,
                          Rgb noData, Rgb noDataHatch, Rgb notApplicable, Rgb unreliableHatch, Rgb land, Rgb symbol,
                          Rgb symbolEdge) {
        public Colours {
            for (Rgb c : new Rgb[]{background, text, textMuted, border, outline, graticule, sea, noData, noDataHatch,
                    notApplicable, unreliableHatch, land, symbol, symbolEdge}) {
                Objects.requireNonNull(c, "every colour of a theme must be given");
            }
        }
    }

    /**
     * @param family the font families in order of preference, ending with a generic family
     *               ({@code sans-serif}); written as the SVG/CSS font stack. Names may hold letters, digits,
     *               spaces and {@code - _ .} only, so they can be written into a style attribute safely.
     */
    public record Fonts(List<String> family) {
        private static final Pattern SAFE_NAME = Pattern.compile("[A-Za-z0-9 ._-]+");

        public Fonts {
            family = List.copyOf(family);
            if (family.isEmpty()) {
                throw new IllegalArgumentException("a font stack needs at least one family");
            }
            for (String f : family) {
                if (!SAFE_NAME.matcher(f).matches()) {
                    throw new IllegalArgumentException("font family names may hold letters, digits, spaces and - _ . only: " + f);
                }
            }
        }

        /** The CSS font-family value, for example {@code "Source Sans 3", "DejaVu Sans", sans-serif}. */
        public String cssStack() {
            StringBuilder stack = new StringBuilder();
            for (String f : family) {
                if (stack.length() > 0) {
                    stack.append(", ");
                }
                boolean generic = f.equals("sans-serif") || f.equals("serif") || f.equals("monospace");
                stack.append(generic ? f : '"' + f + '"');
            }
            return stack.toString();
        }
    }

    /**
     * Type sizes in points.
     *
     * @param title           map title
     * @param label           region labels
     * @param legend          legend text
     * @param caption         caption and credits
     * @param minimum         the smallest dark-on-light type the preflight accepts
     * @param minimumReversed the smallest light-on-dark type the preflight accepts (reversed type fills in
     *                        on press, so it needs to be larger; common practice)
     */
    public record TypeSizes(double title, double label, double legend, double caption, double minimum,
                            double minimumReversed) {
    }

    /** Line weights of the map's strokes. */
    public record Lines(LineWeight border, LineWeight outline, LineWeight graticule, LineWeight hatch,
                        LineWeight symbolEdge) {
        public Lines {
            for (LineWeight w : new LineWeight[]{border, outline, graticule, hatch, symbolEdge}) {
                Objects.requireNonNull(w, "every line weight of a theme must be given");
            }
        }
    }

    /**
     * @param inkLimitPercent the largest total ink coverage allowed for any fill or line colour
     * @param thinnestLinePt  the thinnest line allowed
     * @param greyMinDeltaL   the smallest CIE L* difference adjacent classes must keep in greyscale
     */
    public record PrintLimits(double inkLimitPercent, double thinnestLinePt, double greyMinDeltaL) {
    }
}
