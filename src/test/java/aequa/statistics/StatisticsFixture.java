package aequa.statistics;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.figures.FigureReaders;
import aequa.inputs.figures.FigureTable;
import aequa.inputs.figures.SourceSpecBuilder;
import aequa.project.ChecksSpec;
import aequa.project.MapSpec;

/** A small project for statistics tests: a CSV written to a folder, regions with areas, one map. */
final class StatisticsFixture {

    final Findings findings = new Findings();
    final List<RegionArea> regions = new ArrayList<>();
    private final Path dir;
    private SourceSpecBuilder source = SourceSpecBuilder.file("figures.csv");
    private ChecksSpec checks = new ChecksSpec(null, null, null, null, null);

    StatisticsFixture(Path dir) {
        this.dir = dir;
    }

    StatisticsFixture csv(String text) {
        try {
            Files.writeString(dir.resolve("figures.csv"), text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return this;
    }

    StatisticsFixture source(SourceSpecBuilder spec) {
        this.source = spec;
        return this;
    }

    StatisticsFixture region(String key, double areaKm2) {
        regions.add(new RegionArea(key, areaKm2));
        return this;
    }

    StatisticsFixture checks(ChecksSpec value) {
        this.checks = value;
        return this;
    }

    MapFigures compute(MapSpec map) {
        FigureTable table = FigureReaders.read(dir, source.build(), findings);
        return MapStatistics.compute(map, table, regions, checks, findings);
    }

    /** The codes of the findings, in order. */
    List<String> codes() {
        return findings.list().stream().map(Finding::code).toList();
    }

    Finding only(String code) {
        List<Finding> matching = findings.list().stream().filter(f -> f.code().equals(code)).toList();
        if (matching.size() != 1) {
            throw new AssertionError("expected one " + code + " but findings are " + findings.list());
        }
        return matching.get(0);
    }
}
