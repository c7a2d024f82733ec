package aequa.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * Keeps the pipeline readable as a data flow: a stage's package may use the stages before it, never the
 * ones after it, and each third-party library stays in the one package that owns it (DEVELOPERS.md).
 */
class StageOrderTest {

    /** The stages in data-flow order; the index is the rank. */
    private static final List<String> STAGES = List.of("findings", "project", "inputs", "ellipsoid", "projection",
            "planar", "composite", "statistics", "classes", "colour", "wording", "atlas", "drawing", "pages", "publish", "cli");

    /** Libraries confined to one stage, or to one package of a stage (a reader's package: "inputs.regions"). */
    private static final Map<String, String> LIBRARY_OWNERS = Map.of(
            "org.apache.sis", "projection",
            "net.sf.geographiclib", "ellipsoid",
            "org.jfree", "drawing",
            "freemarker", "pages",
            "picocli", "cli",
            "com.linuxense.javadbf", "inputs.regions",
            "org.dhatim.fastexcel", "inputs.figures",
            "com.ibm.icu", "wording");

    private static final Pattern IMPORT = Pattern.compile("^import (?:static )?([\\w.]+)", Pattern.MULTILINE);
    private static final Pattern QUALIFIED_USE = Pattern.compile("\\baequa\\.(\\w+)\\.[A-Z]");

    @Test
    void stagesUseOnlyEarlierStagesAndOwnTheirLibraries() throws IOException {
        Path root = Path.of("generator/aequa");
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(root)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".java")).toList()) {
                Path relative = root.relativize(file);
                String stage = relative.getName(0).toString();
                String packageName = relative.getParent().toString().replace(java.io.File.separatorChar, '.');
                int rank = STAGES.indexOf(stage);
                assertTrue(rank >= 0, "package not in the stage list: " + stage + " (" + file + ")");
                String source = withoutComments(Files.readString(file));
                Matcher imports = IMPORT.matcher(source);
                while (imports.find()) {
                    check(file, stage, packageName, rank, imports.group(1), violations);
                }
                Matcher uses = QUALIFIED_USE.matcher(source);
                while (uses.find()) {
                    check(file, stage, packageName, rank, "aequa." + uses.group(1) + ".X", violations);
                }
            }
        }
        assertEquals(List.of(), violations);
    }

    /** Comments may name later stages (a Javadoc pointing to the next step); only code counts. */
    private static String withoutComments(String source) {
        return source.replaceAll("(?s)/\\*.*?\\*/", "").replaceAll("//[^\n]*", "");
    }

    private static void check(Path file, String stage, String packageName, int rank, String name, List<String> violations) {
        if (name.startsWith("aequa.")) {
            String used = name.split("\\.")[1];
            int usedRank = STAGES.indexOf(used);
            if (usedRank > rank) {
                violations.add(file + ": stage '" + stage + "' uses later stage '" + used + "'");
            }
        }
        LIBRARY_OWNERS.forEach((library, owner) -> {
            if (name.startsWith(library + ".") && !packageName.equals(owner) && !packageName.startsWith(owner + ".")) {
                violations.add(file + ": " + library + " belongs to '" + owner + "', used in '" + packageName + "'");
            }
        });
    }
}
