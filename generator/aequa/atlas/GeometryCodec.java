package aequa.atlas;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;
import org.locationtech.jts.io.WKBWriter;

import aequa.findings.Finding;
import aequa.findings.Severity;
import aequa.inputs.CacheFile;
import aequa.inputs.regions.Region;
import aequa.planar.AreaAudit;
import aequa.planar.CoverageSimplification;
import aequa.projection.ChoiceReason;
import aequa.projection.DistortionSpread;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionFamily;
import aequa.projection.ProjectionParameter;

/**
 * The binary form of the geometry stage's results in the {@link GeometryCache}: doubles as their exact bits,
 * geometry as OGC well-known binary (2D, exact to the bit, the type kept: a Polygon stays a Polygon), text
 * length-prefixed UTF-8, lists and maps in their order. A result read back is equal to the one written, so
 * a site built from the cache is byte-identical to one built without it.
 */
final class GeometryCodec {

    private GeometryCodec() {
    }

    /** A region layer with the findings that reading, checking and measuring it produced. */
    record LayerWithFindings(RegionLayer layer, List<Finding> findings) {
    }

    static void writeLayer(DataOutputStream out, LayerWithFindings value) throws IOException {
        RegionLayer layer = value.layer();
        CacheFile.writeText(out, layer.sourceId());
        CacheFile.writeText(out, layer.file());
        out.writeInt(layer.regions().size());
        for (Region region : layer.regions()) {
            CacheFile.writeText(out, region.key());
            CacheFile.writeText(out, region.name());
            geometry(out, region.lonLat());
            out.writeInt(region.attributes().size());
            for (Map.Entry<String, String> a : region.attributes().entrySet()) {
                CacheFile.writeText(out, a.getKey());
                CacheFile.writeText(out, a.getValue());
            }
            out.writeDouble(layer.areaKm2ByKey().get(region.key()));
        }
        out.writeInt(layer.droppedWhy().size());
        for (Map.Entry<String, String> d : new java.util.TreeMap<>(layer.droppedWhy()).entrySet()) {
            CacheFile.writeText(out, d.getKey());
            CacheFile.writeText(out, d.getValue());
        }
        out.writeInt(value.findings().size());
        for (Finding f : value.findings()) {
            out.writeInt(f.severity().ordinal());
            for (String text : List.of(f.code(), f.file(), f.place(), f.message(), f.hint())) {
                CacheFile.writeText(out, text);
            }
        }
    }

    static LayerWithFindings readLayer(DataInputStream in) throws IOException {
        String sourceId = CacheFile.readText(in);
        String file = CacheFile.readText(in);
        int count = in.readInt();
        List<Region> regions = new ArrayList<>(Math.min(count, 1 << 16));
        Map<String, Double> areas = new LinkedHashMap<>();
        WKBReader wkb = new WKBReader();
        for (int i = 0; i < count; i++) {
            String key = CacheFile.readText(in);
            String name = CacheFile.readText(in);
            Geometry lonLat = geometry(in, wkb);
            int attributeCount = in.readInt();
            Map<String, String> attributes = new LinkedHashMap<>();
            for (int a = 0; a < attributeCount; a++) {
                attributes.put(CacheFile.readText(in), CacheFile.readText(in));
            }
            regions.add(new Region(key, name, lonLat, attributes));
            areas.put(key, in.readDouble());
        }
        int droppedCount = in.readInt();
        Map<String, String> dropped = new LinkedHashMap<>();
        for (int i = 0; i < droppedCount; i++) {
            dropped.put(CacheFile.readText(in), CacheFile.readText(in));
        }
        int findingCount = in.readInt();
        List<Finding> findings = new ArrayList<>();
        for (int i = 0; i < findingCount; i++) {
            Severity severity = Severity.values()[in.readInt()];
            findings.add(new Finding(severity, CacheFile.readText(in), CacheFile.readText(in), CacheFile.readText(in),
                    CacheFile.readText(in), CacheFile.readText(in)));
        }
        return new LayerWithFindings(new RegionLayer(sourceId, file, regions, areas, dropped), findings);
    }

    static void writePlanar(DataOutputStream out, PlanarLayer planar) throws IOException {
        out.writeInt(planar.simplifiedM().size());
        for (Map.Entry<String, Geometry> e : planar.simplifiedM().entrySet()) {
            CacheFile.writeText(out, e.getKey());
            geometry(out, e.getValue());
            out.writeDouble(planar.mapAreaRatio().get(e.getKey()));
        }
        out.writeDouble(planar.audit().maxRelativeError());
        CacheFile.writeText(out, planar.audit().worstKey());
        out.writeDouble(planar.audit().tolerance());
        writeTexts(out, planar.audit().clippedKeys());
        writeTexts(out, planar.audit().aroundPoleKeys());
        out.writeInt(planar.dropped().size());
        for (CoverageSimplification.DroppedPart part : planar.dropped()) {
            CacheFile.writeText(out, part.key());
            out.writeDouble(part.areaKm2());
            out.writeDouble(part.xM());
            out.writeDouble(part.yM());
        }
    }

    private static void writeTexts(DataOutputStream out, List<String> texts) throws IOException {
        out.writeInt(texts.size());
        for (String text : texts) {
            CacheFile.writeText(out, text);
        }
    }

