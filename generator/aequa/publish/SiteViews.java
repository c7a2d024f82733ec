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
import aequa.pages.SiteView;
import aequa.project.MapDisplay;
import aequa.project.MapSpec;
import aequa.project.Measure;
import aequa.project.Normalisation;
import aequa.project.SiteSpec;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionFamily;
import aequa.wording.NumberWriter;
import aequa.wording.ProjectionWords;
import aequa.wording.Wording;

/** Builds the views of the site-wide pages: index, methodology and changes, in one language. */
final class SiteViews {

    private SiteViews() {
    }

    static SiteView site(SiteSpec spec, Wording wording) {
        return new SiteView(spec.title(), spec.publisher(), spec.notice(), wording);
    }

    /** The site in {@code language}, with links to the same pages in every language (itself included). */
    static SiteView site(SiteSpec spec, SiteLanguage language, List<SiteLanguage> all) {
        if (all.size() < 2) {
            return site(spec, language.wording());
        }
        List<SiteView.Alternate> alternates = new ArrayList<>();
        for (SiteLanguage other : all) {
            alternates.add(new SiteView.Alternate(other.wording().language().tag(), other.wording().language().nativeName(),
                    language.toSiteRoot() + other.prefix(), other == language));
        }
        return new SiteView(spec.title(), spec.publisher(), spec.notice(), language.wording(), alternates, language.toSiteRoot());
    }

    static IndexView index(Atlas atlas, List<MapFiles> files, Wording w) {
        List<IndexView.Card> cards = new ArrayList<>();
        for (int i = 0; i < atlas.maps().size(); i++) {
            cards.add(MapViews.card(atlas.maps().get(i), files.get(i), w));
        }
        return new IndexView(cards);
    }

    static MethodView method(Atlas atlas, List<MapFiles> files, Wording w) {
        NumberWriter numbers = w.numbers();
        List<MethodView.MapMethod> sections = new ArrayList<>();
        for (int i = 0; i < atlas.maps().size(); i++) {
            MapModel map = atlas.maps().get(i);
            ProjectionChoice choice = map.projection();
            List<String> parameters = choice.projection().parameters().stream().map(p -> MapViews.parameterText(p, w))
                    .collect(Collectors.toList());
            String runnersUp = w.clauseList(choice.runnersUp().stream()
                    .map(c -> w.text("method.runnerUp", "family", ProjectionWords.family(c.family(), w),
                            "max", numbers.degrees(c.omegaMaxDeg(), 2)))
                    .toList());
            List<Double> limitValues = map.classification().limits();
            List<String> limits = limitValues.stream().map(l -> numbers.limit(l, limitValues)).collect(Collectors.toList());
            List<Integer> counts = map.classification().counts();
            List<String> classNumbers = new ArrayList<>();
            List<String> countTexts = new ArrayList<>();
            for (int c = 0; c < counts.size(); c++) {
                classNumbers.add(numbers.integer(c + 1L));
                countTexts.add(numbers.integer(counts.get(c)));
            }
            sections.add(new MethodView.MapMethod(files.get(i).fileId(), map.spec().title(),
                    ProjectionWords.familyWithAspect(choice, w), ProjectionWords.reason(choice, w), parameters,
                    numbers.degrees(choice.omegaMaxDeg(), 2), numbers.degrees(choice.omegaMeanDeg(), 2), runnersUp,
                    MapViews.errorPercent(map.areaAudit().maxRelativeError(), w), map.areaAudit().worstKey(),
                    MapViews.errorPercent(map.areaAudit().tolerance(), w), map.areaAudit().passed(),
                    methodName(map.classification().method(), w), limits, counts, classNumbers, countTexts,
                    normalisation(map.spec(), w), map.spec().source(), numbers.period(map.spec().asOf()), map.notices(),
                    files.get(i).page(), MapViews.partSentences(map, w)));
        }
        return new MethodView(sections);
    }

    static String methodName(ClassMethod method, Wording w) {
        return w.text(switch (method) {
            case QUANTILE -> "classMethod.quantile";
            case EQUAL_INTERVAL -> "classMethod.equalInterval";
            case NATURAL_BREAKS -> "classMethod.naturalBreaks";
            case STANDARD_DEVIATION -> "classMethod.standardDeviation";
            case DIVERGING -> "classMethod.diverging";
            case MANUAL -> "classMethod.manual";
            case UNCLASSED -> "classMethod.unclassed";
        });
    }

    static String normalisation(MapSpec spec, Wording w) {
        boolean times = spec.multiplier() != 1.0;
        String multiplier = w.numbers().significant(spec.multiplier());
        String sentence = switch (spec.normalise()) {
            case AREA -> times ? w.text("normalise.areaTimes", "multiplier", multiplier) : w.text("normalise.area");
            case COLUMN -> times ? w.text("normalise.columnTimes", "column", spec.per(), "multiplier", multiplier)
                    : w.text("normalise.column", "column", spec.per());
            case NONE -> times ? w.text("normalise.noneTimes", "multiplier", multiplier) : w.text("normalise.none");
        };
        if (spec.measure() == Measure.COUNT && spec.normalise() == Normalisation.NONE && spec.display() == MapDisplay.CHOROPLETH) {
            sentence += " " + w.text("normalise.countCaution");
        }
        return sentence;
    }

