package aequa.inputs.figures;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Locale;

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
 * I/O failure (a disk error, or the file removed since the project file's checks) is thrown, as
 * {@link UncheckedIOException}.
 */
public final class FigureReaders {

    private FigureReaders() {
    }

    /**
     * @param projectDir the project folder; {@code spec.file()} is resolved against it
     * @param spec       the statistics source as the project file describes it and its checks accepted it: a
     *                   file that exists, of one of the {@link FigureSourceSpec#FILE_TYPES} (ProjectChecks
     *                   reports another with its line)
     * @throws IllegalArgumentException for a file of another type
     * @param findings   receives every problem found
     */
    public static FigureTable read(Path projectDir, FigureSourceSpec spec, Findings findings) {
        FigureSourceSettings settings = FigureSourceSettings.parse(spec, findings);
        return read(projectDir, settings, findings);
    }

    private static FigureTable read(Path projectDir, FigureSourceSettings settings, Findings findings) {
        Path path = projectDir.resolve(settings.file());
        String name = settings.file().toLowerCase(Locale.ROOT);
        boolean text = FigureSourceSpec.TEXT_TYPES.stream().anyMatch(name::endsWith);
        boolean workbook = FigureSourceSpec.WORKBOOK_TYPES.stream().anyMatch(name::endsWith);
        if (!text && !workbook && FigureSourceSpec.DATABASE_TYPES.stream().noneMatch(name::endsWith)) {
            throw new IllegalArgumentException("not a statistics file type: " + settings.file());
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