    private static List<String> readTexts(DataInputStream in) throws IOException {
        int count = in.readInt();
        List<String> texts = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            texts.add(CacheFile.readText(in));
        }
        return texts;
    }

    static PlanarLayer readPlanar(DataInputStream in) throws IOException {
        int count = in.readInt();
        Map<String, Geometry> simplified = new LinkedHashMap<>();
        Map<String, Double> ratios = new LinkedHashMap<>();
        WKBReader wkb = new WKBReader();
        for (int i = 0; i < count; i++) {
            String key = CacheFile.readText(in);
            simplified.put(key, geometry(in, wkb));
            ratios.put(key, in.readDouble());
        }
        AreaAudit audit = new AreaAudit(in.readDouble(), CacheFile.readText(in), in.readDouble(), readTexts(in), readTexts(in));
        int droppedCount = in.readInt();
        List<CoverageSimplification.DroppedPart> dropped = new ArrayList<>();
        for (int i = 0; i < droppedCount; i++) {
            dropped.add(new CoverageSimplification.DroppedPart(CacheFile.readText(in), in.readDouble(), in.readDouble(),
                    in.readDouble()));
        }
        return new PlanarLayer(simplified, ratios, audit, dropped);
    }

    /**
     * The choice without its projection object, which {@link GeometryCache} rebuilds from the family and
     * parameters and checks against the stored WKT 2.
     */
    static void writeChoice(DataOutputStream out, ProjectionChoice choice) throws IOException {
        CacheFile.writeText(out, choice.projection().family().name());
        parameters(out, choice.projection().parameters());
        CacheFile.writeText(out, choice.projection().wkt2());
        out.writeDouble(choice.omegaMaxDeg());
        out.writeDouble(choice.omegaMeanDeg());
        out.writeDouble(choice.worstLonDeg());
        out.writeDouble(choice.worstLatDeg());
        out.writeInt(choice.runnersUp().size());
        for (ProjectionChoice.Candidate c : choice.runnersUp()) {
            CacheFile.writeText(out, c.family().name());
            parameters(out, c.parameters());
            out.writeDouble(c.omegaMaxDeg());
            out.writeDouble(c.omegaMeanDeg());
        }
        CacheFile.writeText(out, choice.why().basis().name());
        CacheFile.writeText(out, choice.why().setting().name());
        CacheFile.writeText(out, choice.why().comparison().name());
        DistortionSpread spread = choice.spread();
        out.writeDouble(spread.shareBelow1Deg());
        out.writeDouble(spread.shareBelow5Deg());
        out.writeDouble(spread.shareBelow10Deg());
        out.writeDouble(spread.omegaP95Deg());
        CacheFile.writeText(out, spread.worstPlace());
    }

    /** What {@link #writeChoice} wrote: the projection as family, parameters and WKT 2. */
    record StoredChoice(ProjectionFamily family, List<ProjectionParameter> parameters, String wkt2, double omegaMaxDeg,
                        double omegaMeanDeg, double worstLonDeg, double worstLatDeg,
                        List<ProjectionChoice.Candidate> runnersUp, ChoiceReason reason, DistortionSpread spread) {
    }

    static StoredChoice readChoice(DataInputStream in) throws IOException {
        ProjectionFamily family = ProjectionFamily.valueOf(CacheFile.readText(in));
        List<ProjectionParameter> parameters = parameters(in);
        String wkt2 = CacheFile.readText(in);
        double omegaMax = in.readDouble();
        double omegaMean = in.readDouble();
        double worstLon = in.readDouble();
        double worstLat = in.readDouble();
        int count = in.readInt();
        List<ProjectionChoice.Candidate> runnersUp = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            runnersUp.add(new ProjectionChoice.Candidate(ProjectionFamily.valueOf(CacheFile.readText(in)), parameters(in),
                    in.readDouble(), in.readDouble()));
        }
        ChoiceReason reason = new ChoiceReason(ChoiceReason.Basis.valueOf(CacheFile.readText(in)),
                ChoiceReason.Setting.valueOf(CacheFile.readText(in)), ChoiceReason.Comparison.valueOf(CacheFile.readText(in)));
        DistortionSpread spread = new DistortionSpread(in.readDouble(), in.readDouble(), in.readDouble(), in.readDouble(),
                CacheFile.readText(in));
        return new StoredChoice(family, parameters, wkt2, omegaMax, omegaMean, worstLon, worstLat, runnersUp, reason, spread);
    }

    private static void parameters(DataOutputStream out, List<ProjectionParameter> parameters) throws IOException {
        out.writeInt(parameters.size());
        for (ProjectionParameter p : parameters) {
            CacheFile.writeText(out, p.name());
            CacheFile.writeText(out, p.key());
            out.writeDouble(p.value());
            CacheFile.writeText(out, p.unit());
        }
    }

    private static List<ProjectionParameter> parameters(DataInputStream in) throws IOException {
        int count = in.readInt();
        List<ProjectionParameter> parameters = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            parameters.add(new ProjectionParameter(CacheFile.readText(in), CacheFile.readText(in), in.readDouble(),
                    CacheFile.readText(in)));
        }
        return parameters;
    }

    private static void geometry(DataOutputStream out, Geometry geometry) throws IOException {
        byte[] bytes = new WKBWriter(2).write(geometry);
        out.writeInt(bytes.length);
        out.write(bytes);
    }

    private static Geometry geometry(DataInputStream in, WKBReader wkb) throws IOException {
        int length = in.readInt();
        if (length < 0) {
            throw new IOException("negative geometry length");
        }
        try {
            return wkb.read(in.readNBytes(length));
        } catch (ParseException e) {
            throw new IOException("unreadable geometry", e);
        }
    }
}
