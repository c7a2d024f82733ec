package aequa.drawing;

import java.util.List;

import aequa.atlas.MapModel;
import aequa.atlas.RegionValue;
import aequa.project.ClassMethod;
import aequa.colour.Rgb;
import aequa.statistics.FigureStatus;

/**
 * The fill and text colour of a region for one period. A region without a reported figure never gets a
 * ramp colour: no data, withheld (suppressed) and not applicable each have their own theme colour, and the
 * first two are also hatched (see {@link #hatching}), so they stay apart from every class in greyscale too.
 */
final class RegionFills {

    /** How a region without a class is marked. */
    /** Status patterns: single for no data, crossed for withheld, level lines for not applicable. */
    enum Hatch { NONE, SINGLE, CROSS, LEVEL }

    private final MapModel model;
    private final Theme theme;

    RegionFills(MapModel model, Theme theme) {
        this.model = model;
        this.theme = theme;
    }

    /** True when the value has a class colour. */
    static boolean classed(RegionValue value) {
        return value.status() == FigureStatus.REPORTED && value.classIndex() >= 0 && !Double.isNaN(value.normalisedValue());
    }

    /** The effective status: a reported value with nothing to classify is drawn as no data. */
    static FigureStatus status(RegionValue value) {
        return value.status() == FigureStatus.REPORTED && !classed(value) ? FigureStatus.NO_DATA : value.status();
    }

    Rgb fill(RegionValue value) {
        switch (status(value)) {
            case REPORTED:
                return classFill(value);
            case NOT_APPLICABLE:
                return theme.colours().notApplicable();
            default:
                return theme.colours().noData();
        }
    }

    static Hatch hatching(RegionValue value) {
        switch (status(value)) {
            case NO_DATA:
                return Hatch.SINGLE;
            case SUPPRESSED:
                return Hatch.CROSS;
            case NOT_APPLICABLE:
                // level lines keep it apart from a light class colour, such as a diverging ramp's middle
                return Hatch.LEVEL;
            default:
                return Hatch.NONE;
        }
    }

    /** The line directions that draw a pattern. */
    static List<Hatching.Direction> directions(Hatch hatch) {
        switch (hatch) {
            case SINGLE:
                return List.of(Hatching.Direction.RISING);
            case CROSS:
                return List.of(Hatching.Direction.RISING, Hatching.Direction.FALLING);
            case LEVEL:
                return List.of(Hatching.Direction.LEVEL);
            default:
                return List.of();
        }
    }

    /** The colour for type set on this region: the ramp's label colour for its class, else the theme's text. */
    Rgb text(RegionValue value) {
        if (!classed(value)) {
            return theme.colours().text();
        }
        List<Rgb> labels = model.ramp().labelColours();
        if (labels.isEmpty()) {
            return theme.colours().text();
        }
        int index = model.classification().method() == ClassMethod.UNCLASSED
                ? (int) Math.round(position(value.normalisedValue()) * (labels.size() - 1))
                : Math.min(value.classIndex(), labels.size() - 1);
        return labels.get(index);
    }

    private Rgb classFill(RegionValue value) {
        List<Rgb> fills = model.ramp().fills();
        if (model.classification().method() == ClassMethod.UNCLASSED) {
            return model.ramp().colourAt(position(value.normalisedValue()));
        }
        return fills.get(Math.min(value.classIndex(), fills.size() - 1));
    }

    /** Where {@code v} lies between the first and last class limit, 0 to 1. */
    double position(double v) {
        List<Double> limits = model.classification().limits();
        double low = limits.get(0);
        double high = limits.get(limits.size() - 1);
        if (!(high > low)) {
            return 0.5;
        }
        return Math.max(0, Math.min(1, (v - low) / (high - low)));
    }
}
