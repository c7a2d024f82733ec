package aequa.publish;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicInteger;

import javax.imageio.ImageIO;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;

/**
 * A stand-in for the drawing stage: a minimal valid SVG with a title, one {@code <path id="r-KEY">} per
 * region, a legend group and a caption; a real (tiny) PNG. Counts its calls and can fail on the Nth map.
 */
final class FakeArtwork implements MapArtwork {

    private final AtomicInteger webCalls = new AtomicInteger();
    private final int failOnCall;

    FakeArtwork() {
        this(-1);
    }

    /** @param failOnCall the 1-based {@link #webSvg} call that throws, or -1 for never */
    FakeArtwork(int failOnCall) {
        this.failOnCall = failOnCall;
    }

    int webCalls() {
        return webCalls.get();
    }

    @Override
    public String webSvg(MapModel map) {
        if (webCalls.incrementAndGet() == failOnCall) {
            throw new IllegalStateException("injected drawing failure on map " + map.id());
        }
        return svg(map);
    }

    private static String svg(MapModel map) {
        StringBuilder svg = new StringBuilder("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 1000 700\"")
                .append(" role=\"img\" aria-labelledby=\"t-").append(xml(map.id())).append("\">")
                .append("<title id=\"t-").append(xml(map.id())).append("\">").append(xml(map.spec().title())).append("</title>")
                .append("<g id=\"regions\">");
        int i = 0;
        for (MapRegion region : map.regions()) {
            double x = (i % 10) * 90.0 + 10;
            double y = (i / 10) * 90.0 + 10;
            svg.append(String.format(Locale.ROOT, "<path id=\"r-%s\" data-name=\"%s\" d=\"M%.0f %.0fh80v80h-80z\" fill=\"#8aa\">",
                    xml(region.key()), xml(region.name()), x, y))
                    .append("<title>").append(xml(region.name())).append("</title></path>");
            i++;
        }
        svg.append("</g><g id=\"legend\"><text x=\"10\" y=\"660\">Legend</text></g>")
                .append("<g id=\"caption\"><text x=\"10\" y=\"690\">Caption: ").append(xml(map.spec().source()))
                .append("</text></g></svg>");
        return svg.toString();
    }

    @Override
    public byte[] pdf(MapModel map) {
        return ("%PDF-1.4\n% stand-in for the print layout of " + map.id() + "\n%%EOF\n").getBytes(StandardCharsets.US_ASCII);
    }

    @Override
    public byte[] printSvg(MapModel map) {
        return ("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + svg(map).replace("viewBox", "width=\"100mm\" height=\"70mm\" viewBox"))
                .getBytes(StandardCharsets.UTF_8);
    }

    @Override
    public byte[] png(MapModel map, int widthPx, int scale) {
        BufferedImage image = new BufferedImage(4, 3, BufferedImage.TYPE_INT_RGB);
        image.setRGB(0, 0, map.regions().size());
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            ImageIO.write(image, "png", bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.toByteArray();
    }

    static String xml(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
