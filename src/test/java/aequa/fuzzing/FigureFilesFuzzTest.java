package aequa.fuzzing;

import java.nio.file.Path;

import com.code_intelligence.jazzer.junit.FuzzTest;

import aequa.findings.Findings;
import aequa.inputs.figures.FigureReaders;
import aequa.project.FigureSourceSpec;
import aequa.project.KeyMatching;
import aequa.project.TableLayout;

/**
 * Any bytes as a statistics file, each read under two settings: CSV in the wide layout (separator
 * detected) and the long layout (relaxed keys), SQLite with a named table and with the only table. A table
 * and findings, never an exception. Seeds in {@code FigureFilesFuzzTestInputs/}.
 */
class FigureFilesFuzzTest {

    private static final Path FOLDER = FuzzFolder.of("figures");

    @FuzzTest(maxDuration = FuzzLimits.CAMPAIGN)
    void csv(byte[] input) {
        read(input, new FigureSourceSpec("figures.csv", null, "code", TableLayout.WIDE, null, "year", null, null, null, null,
                        null, null, null, null),
                new FigureSourceSpec("figures.csv", null, "code", TableLayout.LONG, "indicator", "period", "value", ",", ".", null,
                        null, null, null, KeyMatching.RELAXED));
    }

    @FuzzTest(maxDuration = FuzzLimits.CAMPAIGN)
    void sqlite(byte[] input) {
        read(input, new FigureSourceSpec("figures.sqlite", "rates", "code", TableLayout.WIDE, null, null, null, null, null, null,
                        null, null, null, null),
                new FigureSourceSpec("figures.sqlite", null, "code", TableLayout.LONG, "indicator", "period", "value", null, null,
                        null, null, null, null, null));
    }

    /** Writes the input once, as the first spec's file, and reads it under each spec (all name the same file). */
    private static void read(byte[] input, FigureSourceSpec... specs) {
        FuzzFolder.withinSeconds(FuzzLimits.SECONDS_PER_INPUT, () -> {
            FuzzFolder.write(FOLDER, specs[0].file(), input);
            for (FigureSourceSpec spec : specs) {
                Findings findings = new Findings();
                FigureReaders.read(FOLDER, spec, findings);
                FuzzFolder.assertClear(findings, spec.file());
            }
        });
    }
}
