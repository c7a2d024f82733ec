package aequa.publish;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.function.Function;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import aequa.inputs.CacheFile;
import aequa.inputs.CacheFolder;
import aequa.inputs.CodeStamp;
import aequa.inputs.FileStamp;
import aequa.project.FigureSourceSpec;
import aequa.project.LoadedProject;
import aequa.project.ProjectFile;
import aequa.project.RegionSourceSpec;

/**
 * What the last successful publish of a project into one output folder was made from, kept in the
 * project's {@link CacheFolder}, so a rebuild with nothing changed is recognised before anything is loaded.
 *
 * <p>{@link #check} stamps every input ({@link FileStamp}: the project file, each geometry and statistics
 * file, the project's own {@code themes/} and {@code templates/} folders) and aequa's own code
 * ({@link CodeStamp}, which also covers the bundled themes and templates), and compares them, with the size
 * and time of every file now in the output folder, to the record. {@link #unchanged} is true only when all
 * of them match: then the output is exactly what a publish would leave, and nothing needs doing. Any
 * difference, a missing or damaged record, or an output folder edited by hand means a normal build.
 *
 * <p>The input stamps are taken before the build starts and recorded after it succeeds, so a file edited
 * while a build runs is seen as changed by the next run.
 */
public final class LastPublish {

    private static final String KIND = "last-publish";
    private static final int FORMAT = 1;

    private final Path recordFile;
    private final List<FileStamp> inputs;
    private final boolean unchanged;

    private LastPublish(Path recordFile, List<FileStamp> inputs, boolean unchanged) {
        this.recordFile = recordFile;
        this.inputs = List.copyOf(inputs);
        this.unchanged = unchanged;
    }

    /** Stamps the inputs of {@code project} now and compares them and {@code outDir} with the record. */
    public static LastPublish check(LoadedProject project, Path outDir) throws IOException {
        Path out = outDir.toAbsolutePath().normalize();
        Path recordFile = CacheFolder.of(project.dir()).resolve("publish-" + Sha256.of(
                out.toString().getBytes(java.nio.charset.StandardCharsets.UTF_8)).substring(0, 16) + ".bin");
        Optional<Record> previous = CacheFile.read(recordFile, KIND, FORMAT, LastPublish::readRecord)
                .filter(r -> r.code().equals(CodeStamp.current()) && r.output().equals(out.toString()));
        Map<String, FileStamp> before = previous.map(r -> r.inputs().stream()
                .collect(Collectors.toMap(FileStamp::name, Function.identity(), (a, b) -> a))).orElse(Map.of());
        List<FileStamp> now = new ArrayList<>();
        for (String name : inputNames(project)) {
            now.add(FileStamp.of(project.dir().resolve(name), name, Optional.ofNullable(before.get(name))));
        }
        boolean unchanged = previous.isPresent() && sameContent(previous.get().inputs(), now)
                && previous.get().outputFiles().equals(outputFiles(out));
        return new LastPublish(recordFile, now, unchanged);
    }

    /** True when the inputs, aequa and the output folder are exactly as the last publish left them. */
    public boolean unchanged() {
        return unchanged;
    }

    /**
     * Records a successful publish into {@code outDir} made from the inputs stamped by {@link #check}.
     * Silently does nothing when the cache folder cannot be written.
     */
    public void record(Path outDir) throws IOException {
        Path out = outDir.toAbsolutePath().normalize();
        Record record = new Record(CodeStamp.current(), out.toString(), inputs, outputFiles(out));
        CacheFile.write(recordFile, KIND, FORMAT, data -> writeRecord(data, record));
    }

    /** The project's input files, by their names relative to the project folder, sorted. */
    static TreeSet<String> inputNames(LoadedProject project) throws IOException {
        TreeSet<String> names = new TreeSet<>();
        names.add(ProjectFile.FILE_NAME);
        project.file().regions().values().stream().map(RegionSourceSpec::file).forEach(names::add);
        project.file().figures().values().stream().map(FigureSourceSpec::file).forEach(names::add);
        for (String folder : List.of("themes", "templates", "wording")) {
            Path dir = project.dir().resolve(folder);
            if (Files.isDirectory(dir)) {
                try (Stream<Path> files = Files.walk(dir)) {
                    files.filter(Files::isRegularFile)
                            .forEach(f -> names.add(project.dir().relativize(f).toString().replace('\\', '/')));
                }
            }
        }
        return names;
    }

    /** Size and modification time of every file in the output folder, by relative path; empty when absent. */
    private static Map<String, String> outputFiles(Path out) throws IOException {
        Map<String, String> files = new TreeMap<>();
        if (!Files.isDirectory(out)) {
            return files;
        }
        try (Stream<Path> walk = Files.walk(out)) {
            for (Path file : (Iterable<Path>) walk::iterator) {
                BasicFileAttributes a = Files.readAttributes(file, BasicFileAttributes.class);
                files.put(out.relativize(file).toString().replace('\\', '/'),
                        a.isDirectory() ? "folder" : a.size() + " " + a.lastModifiedTime().to(TimeUnit.NANOSECONDS));
            }
        }
        return files;
    }

    private static boolean sameContent(List<FileStamp> a, List<FileStamp> b) {
        if (a.size() != b.size()) {
            return false;
        }
        for (int i = 0; i < a.size(); i++) {
            if (!a.get(i).sameContent(b.get(i))) {
                return false;
            }
        }
        return true;
    }

    private record Record(String code, String output, List<FileStamp> inputs, Map<String, String> outputFiles) {
    }

    private static void writeRecord(DataOutputStream out, Record record) throws IOException {
        CacheFile.writeText(out, record.code());
        CacheFile.writeText(out, record.output());
        out.writeInt(record.inputs().size());
        for (FileStamp s : record.inputs()) {
            CacheFile.writeText(out, s.name());
            out.writeLong(s.sizeBytes());
            out.writeLong(s.modifiedNanos());
            CacheFile.writeText(out, s.sha256());
            out.writeBoolean(s.settled());
        }
        out.writeInt(record.outputFiles().size());
        for (Map.Entry<String, String> e : record.outputFiles().entrySet()) {
            CacheFile.writeText(out, e.getKey());
            CacheFile.writeText(out, e.getValue());
        }
    }

    private static Record readRecord(DataInputStream in) throws IOException {
        String code = CacheFile.readText(in);
        String output = CacheFile.readText(in);
        int count = in.readInt();
        List<FileStamp> inputs = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            inputs.add(new FileStamp(CacheFile.readText(in), in.readLong(), in.readLong(), CacheFile.readText(in),
                    in.readBoolean()));
        }
        int files = in.readInt();
        Map<String, String> outputFiles = new TreeMap<>();
        for (int i = 0; i < files; i++) {
            outputFiles.put(CacheFile.readText(in), CacheFile.readText(in));
        }
        return new Record(code, output, inputs, outputFiles);
    }
}
