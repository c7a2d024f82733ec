package aequa.inputs.regions;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.RegionSourceSpec;

/**
 * Front door of the region readers: picks the reader from the file's extension ({@code .geojson} or
 * {@code .json}: GeoJSON; {@code .topojson}, or {@code .json} with an {@code object} set: TopoJSON;
 * {@code .gpkg}: GeoPackage; {@code .shp} or {@code .zip}: Shapefile) and returns the regions in file order. Problems in the
 * file are added to {@code findings}; this never throws for bad data. The regions are as read: rings are
 * closed but otherwise unchecked; pass them to {@code aequa.ellipsoid.RegionValidator} next.
 */
public final class RegionReaders {

    private RegionReaders() {
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
        Path path = projectDir.resolve(spec.file());
        String file = spec.file();
        if (!Files.isRegularFile(path)) {
            findings.add(Finding.error("file-missing", file, "", "The geometry file does not exist.",
                    "Check the file name in the project file; paths are relative to the project folder."));
            return List.of();
        }
        String name = path.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".gpkg")) {
            return new GeoPackageRegionReader(file, spec, crs, findings).read(path);
        }
        if (name.endsWith(".shp") || name.endsWith(".zip")) {
            try {
                return new ShapefileRegionReader(file, spec, crs, findings).read(path);
            } catch (IOException e) {
                findings.add(Finding.error("file-unreadable", file, "", "The file could not be read: " + e.getMessage() + ".",
                        "Check that the file is readable."));
                return List.of();
            }
        }
        if (name.endsWith(".geojson") || name.endsWith(".json")) {
            try (InputStream in = new BufferedInputStream(Files.newInputStream(path), 1 << 16)) {
                return new GeoJsonRegionReader(file, spec, findings).read(in);
            } catch (IOException e) {
                findings.add(Finding.error("file-unreadable", file, "", "The file could not be read: " + e.getMessage() + ".",
                        "Check that the file is readable."));
                return List.of();
            }
        }
        findings.add(Finding.error("file-type-unknown", file, "",
                "aequa reads region geometry from GeoJSON (.geojson, .json), TopoJSON (.topojson, or .json with an 'object'),"
                        + " GeoPackage (.gpkg) or Shapefile (.shp, or a .zip holding one) files.",
                "Convert the file to one of these formats."));
        return List.of();
    }
}
