package aequa.pages;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.wording.Wording;

/** Escaping guard, project overrides and the site notice on every page. */
class PageRendererTest {

    @TempDir
    Path tmp;

    private static final SiteView SITE = new SiteView("Atlas & <Co>", "", "The data is invented.", Wording.english());

    @Test
    void noBundledTemplateSwitchesEscapingOff() throws IOException {
        assertEquals(List.of(), new PageRenderer(tmp.resolve("missing")).checkTemplates());
        // and the source folder itself, in case the jar copy is stale
        for (String name : PageRenderer.TEMPLATE_NAMES) {
            String text = Files.readString(Path.of("templates", name));
            assertTrue(!text.contains("no_esc") && !text.contains("noautoesc"), name);
        }
    }

    @Test
    void anOverrideThatSwitchesEscapingOffIsFound() throws IOException {
        Files.writeString(tmp.resolve("index.ftlh"), "<#list page.cards as c>${c.title?no_esc}</#list>");
        assertEquals(List.of("index.ftlh"), new PageRenderer(tmp).checkTemplates());
    }

    @Test
    void aProjectTemplateOverridesTheBundledOneFileByFile() throws IOException {
        Files.writeString(tmp.resolve("index.ftlh"), "<#import \"layout.ftlh\" as layout><@layout.page title=\"Own\">OWN INDEX</@layout.page>");
        String html = new PageRenderer(tmp).renderIndex(SITE, new IndexView(List.of()));
        assertTrue(html.contains("OWN INDEX"));
        assertTrue(html.contains("Atlas &amp; &lt;Co&gt;"), "the bundled layout still applies and escapes");
        String method = new PageRenderer(tmp).renderMethod(SITE, new MethodView(List.of()));
        assertTrue(method.contains("Boundaries are drawn for statistical display only"));
    }

    @Test
    void everyPageShowsTheSiteNotice() {
        PageRenderer renderer = new PageRenderer(tmp.resolve("missing"));
        List<String> pages = List.of(renderer.renderIndex(SITE, new IndexView(List.of())),
                renderer.renderMethod(SITE, new MethodView(List.of())),
                renderer.renderChanges(SITE, new ChangesView("First.", List.of(), 0)),
                renderer.renderFigures(SITE, new FiguresView("m", "T", "u", List.of("2031"), List.of(), "index.html", "m.csv", false),
                        "maps/m/figures.html"),
                renderer.renderMap(SITE, new MapPageView("m", "T", "u", "2031", "c", "s", "<svg xmlns=\"http://www.w3.org/2000/svg\"/>",
                        "", "", List.of(), "", List.of(), "figures.html"), "maps/m/index.html"));
        for (String page : pages) {
            assertTrue(page.contains("The data is invented."), page);
            assertTrue(page.startsWith("<!DOCTYPE html>") && page.contains("<html lang=\"en\" dir=\"ltr\">"), page);
        }
    }
}