    /** The changes page, from the {@code changes} section of report.json. */
    static ChangesView changes(JsonNode changes, List<String> currentIds, List<MapFiles> files, Wording w) {
        NumberWriter numbers = w.numbers();
        String basis;
        if (changes.path("comparedWith").isNull() || changes.path("comparedWith").isMissingNode()) {
            basis = w.text("changes.firstEdition");
        } else {
            List<String> asOf = new ArrayList<>();
            changes.path("comparedWith").path("asOf").forEach(a -> asOf.add(numbers.period(a.asText())));
            String dates = asOf.stream().filter(a -> !a.isEmpty()).collect(Collectors.joining(", "));
            basis = dates.isEmpty() ? w.text("changes.comparedWith") : w.text("changes.comparedWithDates", "dates", dates);
        }
        List<ChangesView.MapChange> maps = new ArrayList<>();
        for (JsonNode m : changes.path("maps")) {
            String id = m.path("id").asText();
            int index = currentIds.indexOf(id);
            String href = index < 0 ? "" : files.get(index).page();
            List<ChangesView.ClassChange> moved = new ArrayList<>();
            m.path("classChanged").forEach(c -> moved.add(new ChangesView.ClassChange(c.path("key").asText(),
                    c.path("name").asText(), classText(c.path("from"), w), classText(c.path("to"), w))));
            List<ChangesView.ClassChange> edited = new ArrayList<>();
            m.path("valueChanged").forEach(c -> edited.add(new ChangesView.ClassChange(c.path("key").asText(),
                    c.path("name").asText(), figureText(c.path("from"), w), figureText(c.path("to"), w))));
            maps.add(new ChangesView.MapChange(index < 0 ? SafePaths.fileSafeId(id) : files.get(index).fileId(),
                    m.path("title").asText(), m.path("state").asText(), fromTo(m.path("asOf"), numbers),
                    projectionText(m.path("projection"), w), breaksText(m.path("breaks"), numbers), moved, edited,
                    texts(m.path("regionsAdded")), texts(m.path("regionsRemoved")), href, PartChangeWords.sentences(m.path("parts"), w)));
        }
        return new ChangesView(basis, maps, changes.path("unchangedMaps").asInt());
    }

    private static String figureText(JsonNode figure, Wording w) {
        return figure.isNumber() ? w.numbers().significant(figure.asDouble()) : w.text("changes.none");
    }

    private static String classText(JsonNode cls, Wording w) {
        return cls.isNumber() ? w.numbers().integer(cls.asLong()) : w.text("changes.none");
    }

    private static String fromTo(JsonNode pair, NumberWriter numbers) {
        return pair.isMissingNode() ? "" : numbers.period(pair.path("from").asText()) + " → " + numbers.period(pair.path("to").asText());
    }

    /**
     * A projection change from report.json (family by its configuration name, parameters by key, in degrees), in
     * the page's language: family and parameter names as the captions write them.
     */
    private static String projectionText(JsonNode pair, Wording w) {
        if (pair.isMissingNode()) {
            return "";
        }
        return projectionLine(pair.path("from"), w) + " → " + projectionLine(pair.path("to"), w);
    }

    private static String projectionLine(JsonNode p, Wording w) {
        String configName = p.path("family").asText();
        java.util.Optional<ProjectionFamily> family = ProjectionFamily.fromConfigName(configName);
        List<String> params = new ArrayList<>();
        p.path("parameters").forEach(x -> {
            String key = x.path("key").asText();
            String name = family.flatMap(f -> f.parameterName(key)).map(n -> ProjectionWords.parameter(n, w)).orElse(key);
            params.add(w.text("parameter.value", "name", name, "value", w.numbers().degrees(x.path("value").asDouble(), 4)));
        });
        String familyName = family.map(f -> ProjectionWords.family(f, w)).orElse(configName);
        return params.isEmpty() ? w.text("caption.projection", "family", familyName)
                : w.text("caption.projectionWithParameters", "family", familyName, "parameters", w.unitList(params));
    }

    private static String breaksText(JsonNode pair, NumberWriter numbers) {
        if (pair.isMissingNode()) {
            return "";
        }
        return limitsLine(pair.path("from"), numbers) + " → " + limitsLine(pair.path("to"), numbers);
    }

    private static String limitsLine(JsonNode limits, NumberWriter numbers) {
        List<String> parts = new ArrayList<>();
        limits.forEach(l -> parts.add(numbers.significant(l.asDouble())));
        return String.join(" | ", parts);
    }

    private static List<String> texts(JsonNode array) {
        List<String> out = new ArrayList<>();
        array.forEach(a -> out.add(a.asText()));
        return out;
    }
}
