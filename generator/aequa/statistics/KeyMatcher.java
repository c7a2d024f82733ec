package aequa.statistics;

import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import aequa.project.KeyMatching;

/**
 * Finds the geometry region a statistics key belongs to: an exact match first; under
 * {@link KeyMatching#RELAXED}, else a match of the {@link RelaxedKey} forms, provided only one region has
 * that form (two regions "7" and "07" make the form "7" ambiguous, and it matches neither).
 */
final class KeyMatcher {

    /** A match, and whether it needed the relaxed form. */
    record Match(String regionKey, boolean relaxed) {
    }

    private final Set<String> regionKeys;
    private final Map<String, String> regionByRelaxedForm = new HashMap<>();
    private final Set<String> ambiguousForms = new HashSet<>();

    KeyMatcher(Collection<String> regionKeys) {
        this.regionKeys = Set.copyOf(regionKeys);
        for (String key : this.regionKeys) {
            String form = RelaxedKey.of(key);
            if (regionByRelaxedForm.putIfAbsent(form, key) != null) {
                ambiguousForms.add(form);
            }
        }
        ambiguousForms.forEach(regionByRelaxedForm::remove);
    }

    Optional<Match> match(String sourceKey, KeyMatching mode) {
        if (regionKeys.contains(sourceKey)) {
            return Optional.of(new Match(sourceKey, false));
        }
        if (mode == KeyMatching.RELAXED) {
            return relaxedCandidate(sourceKey).map(region -> new Match(region, true));
        }
        return Optional.empty();
    }

    /** The one region whose key has the same relaxed form as {@code sourceKey}, if there is exactly one. */
    Optional<String> relaxedCandidate(String sourceKey) {
        return Optional.ofNullable(regionByRelaxedForm.get(RelaxedKey.of(sourceKey)));
    }

    /** Whether several regions share the relaxed form of {@code sourceKey}. */
    boolean relaxedFormIsAmbiguous(String sourceKey) {
        return ambiguousForms.contains(RelaxedKey.of(sourceKey));
    }
}
