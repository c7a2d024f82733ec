package aequa.colour;

import java.util.Locale;

/** An sRGB colour with 8-bit channels (IEC 61966-2-1). */
public record Rgb(int red, int green, int blue) {

    public Rgb {
        if ((red | green | blue) < 0 || red > 255 || green > 255 || blue > 255) {
            throw new IllegalArgumentException("channel out of 0..255: " + red + "," + green + "," + blue);
        }
    }

    /** Parses {@code #rrggbb}. */
    public static Rgb fromHex(String hex) {
        String h = hex.startsWith("#") ? hex.substring(1) : hex;
        if (h.length() != 6) {
            throw new IllegalArgumentException("not a #rrggbb colour: " + hex);
        }
        int v = Integer.parseInt(h, 16);
        return new Rgb((v >> 16) & 0xff, (v >> 8) & 0xff, v & 0xff);
    }

    /** {@code #rrggbb}, lower case. */
    public String hex() {
        return String.format(Locale.ROOT, "#%02x%02x%02x", red, green, blue);
    }
}
