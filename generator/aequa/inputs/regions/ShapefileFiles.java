package aequa.inputs.regions;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Enumeration;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;

/**
 * The member files of one Shapefile (ESRI Shapefile Technical Description, 1998: the main file {@code .shp},
 * the dBASE table {@code .dbf}; optionally {@code .prj} with the CRS and {@code .cpg} with the code page),
 * found beside a {@code .shp} or inside a {@code .zip}. Members are matched by base name, the extension in any
 * case. Streams are opened on demand and read once, so neither a loose file nor a zip member is held in memory
 * whole.
 */
final class ShapefileFiles {

    /** A member file: {@code .shp}, {@code .dbf}, {@code .prj} or {@code .cpg}. */
    enum Member {
        SHP, DBF, PRJ, CPG;

        String extension() {
            return "." + name().toLowerCase(Locale.ROOT);
        }
    }

    private final ZipFile zip;
    private final Map<Member, ZipEntry> entries;
    private final Map<Member, Path> loose;
    private final String baseName;

    private ShapefileFiles(ZipFile zip, Map<Member, ZipEntry> entries, Map<Member, Path> loose, String baseName) {
        this.zip = zip;
        this.entries = entries;
        this.loose = loose;
        this.baseName = baseName;
    }

    /** The member files beside {@code shp} (same folder, same base name). */
    static ShapefileFiles loose(Path shp) throws IOException {
        String fileName = shp.getFileName().toString();
        String base = fileName.substring(0, fileName.length() - ".shp".length());
        Map<Member, Path> found = new TreeMap<>();
        try (var siblings = Files.list(shp.toAbsolutePath().getParent())) {
            for (Path sibling : siblings.sorted().toList()) {
                String name = sibling.getFileName().toString();
                for (Member member : Member.values()) {
                    if (name.equalsIgnoreCase(base + member.extension()) && name.startsWith(base)) {
                        found.putIfAbsent(member, sibling);
                    }
                }
            }
        }
        found.put(Member.SHP, shp);
        return new ShapefileFiles(null, Map.of(), found, base);
    }

    /**
     * The Shapefiles inside a zip, by base name (folders inside the zip included in the name, as
     * {@code dir/counties}), sorted.
     */
    static List<String> layersIn(ZipFile zip) {
        List<String> layers = new ArrayList<>();
        Enumeration<? extends ZipEntry> all = zip.entries();
        while (all.hasMoreElements()) {
            String name = all.nextElement().getName();
            if (name.toLowerCase(Locale.ROOT).endsWith(".shp") && !name.startsWith("__MACOSX/")) {
                layers.add(name.substring(0, name.length() - 4));
            }
        }
        layers.sort(null);
        return layers;
    }

    /** The member files of the Shapefile {@code layer} (a name from {@link #layersIn}) inside {@code zip}. */
    static ShapefileFiles inZip(ZipFile zip, String layer) {
        Map<Member, ZipEntry> found = new TreeMap<>();
        Enumeration<? extends ZipEntry> all = zip.entries();
        while (all.hasMoreElements()) {
            ZipEntry entry = all.nextElement();
            for (Member member : Member.values()) {
                if (entry.getName().equalsIgnoreCase(layer + member.extension()) && entry.getName().startsWith(layer)) {
                    found.putIfAbsent(member, entry);
                }
            }
        }
        String base = layer.substring(layer.lastIndexOf('/') + 1);
        return new ShapefileFiles(zip, found, Map.of(), base);
    }

    boolean has(Member member) {
        return entries.containsKey(member) || loose.containsKey(member);
    }

    /** The member's name as the user would look for it: {@code counties.dbf}. */
    String name(Member member) {
        return baseName + member.extension();
    }

    /** Opens a member for streaming; the caller closes it. The member must exist ({@link #has}). */
    InputStream open(Member member) throws IOException {
        ZipEntry entry = entries.get(member);
        return entry != null ? zip.getInputStream(entry) : Files.newInputStream(loose.get(member));
    }

    /** A small text member ({@code .prj}, {@code .cpg}), trimmed; empty when absent. */
    Optional<String> text(Member member) throws IOException {
        if (!has(member)) {
            return Optional.empty();
        }
        try (InputStream in = open(member)) {
            // .prj and .cpg are ASCII by convention; ISO-8859-1 maps every byte, so nothing fails here
            return Optional.of(new String(in.readNBytes(1 << 16), StandardCharsets.ISO_8859_1).trim());
        }
    }
}
