package aequa.pages;

import java.util.List;

/**
 * The methodology page, written from the choices actually made for each map. Numbers are formatted.
 *
 * @param maps one section per map, in project-file order
 */
public record MethodView(List<MapMethod> maps) {

    public MethodView {
        maps = List.copyOf(maps);
    }

    /**
     * @param id               the map's file-safe id
     * @param title            the map's title
     * @param projectionName   the projection family's name (with its aspect) in the page's language
     * @param reason           why it was chosen, in the page's language
     * @param parameters       its parameters as "name: value unit"
     * @param omegaMaxDeg      largest angular distortion over the data, formatted
     * @param omegaMeanDeg     area-weighted mean angular distortion, formatted
     * @param runnersUp        the best other candidates, as "name (max omega)", joined as the language
     *                         separates clauses ("; ", French " ; ", Arabic "؛ "); empty when there are none
     * @param areaErrorPercent the largest relative area error found by the audit, in percent, formatted
     * @param areaWorstKey     the region where it occurs
     * @param areaTolerancePercent the tolerance, in percent, formatted
     * @param areaPassed       whether the audit passed
     * @param classMethod      the classification method's name
     * @param limits           the class limits, formatted, ascending
     * @param counts           regions per class
     * @param classNumbers     the class numbers (1 = lowest) in the page's digits
     * @param countTexts       the counts in the page's digits
     * @param normalisation    a sentence saying what the value was divided by
     * @param source           the credit for the figures
     * @param asOf             the date the figures refer to
     * @param checkNotes       what the checks of the data found for this map (figures that matched no region,
     *                         islands too small to draw), for the author and careful readers: aequa's findings,
     *                         which are written in English only (the page says so in its own language)
     * @param mapHref          link to the map's page, relative to the site root
     * @param parts            for a composite map, one sentence per part (regions, projection, omega, area
     *                         scale and check); empty for a map on one projection
     */
    public record MapMethod(String id, String title, String projectionName, String reason, List<String> parameters,
                            String omegaMaxDeg, String omegaMeanDeg, String runnersUp, String areaErrorPercent,
                            String areaWorstKey, String areaTolerancePercent, boolean areaPassed, String classMethod,
                            List<String> limits, List<Integer> counts,
                            List<String> classNumbers, List<String> countTexts, String normalisation, String source,
                            String asOf, List<String> checkNotes, String mapHref, List<String> parts) {
        public MapMethod {
            parameters = List.copyOf(parameters);
            limits = List.copyOf(limits);
            counts = List.copyOf(counts);
            checkNotes = List.copyOf(checkNotes);
            parts = List.copyOf(parts);
        }
    }
}
