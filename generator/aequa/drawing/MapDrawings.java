package aequa.drawing;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.jfree.pdf.PDFDocument;
import org.jfree.pdf.PDFHints;
import org.jfree.pdf.Page;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGUnits;

import aequa.atlas.MapModel;

/**
 * Front door of the drawing stage: one {@link MapModel} to a web SVG, a print SVG, a PNG or a PDF, all
 * painted by the same {@link MapPainter}. Every method is deterministic: the same model, theme and size
 * give the same bytes on the same machine (fonts installed on the machine affect text measurement).
 * Nothing is written to disk here.
 */
public final class MapDrawings {

    private MapDrawings() {
    }

    /** The web SVG with the default web options (no title, labels, graticule for world maps). */
    public static DrawnMap webSvg(MapModel model, Theme theme, WebSize size) {
        return webSvg(model, theme, size, DrawOptions.web());
    }

    /**
     * A responsive SVG for pages: viewBox in CSS pixels of {@code size.widthPx()}, no fixed width or height,
     * {@code role="img"} with a title and description, each region a group {@code r-<key>} with data-key,
     * data-name, data-value, data-class and a title. Coordinates to 0.1 px. Meant to be inlined in HTML.
     */
    public static DrawnMap webSvg(MapModel model, Theme theme, WebSize size, DrawOptions options) {
        Medium medium = Medium.SCREEN;
        double width = size.widthPx();
        Typesetter type = new Typesetter(medium.unitsPerPt(width), Typesetter.installedFamily(theme.fonts().family()));
        MapPainter painter = new MapPainter(model, theme, options);
        Layout layout = painter.layout(type, medium, width, Double.NaN);
        FixedDecimal precision = medium.coordinates();
        SVGGraphics2D g = SvgOutput.graphics(width, layout.heightU(), SVGUnits.PX, precision, theme.fonts().cssStack(), "aequa-");
        Canvas canvas = new Canvas(g, type);
        painter.paint(canvas, layout, precision, true);
        String rootId = Ids.of("map", model.id());
        String svg = SvgOutput.tidy(SvgOutput.webRoot(g, rootId, width, layout.heightU(), model.spec().title(),
                Descriptions.of(model, options.wording())), precision.decimals());
        return drawn(DrawnMap.Format.WEB_SVG, svg.getBytes(StandardCharsets.UTF_8), layout, "px", canvas);
    }

    /** The print SVG with the default print options (title, labels, graticule for world maps). */
    public static DrawnMap printSvg(MapModel model, Theme theme, PrintSize size) {
        return printSvg(model, theme, size, DrawOptions.print());
    }

    /**
     * A print SVG of exact physical size ({@code width="..mm" height="..mm"}, one user unit per millimetre),
     * live text in the theme's font stack, named groups (background, title, regions, borders, outline, labels,
     * legend, area-scale, caption, credits; per period on small multiples), no clipping masks, no rasters,
     * coordinates to 0.01 mm. Run {@link PrintPreflight#check} on the result before writing it.
     */
    public static DrawnMap printSvg(MapModel model, Theme theme, PrintSize size, DrawOptions options) {
        Medium medium = Medium.PRINT;
        Typesetter type = new Typesetter(medium.unitsPerPt(size.widthMm()), Typesetter.installedFamily(theme.fonts().family()));
        MapPainter painter = new MapPainter(model.forPrint(), theme, options);
        Layout layout = painter.layout(type, medium, size.widthMm(), size.heightMm());
        FixedDecimal precision = medium.coordinates();
        SVGGraphics2D g = SvgOutput.graphics(size.widthMm(), layout.heightU(), SVGUnits.MM, precision, theme.fonts().cssStack(), "aequa-");
        Canvas canvas = new Canvas(g, type);
        painter.paint(canvas, layout, precision, false);
        String svg = SvgOutput.tidy(SvgOutput.printDocument(g, Ids.of("map", model.id()), size.widthMm(), layout.heightU(),
                model.spec().title()), precision.decimals());
        return drawn(DrawnMap.Format.PRINT_SVG, svg.getBytes(StandardCharsets.UTF_8), layout, "mm", canvas);
    }

    /** A PNG with the web layout at {@code widthPx} CSS pixels, rendered at {@code scale} (1 or 2) device pixels per CSS pixel. */
    public static DrawnMap png(MapModel model, Theme theme, int widthPx, int scale) {
        return png(model, theme, widthPx, scale, DrawOptions.web().withTitle(true));
    }

    /** As {@link #png(MapModel, Theme, int, int)}, with options. The image is {@code widthPx*scale} pixels wide. */
    public static DrawnMap png(MapModel model, Theme theme, int widthPx, int scale, DrawOptions options) {
        if (scale < 1 || scale > 4) {
            throw new IllegalArgumentException("scale must be 1..4: " + scale);
        }
        Raster raster = raster(model, theme, widthPx, scale, options);
        return drawn(DrawnMap.Format.PNG, PngEncoder.encode(raster.image()), raster.layout(), "px", raster.canvas());
    }

