package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.wording.Language;
import aequa.wording.Wording;

/** The changes page's part sentences follow the page's language, numbers included; older reports' text is kept. */
class PartChangeWordsTest {

    private static final String CHANGES = """
            [ {"name": "Isles", "change": "changed", "family": "lambert-azimuthal",
               "parameters": [ {"key": "centre-lon", "name": "Longitude of natural origin", "unit": "deg", "from": 20.5, "to": 25} ]},
              {"name": "Reef", "change": "changed", "areaScale": {"from": 1, "to": 0.25}, "regions": {"from": 3, "to": 2}},
              {"name": "Cape", "change": "removed"},
              "Part added: Old sentence." ]""";

    @Test
    void frenchSentencesNameWhatChanged() throws Exception {
        JsonNode changes = new ObjectMapper().readTree(CHANGES);
        List<String> said = PartChangeWords.sentences(changes, Wording.of(new Language("fr")));
        assertEquals(List.of(
                "Partie Isles : même projection (azimutale équivalente de Lambert), autres paramètres : "
                        + "Longitude de l'origine 20,5° → 25°.",
                "Partie Reef : désormais 2 régions (auparavant : 3) et échelle de superficie désormais 0,25 × celle de la "
                        + "carte principale (auparavant : 1 ×).",
                "Partie retirée : Cape.",
                "Part added: Old sentence."), said);
    }

    @Test
    void arabicCountsTakeTheDualForm() throws Exception {
        JsonNode changes = new ObjectMapper().readTree(CHANGES);
        String reef = PartChangeWords.sentences(changes, Wording.of(new Language("ar"))).get(1);
        // CLDR Arabic plural rules: 2 is the "two" category (dual), written as a word, not "# منطقة"
        assertEquals(true, reef.contains("الآن منطقتان"), reef);
    }
}
