package aequa.fuzzing;

import java.nio.file.Path;


import com.code_intelligence.jazzer.junit.FuzzTest;

import aequa.findings.Findings;
import aequa.inputs.figures.FigureReaders;
import aequa.project.FigureSourceSpec;

/**
 * Any bytes as a SQLite statistics database (a named table, and the only table): a table and findings,
 * never an exception. Seeds in {@code SqliteFiguresFuzzTestInputs/figures}.
 */
class SqliteFiguresFuzzTest {

    private static final Path FOLDER = FuzzFolder.of("sqlite");
    private static final FigureSourceSpec NAMED = new FigureSourceSpec("figures.sqlite", "rates", "code", "wide", null,
            null, null, null, null, null, null, null, null, null);
    private static final FigureSourceSpec ONLY = new FigureSourceSpec("figures.sqlite", null, "code", "long", "indicator",
            "period", "value", null, null, null, null, null, null, null);

    @FuzzTest(maxDuration = FuzzLimits.CAMPAIGN)
    void figures(byte[] input) {
        FuzzFolder.withinSeconds(FuzzLimits.SECONDS_PER_INPUT, () -> {
            FuzzFolder.write(FOLDER, NAMED.file(), input);
            for (FigureSourceSpec spec : new FigureSourceSpec[] {NAMED, ONLY}) {
                Findings findings = new Findings();
                FigureReaders.read(FOLDER, spec, findings);
                FuzzFolder.assertClear(findings, spec.file());
            }
        });
    }
}
