package aequa.inputs.regions;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.TreeSet;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.NamePattern;
import aequa.project.RegionSourceSpec;

/**
 * Names regions by the source's name pattern ({@link NamePattern}, for example {@code "{name}, {state}"}).
 * A property of the pattern that no region has is an error naming the properties the file does have; a
 * region lacking one of its properties keeps its key as its name, with one warning for all such regions.
 */
final class RegionNames {

    private RegionNames() {
    }

    /** The regions named by {@code spec.name()}, a pattern; a bad pattern leaves them as they are (the project check reports it). */
    static List<Region> named(List<Region> regions, RegionSourceSpec spec, Findings findings) {
        Optional<NamePattern> parsed = NamePattern.parse(spec.name());
        if (parsed.isEmpty() || regions.isEmpty()) {
            return regions;
        }
        NamePattern pattern = parsed.get();
        TreeSet<String> known = new TreeSet<>();
        regions.forEach(r -> known.addAll(r.attributes().keySet()));
        known.add(spec.key());
        List<String> unknown = pattern.properties().stream().filter(p -> !known.contains(p)).toList();
        if (!unknown.isEmpty()) {
            findings.add(Finding.error("name-pattern-unknown-property", spec.file(), "",
                    String.format(Locale.ROOT, "The name pattern \"%s\" names %s, which no region of the file has.",
                            spec.name(), String.join(" and ", unknown.stream().map(p -> "'" + p + "'").toList())),
                    "Properties of these regions: " + String.join(", ", known) + "."));
            return regions;
        }
        List<Region> named = new ArrayList<>(regions.size());
        List<String> unnamed = new ArrayList<>();
        for (Region r : regions) {
            Optional<String> name = pattern.apply(p -> p.equals(spec.key()) ? r.key() : r.attributes().get(p));
            if (name.isEmpty()) {
                unnamed.add(r.key());
            }
            named.add(r.withName(name.orElse(r.key())));
        }
        if (!unnamed.isEmpty()) {
            findings.add(Finding.warning("name-pattern-missing-property", spec.file(), "feature \"" + unnamed.get(0) + "\"",
                    String.format(Locale.ROOT, "%,d %s no value for a property of the name pattern \"%s\", so %s named by %s key.",
                            unnamed.size(), unnamed.size() == 1 ? "region has" : "regions have", spec.name(),
                            unnamed.size() == 1 ? "it is" : "they are", unnamed.size() == 1 ? "its" : "their"),
                    "Fill the property in the file, or write a pattern of properties every region has."));
        }
        return named;
    }
}
