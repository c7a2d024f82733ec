package aequa.inputs.figures;

import java.util.List;

import aequa.project.FigureSourceSpec;
import aequa.project.KeyMatching;
import aequa.project.TableLayout;
import aequa.project.Words;

/** Builds {@link FigureSourceSpec}s for tests; null fields take the record's defaults. */
public final class SourceSpecBuilder {

    private final String file;
    private String table;
    private String key;
    private String layout;
    private String indicatorColumn;
    private String periodColumn;
    private String valueColumn;
    private String delimiter;
    private String decimal;
    private String thousands;
    private List<String> missing;
    private List<String> suppressed;
    private List<String> notApplicable;
    private String keyMatching;
    private String sheet;
    private Integer headerRow;

    private SourceSpecBuilder(String file) {
        this.file = file;
    }

    public static SourceSpecBuilder file(String file) {
        return new SourceSpecBuilder(file);
    }

    public SourceSpecBuilder table(String value) { table = value; return this; }
    public SourceSpecBuilder key(String value) { key = value; return this; }
    public SourceSpecBuilder layout(String value) { layout = value; return this; }
    public SourceSpecBuilder indicatorColumn(String value) { indicatorColumn = value; return this; }
    public SourceSpecBuilder periodColumn(String value) { periodColumn = value; return this; }
    public SourceSpecBuilder valueColumn(String value) { valueColumn = value; return this; }
    public SourceSpecBuilder delimiter(String value) { delimiter = value; return this; }
    public SourceSpecBuilder decimal(String value) { decimal = value; return this; }
    public SourceSpecBuilder thousands(String value) { thousands = value; return this; }
    public SourceSpecBuilder missing(String... values) { missing = List.of(values); return this; }
    public SourceSpecBuilder suppressed(String... values) { suppressed = List.of(values); return this; }
    public SourceSpecBuilder notApplicable(String... values) { notApplicable = List.of(values); return this; }
    public SourceSpecBuilder keyMatching(String value) { keyMatching = value; return this; }
    public SourceSpecBuilder sheet(String value) { sheet = value; return this; }
    public SourceSpecBuilder headerRow(int value) { headerRow = value; return this; }

    public FigureSourceSpec build() {
        return new FigureSourceSpec(file, table, key, Words.of(TableLayout.class, layout), indicatorColumn, periodColumn, valueColumn, delimiter,
                decimal, thousands, missing, suppressed, notApplicable, Words.of(KeyMatching.class, keyMatching), sheet, headerRow);
    }
}
