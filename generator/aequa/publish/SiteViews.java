package aequa.publish;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import com.fasterxml.jackson.databind.JsonNode;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;
import aequa.project.ClassMethod;
import aequa.pages.ChangesView;
import aequa.pages.IndexView;
import aequa.pages.MethodView;
import aequa.pages.NumberText;
import aequa.pages.SiteView;
import aequa.project.MapDisplay;
import aequa.project.MapSpec;
import aequa.project.Measure;
import aequa.project.Normalisation;
import aequa.project.SiteSpec;
import aequa.projection.ProjectionChoice;

/** Builds the views of the site-wide pages: index, methodology and changes. */
final class SiteViews {

    private SiteViews() {
    }

    static SiteView site(SiteSpec spec) {
        return new SiteView(spec.title(), spec.publisher(), spec.notice(), spec.language());
    }

    static IndexView index(Atlas atlas, List<MapFiles> files) {
        List<IndexView.Card> cards = new ArrayList<>();
        for (int i = 0; i < atlas.maps().size(); i++) {
            cards.add(MapViews.card(atlas.maps().get(i), files.get(i)));
        }
        return new IndexView(cards);
    }

    static MethodView method(Atlas atlas, List<MapFiles> files) {
        List<MethodView.MapMethod> sections = new ArrayList<>();
        for (int i = 0; i < atlas.maps().size(); i++) {
            MapModel map = atlas.maps().get(i);
            ProjectionChoice choice = map.projection();
            List<String> parameters = choice.projection().parameters().stream().map(MapViews::parameterText)
                    .collect(Collectors.toList());
            List<String> runnersUp = choice.runnersUp().stream()
                    .map(c -> c.family().displayName() + " (omega up to " + NumberText.fixed(c.omegaMaxDeg(), 2) + "°)")
                    .collect(Collectors.toList());
            List<String> limits = map.classification().limits().stream().map(NumberText::of).collect(Collectors.toList());
            sections.add(new MethodView.MapMethod(files.get(i).fileId(), map.spec().title(),
                    choice.projection().family().displayName(), choice.reason(), parameters,
                    NumberText.fixed(choice.omegaMaxDeg(), 2), NumberText.fixed(choice.omegaMeanDeg(), 2), runnersUp,
                    MapViews.percent(map.areaAudit().maxRelativeError()), map.areaAudit().worstKey(),
                    MapViews.percent(map.areaAudit().tolerance()), map.areaAudit().passed(),
                    methodName(map.classification().method()), limits, map.classification().counts(),
                    normalisation(map.spec()), map.spec().source(), map.spec().asOf(), map.notices(), files.get(i).page(),
                    MapViews.partSentences(map)));
        }
        return new MethodView(sections);
    }

    static String methodName(ClassMethod method) {
        return switch (method) {
            case QUANTILE -> "quantiles (about the same number of regions in each class)";
            case EQUAL_INTERVAL -> "equal intervals (classes of the same width)";
            case NATURAL_BREAKS -> "natural breaks (Fisher-Jenks: limits where the values are most spread apart)";
            case STANDARD_DEVIATION -> "standard deviations (classes measured from the mean)";
            case DIVERGING -> "diverging (classes on either side of a midpoint)";
            case MANUAL -> "limits chosen by the map's author";
            case UNCLASSED -> "unclassed (the colour follows the value continuously)";
        };
    }

    static String normalisation(MapSpec spec) {
        String times = spec.multiplier() == 1.0 ? "" : ", multiplied by " + NumberText.of(spec.multiplier());
        String sentence = switch (spec.normalise()) {
            case AREA -> "Each figure is divided by the region's area on the ellipsoid in km²" + times + ".";
            case COLUMN -> "Each figure is divided by " + spec.per() + times + ".";
            case NONE -> "The figures are mapped as given" + times + ".";
        };
        if (spec.measure() == Measure.COUNT && spec.normalise() == Normalisation.NONE && spec.display() == MapDisplay.CHOROPLETH) {
            sentence += " They are counts: larger regions tend to have larger counts, so compare with care.";
        }
        return sentence;
    }

