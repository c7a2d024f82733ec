package aequa.publish;

import java.io.IOException;
import java.nio.file.Path;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;

/** Fixtures for aequa.bench.PublishBenchmark, which lives outside this package. */
public final class PublishBenchmarkSupport {

    /** Stand-in cost of drawing one picture, in milliseconds. */
    public static final int DRAW_MILLIS = 100;

    private PublishBenchmarkSupport() {
    }

    public static Atlas atlas(Path projectDir, int maps, int regions) {
        return SiteFixtures.atlas(projectDir, SiteFixtures.Texts.plain(), maps, regions);
    }

    /** Fake artwork that sleeps {@value #DRAW_MILLIS} ms for each of the web SVG, print SVG, PDF and PNG. */
    public static MapArtwork artwork() {
        FakeArtwork fake = new FakeArtwork();
        return new MapArtwork() {
            @Override
            public String webSvg(MapModel map) {
                pause();
                return fake.webSvg(map);
            }

            @Override
            public byte[] printSvg(MapModel map) {
                pause();
                return fake.printSvg(map);
            }

            @Override
            public byte[] pdf(MapModel map) {
                pause();
                return fake.pdf(map);
            }

            @Override
            public byte[] png(MapModel map, int widthPx, int scale) {
                pause();
                return fake.png(map, widthPx, scale);
            }
        };
    }

    /** Deletes the output so the next publish builds everything. */
    public static void forget(Path out) throws IOException {
        StagingFolder.deleteTree(out);
    }

    private static void pause() {
        try {
            Thread.sleep(DRAW_MILLIS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
