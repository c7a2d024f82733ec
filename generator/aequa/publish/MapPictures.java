package aequa.publish;

import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.function.Supplier;

import aequa.atlas.MapModel;

/**
 * The five pictures of one map, drawn at the same time: web SVG, print SVG, PDF and the two PNGs (one
 * painting, {@link MapArtwork#pngs}) are independent, so each goes to its own task of the fork/join pool the publish runs in (the common pool
 * unless the caller runs it inside another). The result does not depend on how many run at once.
 *
 * @param webSvg    the web SVG, inlined in the map's page
 * @param printSvg  the print SVG file
 * @param pdf       the print PDF
 * @param png       the PNG
 * @param pngDouble the PNG at twice the pixels
 */
record MapPictures(String webSvg, byte[] printSvg, byte[] pdf, byte[] png, byte[] pngDouble) {

    static MapPictures draw(MapArtwork artwork, MapModel map, int pngWidthPx) {
        List<Supplier<Object>> formats = List.of(() -> artwork.webSvg(map), () -> artwork.printSvg(map),
                () -> artwork.pdf(map), () -> artwork.pngs(map, pngWidthPx));
        List<Object> drawn = formats.parallelStream().map(Supplier::get).toList();
        byte[][] pngs = (byte[][]) drawn.get(3);
        return new MapPictures((String) drawn.get(0), (byte[]) drawn.get(1), (byte[]) drawn.get(2), pngs[0], pngs[1]);
    }

    /**
     * How many maps to draw at once: the parallelism of the pool the caller runs in, plus the calling thread
     * when it is not one of the pool's (it takes part in the work of its parallel streams).
     */
    static int mapsAtOnce() {
        return ForkJoinTask.inForkJoinPool() ? Math.max(1, ForkJoinTask.getPool().getParallelism())
                : ForkJoinPool.getCommonPoolParallelism() + 1;
    }
}
