package aequa.colour;

/**
 * The polar form of OKLab (Ottosson 2020): lightness as OKLab L, chroma {@code C = sqrt(a^2 + b^2)} and
 * hue angle {@code h = atan2(b, a)} in degrees, [0, 360).
 */
public record OkLch(double lightness, double chroma, double hueDeg) {

    public OkLab toOkLab() {
        double h = Math.toRadians(hueDeg);
        return new OkLab(lightness, chroma * Math.cos(h), chroma * Math.sin(h));
    }

    public static OkLch of(OkLab lab) {
        double hue = Math.toDegrees(Math.atan2(lab.b(), lab.a()));
        return new OkLch(lab.lightness(), Math.hypot(lab.a(), lab.b()), hue < 0 ? hue + 360 : hue);
    }
}
