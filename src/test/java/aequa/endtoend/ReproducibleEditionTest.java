package aequa.endtoend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README's promise that an edition is byte-identical whatever the machine: the demo is published in
 * three JVMs that differ in time zone, locale, default character set, the absolute path and name of the
 * project and output folders, the working folder, and the order the project's files were created in
 * (which is the order some file systems list them in); every file of the three sites must be the same
 * bytes, the manifest and the hidden files included.
 *
 * <p>The first site is the one the other end-to-end tests share (this JVM's settings); the other two are
 * published at the same time in forked JVMs: Pacific/Kiritimati (UTC+14, the largest offset in use) with a
 * Turkish locale (whose dotted and dotless i break case mapping without {@code Locale.ROOT}) and the POSIX C
 * character set (so Java 17's default charset is ASCII, as under cron), and America/St_Johns (UTC-03:30, a
 * half-hour offset) with a German locale (decimal comma) in UTF-8. The demo publishes English, French and
 * Arabic, so every language's words and CLDR numbers are compared too: neither fork's locale may leak into
 * a decimal mark, a digit grouping or a plural form.
 */
class ReproducibleEditionTest {

    /** Generous: a cold publish of the demo (three languages) takes about 30 s on a quiet 2-core machine, two share it here. */
    private static final long PUBLISH_TIMEOUT_MINUTES = 15;

    @TempDir
    Path tmp;

    @Test
    void theDemoIsTheSameBytesInAnyZoneLocaleFolderAndFileOrder() throws Exception {
        Path shared = DemoSite.folder();
        Path demo = Path.of("data-demo").toAbsolutePath();

        Path kiritimatiProject = copyTree(demo, tmp.resolve("first").resolve("atlas"), Comparator.naturalOrder());
        Path stJohnsProject = copyTree(demo, tmp.resolve("second place").resolve("nested").resolve("project-b"),
                Comparator.reverseOrder());
        Path kiritimatiOut = tmp.resolve("first").resolve("site");
        Fork kiritimati = Fork.publish(kiritimatiProject.getParent(), "atlas", kiritimatiOut.toString(),
                "Pacific/Kiritimati", "tr", "TR", "C", tmp.resolve("kiritimati.log"));
        Path stJohnsOut = Files.createDirectories(tmp.resolve("elsewhere")).resolve("out-b");
        Fork stJohns = Fork.publish(stJohnsProject.getParent(), stJohnsProject.toString(), "../../elsewhere/out-b",
                "America/St_Johns", "de", "DE", "C.UTF-8", tmp.resolve("st-johns.log"));
        kiritimati.finish();
        stJohns.finish();

        Map<String, byte[]> expected = files(shared);
        assertTrue(expected.containsKey(".aequa-manifest.json") && expected.keySet().stream().anyMatch(f -> f.endsWith(".pdf")),
                "the comparison covers the manifest and the PDFs: " + expected.keySet());
        assertSameFiles(expected, files(kiritimatiOut), kiritimati.setting());
        assertSameFiles(expected, files(stJohnsOut), stJohns.setting());
    }

    /** {@code aequa publish} running in a JVM of its own. */
    private record Fork(Process process, Path log, String setting) {

        /**
         * Starts the publish in {@code workDir} with the given time zone (the JVM's and the TZ variable),
         * language and country, and C library locale (LC_ALL, which sets Java 17's default charset).
         */
        static Fork publish(Path workDir, String project, String out, String zone, String language, String country,
                            String cLocale, Path log) throws IOException {
            String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
            ProcessBuilder builder = new ProcessBuilder(java, "-Djava.awt.headless=true", "-Xmx1g", "-XX:+UseParallelGC",
                    "-Duser.timezone=" + zone, "-Duser.language=" + language, "-Duser.country=" + country,
                    "-cp", System.getProperty("java.class.path"), "aequa.cli.Main", "publish", project, "--out", out)
                    .directory(workDir.toFile())
                    .redirectErrorStream(true)
                    .redirectOutput(log.toFile());
            builder.environment().putAll(Map.of("TZ", zone, "LC_ALL", cLocale, "LANG", cLocale));
            return new Fork(builder.start(), log, zone + ", " + language + "_" + country + ", " + cLocale);
        }

        void finish() throws Exception {
            boolean ended = process.waitFor(PUBLISH_TIMEOUT_MINUTES, TimeUnit.MINUTES);
            if (!ended) {
                process.destroyForcibly().waitFor();
            }
            String printed = Files.readString(log, StandardCharsets.ISO_8859_1);
            assertTrue(ended, setting + ": the publish did not end within " + PUBLISH_TIMEOUT_MINUTES + " min:\n" + printed);
            assertEquals(0, process.exitValue(), setting + ":\n" + printed);
        }
    }

    private static void assertSameFiles(Map<String, byte[]> expected, Map<String, byte[]> actual, String setting) {
        assertEquals(expected.keySet(), actual.keySet(), setting + ": the same files");
        List<String> differing = new ArrayList<>();
        expected.forEach((name, bytes) -> {
            if (!Arrays.equals(bytes, actual.get(name))) {
                differing.add(name);
            }
        });
        assertEquals(List.of(), differing, setting + ": files whose bytes differ from this JVM's edition");
    }

    /** Every file under {@code root} by its '/'-separated relative name. */
    private static Map<String, byte[]> files(Path root) throws IOException {
        Map<String, byte[]> files = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path file : walk.filter(Files::isRegularFile).toList()) {
                files.put(root.relativize(file).toString().replace('\\', '/'), Files.readAllBytes(file));
            }
        }
        return files;
    }

    /** Copies a folder tree, creating the entries of each folder in the given order of their names. */
    private static Path copyTree(Path from, Path to, Comparator<String> order) throws IOException {
        Files.createDirectories(to);
        List<Path> entries;
        try (Stream<Path> list = Files.list(from)) {
            entries = list.sorted(Comparator.comparing(p -> p.getFileName().toString(), order)).toList();
        }
        for (Path entry : entries) {
            Path target = to.resolve(entry.getFileName().toString());
            if (Files.isDirectory(entry)) {
                copyTree(entry, target, order);
            } else {
                Files.copy(entry, target);
            }
        }
        return to;
    }
}
