package aequa.pages;

import java.util.List;

/**
 * What changed since the previous edition of the site with different figures.
 *
 * @param basis a sentence naming what this edition is compared with ("first edition" or the previous dates)
 * @param maps  one entry per map that was added, removed or changed; maps without change are left out
 * @param unchangedCount how many maps did not change
 */
public record ChangesView(String basis, List<MapChange> maps, int unchangedCount) {

    public ChangesView {
        maps = List.copyOf(maps);
    }

    /**
     * @param id             the map's id
     * @param title          the map's title
     * @param state          {@code added}, {@code removed} or {@code changed}
     * @param asOfChange     "from -> to" when the date of the figures changed, else empty
     * @param projectionChange "from -> to" when the projection changed, else empty
     * @param partChanges    one sentence per part added, removed or changed (composite maps), in the page's language
     * @param breaksChange   "from -> to" when the class limits moved, else empty
     * @param classChanges   regions whose class changed
     * @param valueChanges   regions whose figure changed within the same class (from and to are figures)
     * @param regionsAdded   keys of regions new in this edition
     * @param regionsRemoved keys of regions gone since the previous edition
     * @param pageHref       link to the map's page, or empty when the map was removed
     */
    public record MapChange(String id, String title, String state, String asOfChange, String projectionChange,
                            String breaksChange, List<ClassChange> classChanges, List<ClassChange> valueChanges,
                            List<String> regionsAdded, List<String> regionsRemoved, String pageHref,
                            List<String> partChanges) {
        public MapChange {
            partChanges = List.copyOf(partChanges);
            classChanges = List.copyOf(classChanges);
            valueChanges = List.copyOf(valueChanges);
            regionsAdded = List.copyOf(regionsAdded);
            regionsRemoved = List.copyOf(regionsRemoved);
        }
    }

    /**
     * @param key  the region's key
     * @param name the region's name
     * @param from the previous class (1 = lowest) or "none"
     * @param to   the class now, or "none"
     */
    public record ClassChange(String key, String name, String from, String to) {
    }
}
