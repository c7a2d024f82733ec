package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.findings.Severity;
import aequa.publish.CheckStep;
import aequa.publish.DrawingArtwork;
import aequa.publish.DrawingSettings;

/**
 * The fixture projects of {@code src/test/resources/aequa/fixtures} (its README says how one is made): each
 * produces the one finding code it names and no other error or warning, and {@code audit} and {@code publish} print the same errors
 * and warnings and exit with the same code, because both run the same check step. {@code publish} then draws
 * (step 2) and prints what the print preflight of its drawings found, which {@code audit}, drawing nothing,
 * cannot see: those lines follow the check step's, and a fixture may expect a code of the preflight.
 */
class FixtureProjectsTest {

    /** The folder of fixture projects, one sub-folder each. */
    static Path fixturesFolder() {
        try {
            return Path.of(FixtureProjectsTest.class.getResource("/aequa/fixtures").toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Every fixture folder, sorted by name. */
    static List<Path> fixtures() throws IOException {
        try (Stream<Path> children = Files.list(fixturesFolder())) {
            return children.filter(Files::isDirectory).sorted().toList();
        }
    }

    /** The code a fixture must produce, or "none". */
    static String expectedCode(Path fixture) throws IOException {
        return Files.readAllLines(fixture.resolve("expected-finding.txt"), StandardCharsets.UTF_8).get(0).trim();
    }

    /** The codes its {@code also:} lines name: findings that cannot help following from the fixture's one problem. */
    static Set<String> followingCodes(Path fixture) throws IOException {
        Set<String> codes = new TreeSet<>();
        for (String line : Files.readAllLines(fixture.resolve("expected-finding.txt"), StandardCharsets.UTF_8)) {
            if (line.startsWith("also: ")) {
                codes.add(line.substring("also: ".length()).trim());
            }
        }
        return codes;
    }

    @TestFactory
    Stream<DynamicTest> eachFixtureGivesItsOneFindingInAuditAndPublishAlike(@TempDir Path tmp) throws IOException {
        return fixtures().stream().map(fixture -> DynamicTest.dynamicTest(fixture.getFileName().toString(),
                () -> checkFixture(fixture, tmp.resolve(fixture.getFileName().toString()))));
    }

    private static void checkFixture(Path fixture, Path work) throws IOException {
        Path project = build(fixture, work.resolve("project"));
        Path site = work.resolve("site");
        String expected = expectedCode(fixture);

        CheckStep.Result checked = CheckStep.run(project, site);
        List<Finding> drawing = checked.outcome() == CheckStep.Outcome.CHECKED ? printPreflight(checked) : List.of();
        Set<String> loud = new TreeSet<>();
        Set<String> all = new TreeSet<>();
        for (Finding f : Stream.concat(checked.findings().list().stream(), drawing.stream()).toList()) {
            all.add(f.code());
            if (f.severity() != Severity.NOTE) {
                loud.add(f.code());
            }
        }
        boolean clean = expected.equals("none");
        assertTrue(clean || all.contains(expected), () -> fixture.getFileName() + " gives " + checked.findings().list() + drawing);
        // a fixture shows one problem: no error or warning but the expected one and the ones its also: lines
        // name as following from it (notes of other kinds may come)
        loud.removeAll(followingCodes(fixture));
        Set<String> wanted = clean || !loud.contains(expected) ? Set.of() : Set.of(expected);
        assertEquals(wanted, loud, () -> "errors and warnings of " + fixture.getFileName() + ": " + checked.findings().list() + drawing);

        Run audit = Run.of("audit", project.toString(), "--out", site.toString());
        Run publish = Run.of("publish", project.toString(), "--out", site.toString());
        assertEquals(audit.code, publish.code, () -> "exit codes differ:\naudit: " + audit.err + "\npublish: " + publish.err);
        List<String> drawingLines = drawing.stream().filter(f -> f.severity() != Severity.NOTE)
                .sorted(Comparator.comparing(Finding::severity)).map(Finding::toLine).toList();
        assertEquals(Stream.concat(audit.errorsAndWarnings().stream(), drawingLines.stream()).toList(), publish.errorsAndWarnings(),
                "publish prints audit's findings, then those of its drawings' print preflight");
        assertEquals(expected.equals("none") || checked.findings().count(Severity.ERROR) == 0,
                publish.code == ExitCode.OK.code, publish.err);
        assertEquals(publish.code == ExitCode.OK.code, Files.isRegularFile(site.resolve("index.html")),
                "a site is written exactly when publish succeeds");
    }

    /**
     * What step 2 of publish adds to the findings: the print preflight of each map's print drawing, drawn
     * with the project's drawing settings as publish draws it ({@link DrawingArtwork}).
     */
    private static List<Finding> printPreflight(CheckStep.Result checked) {
        DrawingSettings settings = CheckStep.readSettings(checked.project().orElseThrow(), new Findings()).orElseThrow();
        DrawingArtwork artwork = new DrawingArtwork(settings.theme(), settings.printTheme(), settings.printSize(), "fixture");
        checked.atlas().orElseThrow().maps().forEach(artwork::printSvg);
        return artwork.preflightFindings();
    }

    /** The starter project with the fixture's files copied over it and the paths of its remove.txt deleted. */
    static Path build(Path fixture, Path project) throws IOException {
        Files.createDirectories(project.getParent());
        StringWriter ignored = new StringWriter();
        assertEquals(0, Main.run(new String[] {"scaffold", project.toString()}, new PrintWriter(ignored), new PrintWriter(ignored)));
        try (Stream<Path> files = Files.walk(fixture)) {
            for (Path file : files.filter(Files::isRegularFile).sorted(Comparator.naturalOrder()).toList()) {
                String relative = fixture.relativize(file).toString();
                if (relative.equals("expected-finding.txt") || relative.equals("remove.txt")) {
                    continue;
                }
                Path target = project.resolve(relative);
                Files.createDirectories(target.getParent());
                Files.copy(file, target, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            }
        }
        Path remove = fixture.resolve("remove.txt");
        if (Files.isRegularFile(remove)) {
            for (String line : Files.readAllLines(remove, StandardCharsets.UTF_8)) {
                if (!line.isBlank()) {
                    assertTrue(Files.deleteIfExists(project.resolve(line.trim())), "remove.txt names a starter file: " + line);
                }
            }
        }
        return project;
    }

    /** One command's exit code and what it printed for the user. */
    private record Run(int code, String err) {

        static Run of(String... args) {
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
            return new Run(code, err.toString());
        }

        /** The error and warning lines, in order (audit also prints notes; publish also prints its outcome). */
        List<String> errorsAndWarnings() {
            List<String> lines = err.lines().filter(l -> l.startsWith("error: ") || l.startsWith("warning: ")).toList();
            assertFalse(lines.stream().anyMatch(l -> l.contains("more finding")), "a fixture stays below the per-kind limit");
            return lines;
        }
    }
}
