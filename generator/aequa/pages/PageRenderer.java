package aequa.pages;

import java.io.IOException;
import java.io.InputStream;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TimeZone;
import java.util.regex.Pattern;

import freemarker.cache.ClassTemplateLoader;
import freemarker.cache.FileTemplateLoader;
import freemarker.cache.MultiTemplateLoader;
import freemarker.cache.TemplateLoader;
import freemarker.core.HTMLOutputFormat;
import freemarker.core.TemplateHTMLOutputModel;
import freemarker.template.Configuration;
import freemarker.template.Template;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import freemarker.template.TemplateModelException;

/**
 * Renders the site's pages from Freemarker templates; the only class that touches Freemarker.
 *
 * <p>Templates come from a project's own {@code templates/} folder first, then from the templates bundled
 * at classpath {@value #BUNDLED}, so a project overrides them file by file. Every value printed is
 * HTML-escaped by Freemarker's auto-escaping; the single exception is aequa's own map SVG, passed as
 * {@link MapPageView#svg()} and inserted as trusted markup. A template that asks for {@code ?no_esc} is
 * refused (see {@link #checkTemplates()}), so project templates cannot switch escaping off.
 *
 * <p>Output is deterministic: {@link Locale#ROOT}, the "computer" number format and UTC are fixed, so the
 * same views give the same bytes whatever the machine's settings. Instances are thread-safe after
 * construction.
 */
public final class PageRenderer {

    /** Classpath folder of the bundled templates (the pom copies {@code templates/} there). */
    public static final String BUNDLED = "/templates";

    /** Every template a site uses, also the set hashed for incremental builds. */
    public static final List<String> TEMPLATE_NAMES = List.of(
            "layout.ftlh", "index.ftlh", "map.ftlh", "figures.ftlh", "method.ftlh", "changes.ftlh",
            "embed.ftlh", "fragment.ftlh");

    /** Files copied verbatim into the site's {@code assets/} folder; overridable like templates. */
    public static final List<String> ASSET_NAMES = List.of("assets/site.css", "assets/hover.js", "assets/embed-frame.js",
            "assets/embed-host.js", "assets/embed-copy.js");

    private static final Pattern NO_ESCAPE = Pattern.compile(
            "\\?\\s*no_esc\\b|<#\\s*noautoesc|auto_esc\\s*=\\s*false|<#\\s*outputformat");

    private final Configuration config;
    private final Optional<Path> projectTemplates;

    /**
     * @param projectTemplates the project's {@code templates/} folder; skipped when it does not exist
     */
    public PageRenderer(Path projectTemplates) {
        this.projectTemplates = Files.isDirectory(projectTemplates) ? Optional.of(projectTemplates) : Optional.empty();
        this.config = configure(this.projectTemplates);
    }

    private static Configuration configure(Optional<Path> projectTemplates) {
        Configuration cfg = new Configuration(Configuration.VERSION_2_3_35);
        List<TemplateLoader> loaders = new ArrayList<>();
        if (projectTemplates.isPresent()) {
            try {
                loaders.add(new FileTemplateLoader(projectTemplates.get().toFile()));
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read templates folder " + projectTemplates.get(), e);
            }
        }
        loaders.add(new ClassTemplateLoader(PageRenderer.class, BUNDLED));
        MultiTemplateLoader loader = new MultiTemplateLoader(loaders.toArray(TemplateLoader[]::new));
        loader.setSticky(false); // the preview server keeps one renderer while a user adds override files
        cfg.setTemplateLoader(loader);
        cfg.setOutputFormat(HTMLOutputFormat.INSTANCE);
        cfg.setAutoEscapingPolicy(Configuration.FORCE_AUTO_ESCAPING_POLICY);
        cfg.setDefaultEncoding("UTF-8");
        cfg.setLocale(Locale.ROOT);
        cfg.setNumberFormat("computer");
        cfg.setTimeZone(TimeZone.getTimeZone("UTC"));
        cfg.setTemplateExceptionHandler(TemplateExceptionHandler.RETHROW_HANDLER);
        cfg.setLogTemplateExceptions(false);
        cfg.setWrapUncheckedExceptions(true);
        cfg.setFallbackOnNullLoopVariable(false);
        cfg.setTemplateUpdateDelayMilliseconds(0);
        return cfg;
    }

    public String renderIndex(SiteView site, IndexView page) {
        return render("index.ftlh", site, "", "index.html", page, Map.of());
    }

