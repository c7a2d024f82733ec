package aequa.atlas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.index.strtree.STRtree;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.LoadedProject;
import aequa.project.ProjectLoader;
import aequa.testing.RealProject;

/**
 * Context for a county map: region names from a pattern of properties and state outlines dissolved from the
 * counties, on the US Census Bureau's 2017 counties (src/test/resources/geometry/SOURCE.md). FIPS 6-4 county
 * code 01003 is Baldwin County, Alabama, and 48201 Harris County, Texas (from memory; the file's own
 * {@code name} and {@code state} properties say the same).
 */
class ContextLayersTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private static MapModel counties;

    @BeforeAll
    static void load(@TempDir Path project) throws IOException {
        write(project, List.of(
                "regions:",
                "  counties: { file: regions/counties.geojson, key: id, name: \"{name}, {state}\" }",
                "figures:",
                "  counties: { file: figures/counties.csv, key: code }",
                "maps:",
                "  - { id: counties, regions: counties, figures: counties, indicator: code_number, measure: rate, outlines: state }"));
        Findings findings = new Findings();
        LoadedProject loaded = ProjectLoader.load(project, findings).orElseThrow(() -> new AssertionError(findings.list()));
        counties = AtlasLoader.load(loaded, LoadOptions.defaults(), findings).maps().get(0);
        assertTrue(!findings.hasErrors(), findings.list().toString());
    }

    @Test
    void regionsAreNamedByThePattern() {
        assertEquals("Baldwin, Alabama", region("01003").name());
        assertEquals("Harris, Texas", region("48201").name());
    }

    @Test
    void stateOutlinesRunAlongCountyBordersOnly() {
        Geometry outlines = counties.outlinesM();
        assertTrue(!outlines.isEmpty());
        STRtree index = new STRtree();
        double countyBordersM = 0;
        for (MapRegion r : counties.regions()) {
            Geometry boundary = r.planarM().getBoundary();
            countyBordersM += boundary.getLength();
            index.insert(boundary.getEnvelopeInternal(), boundary);
        }
        // every outline vertex is a vertex of a drawn county border (the outlines are dissolved from the counties)
        for (Coordinate c : outlines.getCoordinates()) {
            Geometry point = GEOMETRY.createPoint(c);
            boolean onBorder = index.query(point.getEnvelopeInternal()).stream()
                    .anyMatch(b -> ((Geometry) b).distance(point) < 1e-6);
            assertTrue(onBorder, "outline vertex " + c + " lies on no county border");
        }
        // state lines and coasts are a small share of all county borders (each counted once per county)
        assertTrue(outlines.getLength() < 0.5 * countyBordersM, outlines.getLength() + " of " + countyBordersM);
        // Alabama's counties share no outline inside the state: the border between Baldwin and Mobile counties
        // (across Mobile Bay, both 01xxx) is not drawn; the centroid of their shared border lies on no outline
        Geometry shared = region("01003").planarM().intersection(region("01097").planarM());
        assertTrue(!shared.isEmpty(), "Baldwin and Mobile counties are neighbours");
        assertTrue(outlines.distance(shared.getCentroid()) > 1, "an inner county border is left out");
    }

    @Test
    void anUnknownOutlinePropertyIsReportedAtItsLine(@TempDir Path project) throws IOException {
        write(project, List.of(
                "regions:",
                "  counties: { file: regions/counties.geojson, key: id, name: name }",
                "figures:",
                "  counties: { file: figures/counties.csv, key: code }",
                "maps:",
                "  - id: counties",
                "    regions: counties",
                "    figures: counties",
                "    indicator: code_number",
                "    measure: rate",
                "    insets: off",
                "    outlines: stat"));
        Findings findings = new Findings();
        LoadedProject loaded = ProjectLoader.load(project, findings).orElseThrow();
        assertTrue(AtlasLoader.load(loaded, LoadOptions.defaults(), findings).maps().isEmpty());
        Finding f = findings.list().stream().filter(x -> x.code().equals("outlines-unknown-property")).findFirst().orElseThrow();
        assertTrue(f.place().contains("12"), f.place());
        assertTrue(f.hint().contains("state") && f.hint().contains("state_fips"), f.hint());
    }

    @Test
    void aPatternNamingAnUnknownPropertyIsReported(@TempDir Path project) throws IOException {
        write(project, List.of(
                "regions:",
                "  counties: { file: regions/counties.geojson, key: id, name: \"{name}, {sate}\" }",
                "figures:",
                "  counties: { file: figures/counties.csv, key: code }",
                "maps:",
                "  - { id: counties, regions: counties, figures: counties, indicator: code_number, measure: rate, insets: off }"));
        Findings findings = new Findings();
        LoadedProject loaded = ProjectLoader.load(project, findings).orElseThrow();
        AtlasLoader.load(loaded, LoadOptions.defaults(), findings);
        Finding f = findings.list().stream().filter(x -> x.code().equals("name-pattern-unknown-property")).findFirst().orElseThrow();
        assertTrue(f.message().contains("'sate'"), f.message());
        assertEquals("regions/counties.geojson", f.file());
    }

    @Test
    void unpairedBracesAreAProjectFileError(@TempDir Path project) throws IOException {
        write(project, List.of(
                "regions:",
                "  counties: { file: regions/counties.geojson, key: id, name: \"{name, {state}\" }",
                "figures:",
                "  counties: { file: figures/counties.csv, key: code }",
                "maps:",
                "  - { id: counties, regions: counties, figures: counties, indicator: code_number, measure: rate }"));
        Findings findings = new Findings();
        ProjectLoader.load(project, findings);
        Finding f = findings.list().stream().filter(x -> x.code().equals("project-bad-name-pattern")).findFirst().orElseThrow();
        assertTrue(f.place().contains("2"), f.place());
    }

    private static MapRegion region(String key) {
        return counties.regions().stream().filter(r -> r.key().equals(key)).findFirst().orElseThrow();
    }

    private static void write(Path project, List<String> yaml) throws IOException {
        RealProject.in(project).regions("counties", "us-counties-2017.geojson")
                .figures("counties", "id", "code_number", RealProject.codeModulo("id", 97))
                .projectFile(yaml.toArray(String[]::new));
    }
}
