package aequa.findings;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * Every finding code in the code base has a fixture project ({@code src/test/resources/aequa/fixtures},
 * run by {@code aequa.cli.FixtureProjectsTest}) that produces it, and every fixture names a code of the code base.
 */
class FindingCatalogueTest {

    /**
     * A code given to a finding: the first text argument (after at most two plain names) of
     * Finding.error/warning/note, of new Finding, or of a helper that makes one ({@code error(findings, place, "code", ...)}).
     */
    private static final Pattern CODE_ARGUMENT = Pattern.compile(
            "\\b(?:error|warning|note|problem|keyTooLongFinding)\\((?:\\s*\\w+\\s*,){0,2}\\s*\"([a-z0-9]+(?:-[a-z0-9]+)+)\""
                    + "|new Finding\\([\\w.]+,\\s*\"([a-z0-9]+(?:-[a-z0-9]+)+)\"");
    /** A code chosen by a condition inside a Finding call: {@code Finding.error(x ? "a-b" : "c-d", ...)}. */
    private static final Pattern CODE_CHOICE = Pattern.compile(
            "Finding\\.(?:error|warning|note)\\([^,;]*\\?\\s*\"([a-z0-9]+(?:-[a-z0-9]+)+)\"\\s*:\\s*\"([a-z0-9]+(?:-[a-z0-9]+)+)\"");

    /** Every finding code written in the main code. */
    static Set<String> codesInCode() throws IOException {
        Set<String> codes = new TreeSet<>();
        try (Stream<Path> files = Files.walk(Path.of("generator/aequa"))) {
            for (Path file : files.filter(f -> f.toString().endsWith(".java")).toList()) {
                String source = Files.readString(file, StandardCharsets.UTF_8);
                for (Pattern pattern : new Pattern[] {CODE_ARGUMENT, CODE_CHOICE}) {
                    Matcher m = pattern.matcher(source);
                    while (m.find()) {
                        for (int g = 1; g <= m.groupCount(); g++) {
                            if (m.group(g) != null) {
                                codes.add(m.group(g));
                            }
                        }
                    }
                }
            }
        }
        return codes;
    }

    /** The code each fixture project must produce, by fixture name ("none" for a clean one). */
    static Map<String, String> fixtureCodes() throws IOException, URISyntaxException {
        Path folder = Path.of(FindingCatalogueTest.class.getResource("/aequa/fixtures").toURI());
        Map<String, String> codes = new TreeMap<>();
        try (Stream<Path> children = Files.list(folder)) {
            for (Path fixture : children.filter(Files::isDirectory).toList()) {
                codes.put(fixture.getFileName().toString(),
                        Files.readAllLines(fixture.resolve("expected-finding.txt"), StandardCharsets.UTF_8).get(0).trim());
            }
        }
        return codes;
    }

    @Test
    void theScanFindsCodesOfEveryForm() throws IOException {
        Set<String> codes = codesInCode();
        // one of each form the scan reads, checked by hand in the sources named
        assertTrue(codes.contains("project-file-missing"), "Finding.error (ProjectLoader)");
        assertTrue(codes.contains("join-missing-figure"), "new Finding(severity, ...) (FigureJoin)");
        assertTrue(codes.contains("region-key-wrong-type"), "a conditional code (GeoJsonRegionReader)");
        assertTrue(codes.contains("geojson-wrong-type"), "a helper, feature.problem (GeoJsonRegionReader)");
        assertTrue(codes.contains("project-unknown-reference"), "a helper, error(code...) (ProjectChecks)");
        assertTrue(codes.contains("insets-unknown-key"), "a helper, error(findings, place, code...) (CompositePlanner)");
        assertTrue(codes.size() > 100, "the scan reads the whole code base: " + codes.size());
    }

    @Test
    void everyCodeHasAFixture() throws IOException, URISyntaxException {
        Set<String> missing = new TreeSet<>(codesInCode());
        missing.removeAll(fixtureCodes().values());
        assertEquals(Set.of(), missing, "codes without a fixture project");
    }

    @Test
    void everyFixtureNamesACodeOfTheCodeBase() throws IOException, URISyntaxException {
        Set<String> inCode = codesInCode();
        fixtureCodes().forEach((fixture, code) ->
                assertTrue(code.equals("none") || inCode.contains(code), fixture + " expects an unknown code " + code));
    }
}