    /**
     * The PNG at 2 device pixels per CSS pixel, and the one at 1 made from it rather than painted again: each
     * of its pixels is the mean of a 2 x 2 block of the larger image, per channel, rounded to nearest
     * (box-filter downsampling, that is supersampled anti-aliasing on top of the renderer's own). Default web
     * options as {@link #png(MapModel, Theme, int, int, DrawOptions)} takes them (language, title).
     *
     * @return {@code [1x, 2x]}
     */
    public static List<DrawnMap> pngPair(MapModel model, Theme theme, int widthPx, DrawOptions options) {
        Raster raster = raster(model, theme, widthPx, 2, options);
        DrawnMap single = drawn(DrawnMap.Format.PNG, PngEncoder.encode(halved(raster.image())), raster.layout(), "px", raster.canvas());
        DrawnMap twice = drawn(DrawnMap.Format.PNG, PngEncoder.encode(raster.image()), raster.layout(), "px", raster.canvas());
        return List.of(single, twice);
    }

    /** A painted image with the layout and canvas it was painted with. */
    private record Raster(BufferedImage image, Layout layout, Canvas canvas) {
    }

    private static Raster raster(MapModel model, Theme theme, int widthPx, int scale, DrawOptions options) {
        Medium medium = Medium.SCREEN;
        WebSize size = new WebSize(widthPx);
        Typesetter type = new Typesetter(medium.unitsPerPt(size.widthPx()), Typesetter.installedFamily(theme.fonts().family()));
        MapPainter painter = new MapPainter(model, theme, options);
        Layout layout = painter.layout(type, medium, widthPx, Double.NaN);
        int heightPx = (int) Math.round(layout.heightU());
        BufferedImage image = new BufferedImage(widthPx * scale, heightPx * scale, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
            g.scale(scale, scale);
            Canvas canvas = new Canvas(g, type);
            painter.paint(canvas, layout, new FixedDecimal(3), false);
            return new Raster(image, layout, canvas);
        } finally {
            g.dispose();
        }
    }

    /** Half the width and height of an RGB image of even size: each pixel the rounded mean of a 2 x 2 block. */
    static BufferedImage halved(BufferedImage image) {
        int width = image.getWidth() / 2;
        int height = image.getHeight() / 2;
        int[] from = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
        BufferedImage half = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        int[] to = ((DataBufferInt) half.getRaster().getDataBuffer()).getData();
        int stride = image.getWidth();
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                int top = 2 * y * stride + 2 * x;
                int a = from[top];
                int b = from[top + 1];
                int c = from[top + stride];
                int d = from[top + stride + 1];
                int rgb = 0;
                for (int shift = 0; shift <= 16; shift += 8) {
                    int sum = (a >> shift & 0xff) + (b >> shift & 0xff) + (c >> shift & 0xff) + (d >> shift & 0xff);
                    rgb |= (sum + 2) / 4 << shift;
                }
                to[y * width + x] = rgb;
            }
        }
        return half;
    }

    /**
     * A one-page PDF of the print layout (JFreePDF). Text is drawn as outlines of the font it was measured
     * with (JFreePDF's vector string mode): every script that font covers survives, and the text sits
     * exactly where the layout put it. JFreePDF's other mode sets live text in the standard Helvetica with
     * MacRoman encoding, which loses other scripts and has other widths. Text converted to outlines is
     * common practice in prepress; the print SVG keeps live, editable text.
     */
    public static DrawnMap pdf(MapModel model, Theme theme, PrintSize size, DrawOptions options) {
        Medium medium = Medium.PRINT;
        Typesetter type = new Typesetter(medium.unitsPerPt(size.widthMm()), java.awt.Font.SANS_SERIF);
        MapPainter painter = new MapPainter(model.forPrint(), theme, options);
        Layout layout = painter.layout(type, medium, size.widthMm(), size.heightMm());
        double ptPerMm = 72.0 / 25.4; // 1 inch = 25.4 mm = 72 pt
        PDFDocument document = new PDFDocument(); // no setTitle: PdfInformation adds the title, escaped
        Page page = document.createPage(new java.awt.geom.Rectangle2D.Double(0, 0, size.widthMm() * ptPerMm, layout.heightU() * ptPerMm));
        Graphics2D g = page.getGraphics2D();
        g.setRenderingHint(PDFHints.KEY_DRAW_STRING_TYPE, PDFHints.VALUE_DRAW_STRING_TYPE_VECTOR);
        g.scale(ptPerMm, ptPerMm);
        Canvas canvas = new Canvas(g, type);
        painter.paint(canvas, layout, medium.coordinates(), false);
        return drawn(DrawnMap.Format.PDF, PdfInformation.rewritten(document.getPDFBytes(), model.spec().title()), layout, "mm", canvas);
    }

    private static DrawnMap drawn(DrawnMap.Format format, byte[] bytes, Layout layout, String unit, Canvas canvas) {
        double scale = layout.panels().get(0).fit().scaleUnitsPerM();
        return new DrawnMap(format, bytes, layout.widthU(), layout.heightU(), unit, scale, layout.areaScale(), canvas.inventory());
    }
}