    /** A map page without the section that offers the map for other sites' pages. */
    public String renderMap(SiteView site, MapPageView page, String pagePath) {
        return render("map.ftlh", site, "../../", pagePath, page, Map.of("mapSvg", markup(page.svg())));
    }

    /**
     * A map page with its section "Use this map in your own page".
     *
     * @param pagePath the page's path from the language's root, for the links to its other languages
     */
    public String renderMap(SiteView site, MapPageView page, String pagePath, EmbedView embed) {
        return render("map.ftlh", site, "../../", pagePath, page, Map.of("mapSvg", markup(page.svg()), "embed", embed));
    }

    /** The map's embed page, shown in other sites' frames. */
    public String renderEmbed(SiteView site, MapPageView page, String pagePath, EmbedView embed) {
        return render("embed.ftlh", site, "../../", pagePath, page, Map.of("mapSvg", markup(page.svg()), "embed", embed));
    }

    /**
     * The map as a self-contained HTML fragment.
     *
     * @param fragmentSvg the map's SVG without ids or anything it would load (see aequa.publish.FragmentSvg);
     *                    inserted unescaped, like {@link MapPageView#svg()}
     */
    public String renderFragment(SiteView site, MapPageView page, String pagePath, EmbedView embed, String fragmentSvg) {
        return render("fragment.ftlh", site, "../../", pagePath, page, Map.of("mapSvg", markup(fragmentSvg), "embed", embed));
    }

    private static TemplateHTMLOutputModel markup(String trusted) {
        try {
            return HTMLOutputFormat.INSTANCE.fromMarkup(trusted);
        } catch (TemplateModelException e) {
            throw new IllegalStateException("Freemarker refused markup", e);
        }
    }

    /** @param pagePath the page's path from the language's root, for the links to its other languages */
    public String renderFigures(SiteView site, FiguresView page, String pagePath) {
        return render("figures.ftlh", site, "../../", pagePath, page, Map.of());
    }

    public String renderMethod(SiteView site, MethodView page) {
        return render("method.ftlh", site, "", "method.html", page, Map.of());
    }

    public String renderChanges(SiteView site, ChangesView page) {
        return render("changes.ftlh", site, "", "changes.html", page, Map.of());
    }

    private String render(String name, SiteView site, String root, String pagePath, Object page, Map<String, Object> extra) {
        Map<String, Object> model = new java.util.HashMap<>(extra);
        model.put("site", site);
        model.put("root", root);
        model.put("pagePath", pagePath);
        model.put("page", page);
        model.put("t", new MessageMethod(site.wording()));
        StringWriter out = new StringWriter();
        try {
            Template template = config.getTemplate(name);
            template.process(model, out);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot load template " + name, e);
        } catch (TemplateException e) {
            throw new IllegalStateException("template " + name + " failed: " + e.getMessageWithoutStackTop(), e);
        }
        return out.toString();
    }

    /**
     * Reads a template or asset as the site will use it (project override first), for hashing and copying.
     *
     * @param name a name from {@link #TEMPLATE_NAMES} or {@link #ASSET_NAMES}
     */
    public byte[] source(String name) {
        if (projectTemplates.isPresent()) {
            Path own = projectTemplates.get().resolve(name).normalize();
            if (own.startsWith(projectTemplates.get()) && Files.isRegularFile(own)) {
                try {
                    return Files.readAllBytes(own);
                } catch (IOException e) {
                    throw new UncheckedIOException("cannot read " + own, e);
                }
            }
        }
        try (InputStream in = PageRenderer.class.getResourceAsStream(BUNDLED + "/" + name)) {
            if (in == null) {
                throw new IllegalStateException("bundled template missing from the jar: " + name);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read bundled " + name, e);
        }
    }

    /**
     * The names of the templates (bundled or overridden) that use {@code ?no_esc}, {@code <#noautoesc>},
     * {@code auto_esc=false} or {@code <#outputformat>}, any of which could print data without escaping.
     * Empty means every template escapes all it prints.
     */
    public List<String> checkTemplates() {
        List<String> offenders = new ArrayList<>();
        for (String name : TEMPLATE_NAMES) {
            String text = new String(source(name), java.nio.charset.StandardCharsets.UTF_8);
            if (NO_ESCAPE.matcher(text).find()) {
                offenders.add(name);
            }
        }
        return offenders;
    }
}
