package aequa.publish;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import aequa.atlas.MapModel;
import aequa.pages.EmbedView;
import aequa.pages.MapPageView;
import aequa.pages.PageRenderer;
import aequa.pages.SiteView;

/**
 * One map's files in one language. The build decides on its own thread what must be made (the pictures when
 * the drawing's inputs changed, the pages when theirs did); the making is split into jobs, one per
 * {@link Job}, that may run on any thread at the same time as other maps' and the site's jobs; then
 * {@link #writeTo} hands every file to the build, made or carried over, in one fixed order. Jobs only read
 * the model and the previous edition and each sets fields of its own, which the caller reads after they all
 * ended ({@link ParallelJobs}), so the files never depend on which thread made what.
 */
final class MapBuild {

    /**
     * The jobs of a map, longest first as measured on a figures-only rebuild of the 3,231 US counties (cold
     * JVM, first-tier compiler, 2 cores): the web SVG with the three pages that inline it about 0.9 s, the two
     * PNGs (one painting) 0.8 s, the print SVG and the PDF about 0.45 s each, the figures page and CSV 0.25 s.
     */
    enum Job { WEB_AND_PAGES, PNGS, PRINT_SVG, PDF, TABLES }

    /** Where a map's files go: written as made, or carried over from the previous edition. */
    interface Output {
        void write(MadeFile file, String inputs) throws IOException;

        void carryOver(String path, String inputs);
    }

    /**
     * What the jobs of one language share.
     *
     * @param out the output folder, holding the previous edition
     */
    record Makers(MapArtwork artwork, int pngWidthPx, PageRenderer renderer, SiteView site, Path out) {
    }

    private final MapModel map;
    private final MapFiles files;
    private final String drawHash;
    private final String pageHash;
    private final boolean draw;
    private final boolean pages;
    private final Makers makers;
    // each set by one job, read by writeTo after every job ended
    private MadeFile webSvg;
    private MadeFile printSvg;
    private MadeFile pdf;
    private MadeFile png;
    private MadeFile pngDouble;
    private List<MadeFile> svgPages = List.of();
    private List<MadeFile> tables = List.of();

    /**
     * @param draw  whether the pictures must be drawn (else carried over with {@code drawHash})
     * @param pages whether the pages must be rendered (else carried over with {@code pageHash})
     */
    MapBuild(MapModel map, MapFiles files, String drawHash, String pageHash, boolean draw, boolean pages, Makers makers) {
        this.map = map;
        this.files = files;
        this.drawHash = drawHash;
        this.pageHash = pageHash;
        this.draw = draw;
        this.pages = pages;
        this.makers = makers;
    }

    boolean draws() {
        return draw;
    }

    /** The work of {@code job}, or empty when this map needs none of it. */
    Optional<Runnable> job(Job job) {
        return switch (job) {
            case WEB_AND_PAGES -> draw || pages ? Optional.of(this::webAndPages) : Optional.empty();
            case PNGS -> draw ? Optional.of(this::pngs) : Optional.empty();
            case PRINT_SVG -> draw ? Optional.of(() -> printSvg = MadeFile.of(files.printSvg(), makers.artwork().printSvg(map)))
                    : Optional.empty();
            case PDF -> draw ? Optional.of(() -> pdf = MadeFile.of(files.pdf(), makers.artwork().pdf(map))) : Optional.empty();
            case TABLES -> pages ? Optional.of(this::tables) : Optional.empty();
        };
    }

    /** Hands every file of the map to {@code output}: pictures, then pages, each in the order of {@link MapFiles}. */
    void writeTo(Output output) throws IOException {
        if (draw) {
            for (MadeFile file : List.of(webSvg, printSvg, pdf, png, pngDouble)) {
                output.write(file, drawHash);
            }
        } else {
            files.drawn().forEach(path -> output.carryOver(path, drawHash));
        }
        if (pages) {
            // in the order of MapFiles.written()
            for (MadeFile file : List.of(svgPages.get(0), tables.get(0), tables.get(1), svgPages.get(1), svgPages.get(2))) {
                output.write(file, pageHash);
            }
        } else {
            files.written().forEach(path -> output.carryOver(path, pageHash));
        }
    }

    private void pngs() {
        byte[][] both = makers.artwork().pngs(map, makers.pngWidthPx());
        png = MadeFile.of(files.png(), both[0]);
        pngDouble = MadeFile.of(files.pngDouble(), both[1]);
    }

    /** The web SVG (drawn, or the previous edition's), and the three pages that inline it when they must be made. */
    private void webAndPages() {
        String svg;
        if (draw) {
            svg = makers.artwork().webSvg(map);
            if (containsScriptTag(svg)) {
                throw new IllegalStateException("the web SVG of map " + map.id() + " contains a script; refusing to inline it");
            }
            webSvg = MadeFile.of(files.webSvg(), svg);
        } else {
            try {
                svg = Files.readString(makers.out().resolve(files.webSvg()), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read the published " + files.webSvg(), e);
            }
        }
        if (pages) {
            PageRenderer renderer = makers.renderer();
            SiteView site = makers.site();
            String prefix = files.languagePrefix();
            MapPageView page = MapViews.page(map, files, svg, site.wording());
            EmbedView embed = MapViews.embed(map, files, svg);
            svgPages = List.of(
                    MadeFile.of(files.page(), renderer.renderMap(site, page, files.page().substring(prefix.length()), embed)),
                    MadeFile.of(files.embed(), renderer.renderEmbed(site, page, files.embed().substring(prefix.length()), embed)),
                    MadeFile.of(files.fragment(), renderer.renderFragment(site, page,
                            files.fragment().substring(prefix.length()), embed, FragmentSvg.of(svg))));
        }
    }

    /**
     * Whether {@code svg} holds {@code <script} in any case ({@code <SCRIPT}, {@code <Script}), a tag that
     * must never be inlined in a page. Compares at each {@code <} without copying the text (a web SVG of the
     * US counties is about a megabyte); {@link String#regionMatches(boolean, int, String, int, int)} folds
     * case both ways, so it finds every spelling a lower-case copy would, and a few more.
     */
    static boolean containsScriptTag(String svg) {
        for (int at = svg.indexOf('<'); at >= 0; at = svg.indexOf('<', at + 1)) {
            if (svg.regionMatches(true, at, "<script", 0, "<script".length())) {
                return true;
            }
        }
        return false;
    }

    /** The figures page and the figures as CSV, which need no picture. */
    private void tables() {
        SiteView site = makers.site();
        String prefix = files.languagePrefix();
        tables = List.of(
                MadeFile.of(files.figures(), makers.renderer().renderFigures(site, MapViews.figures(map, files, site.wording()),
                        files.figures().substring(prefix.length()))),
                MadeFile.of(files.csv(), FiguresCsv.write(map)));
    }
}
