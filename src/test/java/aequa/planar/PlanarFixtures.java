package aequa.planar;

import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

import aequa.ellipsoid.LonLatDensifier;
import aequa.ellipsoid.RegionValidator;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.project.RegionSourceSpec;

/** Loads the real boundary files of src/test/resources/geometry (see SOURCE.md there) the way the pipeline does. */
final class PlanarFixtures {

    private PlanarFixtures() {
    }

    /** Read, validate and densify to {@code stepDeg}. */
    static List<Region> load(String file, double stepDeg) {
        Findings findings = new Findings();
        List<Region> read = RegionReaders.read(Path.of("src/test/resources/geometry"), new RegionSourceSpec(file, "@id", "name", ""), findings);
        return RegionValidator.validate(read, file, findings).stream()
                .map(r -> new Region(r.key(), r.name(), LonLatDensifier.densify(r.lonLat(), stepDeg)))
                .collect(Collectors.toList());
    }
}
