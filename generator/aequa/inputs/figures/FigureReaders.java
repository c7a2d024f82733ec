package aequa.inputs.figures;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Set;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.FigureSourceSpec;

/**
 * The front door of the statistics readers: reads one statistics source of a project into a
 * {@link FigureTable}. Delimited text ({@code .csv}, {@code .tsv}, {@code .txt}), workbooks ({@code .xlsx},
 * {@code .xlsm}) and SQLite databases ({@code .sqlite}, {@code .sqlite3}, {@code .db}, {@code .gpkg}) are read;
 * the kind is told by the file extension.
 *
 * <p>Rows in findings and cells count records as a spreadsheet shows them (the header is row 1, blank
 * lines count); workbook rows are the spreadsheet's own row numbers; database rows count result rows from 1.
 *
 * <p>Every problem in the project settings or the data is added to {@code findings} (with file, row and
 * column) and reading goes on where it can; a source that cannot be read gives an empty table. Only an
 * I/O failure on a file that exists (a disk error) is thrown, as {@link UncheckedIOException}.
 */
public final class FigureReaders {

    private static final Set<String> TEXT_EXTENSIONS = Set.of("csv", "tsv", "txt");
    private static final Set<String> DATABASE_EXTENSIONS = Set.of("sqlite", "sqlite3", "db", "gpkg");
    private static final Set<String> WORKBOOK_EXTENSIONS = Set.of("xlsx", "xlsm");

    private FigureReaders() {
    }

    /**
     * @param projectDir the project folder; {@code spec.file()} is resolved against it
     * @param spec       the statistics source as the project file describes it
     * @param findings   receives every problem found
     */
    public static FigureTable read(Path projectDir, FigureSourceSpec spec, Findings findings) {
        FigureSourceSettings settings = FigureSourceSettings.parse(spec, findings);
        return read(projectDir, settings, findings);
    }

    private static FigureTable read(Path projectDir, FigureSourceSettings settings, Findings findings) {
        Path path = projectDir.resolve(settings.file());
        String name = path.getFileName() == null ? "" : path.getFileName().toString();
        String extension = name.substring(name.lastIndexOf('.') + 1).toLowerCase(Locale.ROOT);
        boolean text = TEXT_EXTENSIONS.contains(extension);
        boolean workbook = WORKBOOK_EXTENSIONS.contains(extension);
        if (!text && !workbook && !DATABASE_EXTENSIONS.contains(extension)) {
            findings.add(Finding.error("figures-file-unknown-type", settings.file(), "",
                    "aequa does not know how to read a \"." + extension + "\" file as statistics.",
                    "Use delimited text (.csv, .tsv), a workbook (.xlsx) or a SQLite database (.sqlite, .gpkg)."));
            return FigureTable.empty(settings.file(), settings.keyMatching());
        }
        if (!Files.isRegularFile(path)) {
            findings.add(Finding.error("figures-file-missing", settings.file(), "",
                    "The statistics file does not exist.",
                    "Check the path in aequa.yaml; it is relative to the project folder."));
            return FigureTable.empty(settings.file(), settings.keyMatching());
        }
        try {
            if (workbook) {
                return WorkbookFigureReader.read(path, settings, findings);
            }
            return text ? CsvFigureReader.read(path, settings, findings)
                    : SqliteFigureReader.read(path, settings, findings);
        } catch (IOException e) {
            throw new UncheckedIOException("Reading " + path, e);
        }
    }
}
