package aequa.fuzzing;

import java.nio.file.Path;


import com.code_intelligence.jazzer.junit.FuzzTest;

import aequa.findings.Findings;
import aequa.inputs.figures.FigureReaders;
import aequa.project.FigureSourceSpec;

/**
 * Any bytes as a CSV statistics file, in the wide and the long layout with the separator detected: a table
 * and findings, never an exception. Seeds in {@code CsvFiguresFuzzTestInputs/figures}.
 */
class CsvFiguresFuzzTest {

    private static final Path FOLDER = FuzzFolder.of("csv");
    private static final FigureSourceSpec WIDE = new FigureSourceSpec("figures.csv", null, "code", "wide", null,
            "year", null, null, null, null, null, null, null, null);
    private static final FigureSourceSpec LONG = new FigureSourceSpec("figures.csv", null, "code", "long", "indicator",
            "period", "value", null, ",", ".", null, null, null, "relaxed");

    @FuzzTest(maxDuration = FuzzLimits.CAMPAIGN)
    void figures(byte[] input) {
        FuzzFolder.withinSeconds(FuzzLimits.SECONDS_PER_INPUT, () -> {
            FuzzFolder.write(FOLDER, WIDE.file(), input);
            for (FigureSourceSpec spec : new FigureSourceSpec[] {WIDE, LONG}) {
                Findings findings = new Findings();
                FigureReaders.read(FOLDER, spec, findings);
                FuzzFolder.assertClear(findings, spec.file());
            }
        });
    }
}
