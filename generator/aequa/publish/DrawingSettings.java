package aequa.publish;

import java.util.Objects;

import aequa.atlas.FrameNameBands;
import aequa.drawing.PrintSize;
import aequa.drawing.Theme;
import aequa.drawing.WebSize;

/**
 * The project file's drawing settings, read and checked by {@link CheckStep}: what step 2 draws with.
 *
 * @param theme      the theme of the pages and web maps ({@code site.theme})
 * @param printTheme the theme of the print drawings ({@code site.print-theme})
 * @param printSize  the print drawings' size ({@code site.print-width})
 */
public record DrawingSettings(Theme theme, Theme printTheme, PrintSize printSize) {

    public DrawingSettings {
        Objects.requireNonNull(theme, "theme");
        Objects.requireNonNull(printTheme, "printTheme");
        Objects.requireNonNull(printSize, "printSize");
    }

    /**
     * The least heights of composite maps' frame-name bands these settings ask for: names at the site theme's
     * legend size at the standard web width, and at the print theme's smallest type at the print width.
     */
    public FrameNameBands frameNameBands() {
        return new FrameNameBands(WebSize.STANDARD.frameNameBandShare(theme), printSize.frameNameBandShare(printTheme));
    }
}
