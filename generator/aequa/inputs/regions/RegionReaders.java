package aequa.inputs.regions;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.NamePattern;
import aequa.project.RegionSourceSpec;

/**
 * Front door of the region readers: picks the reader from the file's extension ({@code .geojson} or
 * {@code .json}: GeoJSON; {@code .topojson}, or {@code .json} with an {@code object} set: TopoJSON;
 * {@code .gpkg}: GeoPackage; {@code .shp} or {@code .zip}: Shapefile) and returns the regions in file order. Problems in the
 * file are added to {@code findings}; this never throws for bad data. The regions are as read: rings are
 * closed but otherwise unchecked; pass them to {@code aequa.ellipsoid.RegionValidator} next.
 *
 * <p>Every caller checks the file's type against {@link RegionSourceSpec#FILE_TYPES} first (a project's checks
 * report another type with its line, {@code aequa explain} refuses it as a usage error), so a file of another
 * type here is a programming error. A file that cannot be opened or decoded is reported ({@code file-unreadable}).
 */
public final class RegionReaders {

    private static final Pattern TOPOLOGY_TYPE = Pattern.compile("\"type\"\\s*:\\s*\"Topology\"");

    private RegionReaders() {
    }

    /**
     * The regions of a source, and whether their borders are shared by construction: a clean TopoJSON topology
     * draws each border once, as one arc walked by both neighbours, so they cannot overlap or leave a gap.
     */
    public record RegionSource(List<Region> regions, boolean bordersShared) {

        public RegionSource {
            regions = List.copyOf(regions);
        }

        static RegionSource of(List<Region> regions) {
            return new RegionSource(regions, false);
        }
    }

    /** Reads a source whose layers are all in WGS 84 lon/lat; other CRSs are reported as unsupported. */
    public static List<Region> read(Path projectDir, RegionSourceSpec spec, Findings findings) {
        return read(projectDir, spec, SourceCrsResolver.NONE, findings);
    }

    /**
     * Reads a source, transforming GeoPackage layers and Shapefiles in another CRS with {@code crs}
     * (pass {@code aequa.projection.SourceCrs::toLonLat}).
     */
    public static List<Region> read(Path projectDir, RegionSourceSpec spec, SourceCrsResolver crs, Findings findings) {
        return readSource(projectDir, spec, crs, findings).regions();
    }

    /** As {@link #read(Path, RegionSourceSpec, SourceCrsResolver, Findings)}, saying whether borders are shared. */
    public static RegionSource readSource(Path projectDir, RegionSourceSpec spec, SourceCrsResolver crs, Findings findings) {
        if (NamePattern.isPattern(spec.name())) {
            RegionSourceSpec unnamed = new RegionSourceSpec(spec.file(), spec.key(), "", spec.layer(), spec.object(), spec.insets());
            RegionSource read = readFile(projectDir, unnamed, crs, findings);
            return new RegionSource(RegionNames.named(read.regions(), spec, findings), read.bordersShared());
        }
        return readFile(projectDir, spec, crs, findings);
    }

    private static RegionSource readFile(Path projectDir, RegionSourceSpec spec, SourceCrsResolver crs, Findings findings) {
        Path path = projectDir.resolve(spec.file());
        String file = spec.file();
        String name = path.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".gpkg")) {
            return RegionSource.of(new GeoPackageRegionReader(file, spec, crs, findings).read(path));
        }
        if (name.endsWith(".shp") || name.endsWith(".zip")) {
            try {
                return RegionSource.of(new ShapefileRegionReader(file, spec, crs, findings).read(path));
            } catch (IOException e) {
                return unreadable(file, e, findings);
            }
        }
        if (name.endsWith(".topojson") || name.endsWith(".json") && (!spec.object().isEmpty() || looksLikeTopology(path))) {
            try (InputStream in = new BufferedInputStream(Files.newInputStream(path), 1 << 16)) {
                return new TopoJsonRegionReader(file, spec, findings).read(in);
            } catch (IOException e) {
                return unreadable(file, e, findings);
            }
        }
        if (name.endsWith(".geojson") || name.endsWith(".json")) {
            try (InputStream in = new BufferedInputStream(Files.newInputStream(path), 1 << 16)) {
                return RegionSource.of(new GeoJsonRegionReader(file, spec, findings).read(in));
            } catch (IOException e) {
                return unreadable(file, e, findings);
            }
        }
        throw new IllegalArgumentException(file + " is not one of " + RegionSourceSpec.FILE_TYPES
                + ": the project's checks and explain refuse it before reading");
    }

    private static RegionSource unreadable(String file, IOException e, Findings findings) {
        findings.add(Finding.error("file-unreadable", file, "", "The file could not be read: " + e.getMessage() + ".",
                "Check that the file is readable."));
        return RegionSource.of(List.of());
    }

    /**
     * Whether a {@code .json} file's first 4 KiB declare a TopoJSON topology ({@code "type": "Topology"}); false
     * when it cannot be read, for the GeoJSON reader to report.
     */
    private static boolean looksLikeTopology(Path path) {
        try (InputStream in = Files.newInputStream(path)) {
            String start = new String(in.readNBytes(4096), StandardCharsets.UTF_8);
            return TOPOLOGY_TYPE.matcher(start).find();
        } catch (IOException e) {
            return false;
        }
    }
}
