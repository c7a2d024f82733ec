package aequa.publish;

import java.nio.file.Path;

/** Writes the fixture site to the folder given as argument, for looking at it in a browser. */
public final class SampleSiteMain {
    private SampleSiteMain() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Path.of(args[0]);
        SiteFixtures.Texts texts = args.length > 1 ? SiteFixtures.Texts.hostile() : SiteFixtures.Texts.plain();
        aequa.atlas.Atlas atlas = SiteFixtures.atlas(Path.of("/nonexistent"), texts, 2, 14);
        System.out.println(SitePublisher.publish(atlas, new FakeArtwork(), out, PublishOptions.defaults()).summary());
        StagingFolder.deleteTree(out);
        System.out.println(SitePublisher.publish(atlas, new FakeArtwork(), out, PublishOptions.defaults()).summary());
        System.out.println(SitePublisher.publish(atlas, new FakeArtwork(), out, PublishOptions.defaults()).summary());
    }
}