    /** The changes page, from the {@code changes} section of report.json. */
    static ChangesView changes(JsonNode changes, List<String> currentIds, List<MapFiles> files) {
        String basis;
        if (changes.path("comparedWith").isNull() || changes.path("comparedWith").isMissingNode()) {
            basis = "This is the first edition of the site: there is nothing earlier to compare with.";
        } else {
            List<String> asOf = new ArrayList<>();
            changes.path("comparedWith").path("asOf").forEach(a -> asOf.add(a.asText()));
            String dates = asOf.stream().filter(a -> !a.isEmpty()).collect(Collectors.joining(", "));
            basis = "Compared with the previous edition whose figures differed"
                    + (dates.isEmpty() ? "." : " (figures for " + dates + ").");
        }
        List<ChangesView.MapChange> maps = new ArrayList<>();
        for (JsonNode m : changes.path("maps")) {
            String id = m.path("id").asText();
            int index = currentIds.indexOf(id);
            String href = index < 0 ? "" : files.get(index).page();
            List<ChangesView.ClassChange> moved = new ArrayList<>();
            m.path("classChanged").forEach(c -> moved.add(new ChangesView.ClassChange(c.path("key").asText(),
                    c.path("name").asText(), classText(c.path("from")), classText(c.path("to")))));
            List<ChangesView.ClassChange> edited = new ArrayList<>();
            m.path("valueChanged").forEach(c -> edited.add(new ChangesView.ClassChange(c.path("key").asText(),
                    c.path("name").asText(), figureText(c.path("from")), figureText(c.path("to")))));
            maps.add(new ChangesView.MapChange(index < 0 ? SafePaths.fileSafeId(id) : files.get(index).fileId(),
                    m.path("title").asText(), m.path("state").asText(), fromTo(m.path("asOf")),
                    projectionText(m.path("projection")), breaksText(m.path("breaks")), moved, edited,
                    texts(m.path("regionsAdded")), texts(m.path("regionsRemoved")), href, texts(m.path("parts"))));
        }
        return new ChangesView(basis, maps, changes.path("unchangedMaps").asInt());
    }

    private static String figureText(JsonNode figure) {
        return figure.isNumber() ? NumberText.of(figure.asDouble()) : "none";
    }

    private static String classText(JsonNode cls) {
        return cls.isNumber() ? cls.asText() : "none";
    }

    private static String fromTo(JsonNode pair) {
        return pair.isMissingNode() ? "" : pair.path("from").asText() + " → " + pair.path("to").asText();
    }

    private static String projectionText(JsonNode pair) {
        if (pair.isMissingNode()) {
            return "";
        }
        return projectionLine(pair.path("from")) + " → " + projectionLine(pair.path("to"));
    }

    private static String projectionLine(JsonNode p) {
        List<String> params = new ArrayList<>();
        p.path("parameters").forEach(x -> params.add(x.path("key").asText() + " " + NumberText.of(x.path("value").asDouble())));
        return p.path("family").asText() + (params.isEmpty() ? "" : " (" + String.join(", ", params) + ")");
    }

    private static String breaksText(JsonNode pair) {
        if (pair.isMissingNode()) {
            return "";
        }
        return limitsLine(pair.path("from")) + " → " + limitsLine(pair.path("to"));
    }

    private static String limitsLine(JsonNode limits) {
        List<String> parts = new ArrayList<>();
        limits.forEach(l -> parts.add(NumberText.of(l.asDouble())));
        return String.join(" | ", parts);
    }

    private static List<String> texts(JsonNode array) {
        List<String> out = new ArrayList<>();
        array.forEach(a -> out.add(a.asText()));
        return out;
    }
}
