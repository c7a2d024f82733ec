package aequa.atlas;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import aequa.project.ClassMethod;
import aequa.classes.Classification;
import aequa.classes.Classified;
import aequa.classes.Classifier;
import aequa.colour.ColourRamp;
import aequa.colour.ColourRamps;
import aequa.colour.RampOutcome;
import aequa.colour.Rgb;
import aequa.findings.Findings;
import aequa.project.ClassesSpec;
import aequa.project.MapSpec;
import aequa.project.ProjectFile;
import aequa.statistics.FigureStatus;
import aequa.statistics.MapFigures;
import aequa.statistics.RegionFigure;

/**
 * Classes and colours for one map: classifies the reported values of all periods pooled (so small
 * multiples share one set of classes), generates the ramp, and classifies again when the ramp could only
 * pass its checks with fewer classes.
 *
 * @param classification the classes
 * @param ramp           their fills
 */
record ClassedFigures(Classification classification, ColourRamp ramp) {

    static Optional<ClassedFigures> of(MapSpec map, String mapPointer, MapFigures figures, Rgb background,
                                      boolean circles, Findings findings) {
        double[] pooled = figures.byRegion().values().stream().flatMap(List::stream)
                .filter(f -> f.status() == FigureStatus.REPORTED && Double.isFinite(f.normalisedValue()))
                .mapToDouble(RegionFigure::normalisedValue).toArray();
        ClassesSpec spec = circles ? new ClassesSpec(ClassMethod.UNCLASSED, 2, List.of(), null) : map.classes();
        String place = "map \"" + map.id() + "\"";
        Optional<Classification> classes = classify(pooled, spec, place, findings);
        if (classes.isEmpty()) {
            return Optional.empty();
        }
        int classCount = Math.max(2, classes.get().classCount());
        RampOutcome outcome = ColourRamps.generate(map.colours(), classCount, background,
                ProjectFile.FILE_NAME, place);
        outcome.findings().forEach(findings::add);
        ColourRamp ramp = outcome.ramp();
        Classification classification = classes.get();
        if (!circles && ramp.fills().size() < classification.classCount()) {
            ClassesSpec fewer = new ClassesSpec(spec.method(), ramp.fills().size(), spec.breaks(), spec.midpoint());
            classification = classify(pooled, fewer, place, findings).orElse(classification);
        }
        return Optional.of(new ClassedFigures(classification, ramp));
    }

    private static Optional<Classification> classify(double[] values, ClassesSpec spec, String place, Findings findings) {
        Classified classified = Classifier.classify(values, spec, ProjectFile.FILE_NAME, place);
        classified.findings().forEach(findings::add);
        return classified.classification();
    }

    /** The region's values per period, each with its class. */
    List<RegionValue> values(List<RegionFigure> figures) {
        List<RegionValue> values = new ArrayList<>(figures.size());
        for (RegionFigure f : figures) {
            int classIndex = f.status() == FigureStatus.REPORTED ? classification.classOf(f.normalisedValue()) : -1;
            values.add(new RegionValue(f.status(), f.value(), f.normalisedValue(), f.marginOfError(), f.unreliable(), classIndex));
        }
        return values;
    }
}
