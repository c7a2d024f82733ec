package aequa.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import aequa.composite.PartPlan;
import aequa.ellipsoid.RegionValidator;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.project.RegionSourceSpec;
import aequa.projection.Footprint;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionChooser;
import aequa.projection.ProjectionRequest;
import aequa.projection.SourceCrs;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** Says which equal-area projection aequa would choose for the extent of a geometry file, and why. */
@Command(name = "explain", mixinStandardHelpOptions = true,
        description = "Say which equal-area projection aequa would choose for the regions in GEOMETRY_FILE, and why; "
                + "and, when some regions lie far from the rest, the parts a map of them is drawn in (insets: auto).")
final class ExplainCommand implements Callable<Integer> {

    @Parameters(paramLabel = "GEOMETRY_FILE", description = "A GeoJSON (.geojson, .json) or GeoPackage (.gpkg) file of regions.")
    Path file;

    @Option(names = "--layer", description = "The GeoPackage layer, when the file has several.")
    String layer;

    @Option(names = "--json", description = "Print the choice as JSON (family, parameters, wkt2, omega, runners-up, reason).")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws JsonProcessingException {
        var err = spec.commandLine().getErr();
        if (!Files.isRegularFile(file)) {
            err.println("aequa: " + file + " is not a file. Name a file of regions: " + RegionSourceSpec.FILE_TYPES_IN_WORDS + ".");
            return ExitCode.USAGE.code;
        }
        if (!RegionSourceSpec.isGeometryFile(file.getFileName().toString())) {
            err.println("aequa: " + file + " is not a file type aequa reads regions from. Name a "
                    + RegionSourceSpec.FILE_TYPES_IN_WORDS + " file.");
            return ExitCode.USAGE.code;
        }
        Path absolute = file.toAbsolutePath().normalize();
        Findings findings = new Findings();
        RegionSourceSpec source = new RegionSourceSpec(absolute.getFileName().toString(), RegionSourceSpec.FEATURE_ID, "", layer);
        List<Region> read = RegionReaders.read(absolute.getParent(), source, SourceCrs::toLonLat, findings);
        List<Region> regions = RegionValidator.validate(read, source.file(), findings);
        FindingsPrinter.print(findings.list(), err, false, FindingsPrinter.SHOWN_PER_KIND,
                "; `aequa audit` of a project that reads this file lists every one");
        if (regions.isEmpty()) {
            err.println("aequa: " + file + " holds no usable regions, so there is no extent to fit a projection to.");
            return ExitCode.DATA_PROBLEMS.code;
        }
        PartsReport.Parts report = PartsReport.plan(source.file(), regions, findings);
        List<PartPlan> parts = report.plans();
        // one part is the whole extent with the automatic request: its choice is the one asked for here
        ProjectionChoice choice = parts.size() == 1 ? parts.get(0).choice()
                : ProjectionChooser.choose(Footprint.of(regions.stream().map(Region::lonLat).toList()),
                        ProjectionRequest.automatic());
        var out = spec.commandLine().getOut();
        if (json) {
            ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            Map<String, Object> root = ChoiceReport.json(file.toString(), regions.size(), choice);
            root.put("parts", PartsReport.json(report));
            out.println(mapper.writeValueAsString(root));
        } else {
            if (parts.size() > 1) {
                // what publish draws comes first: the composite map; then the single projection insets: off would use
                out.println(file + " is drawn as a composite map:");
                out.print(PartsReport.text(report));
                out.println("With insets: off, one projection would have to fit the whole extent:");
                out.print(ChoiceReport.text(file.toString(), regions.size(), choice));
            } else {
                out.print(ChoiceReport.text(file.toString(), regions.size(), choice));
                out.print(PartsReport.text(report));
            }
        }
        return findings.hasErrors() ? ExitCode.DATA_PROBLEMS.code : ExitCode.OK.code;
    }
}
