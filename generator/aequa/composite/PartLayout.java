package aequa.composite;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * Places the framed parts of a composite map around its main part, on the main part's plane (metres).
 *
 * <p>Each part's frame holds its regions with a margin, and a band at the top for its name: one line, or two
 * or three when the name is wider than the regions and than {@value #NAME_WRAP_SHARE} of the main part's larger
 * side (then the frame is as wide as the longest line, not the whole name). A part drawn at another area
 * scale than the main part also has a band at the bottom for its own area-scale square. Parts are placed
 * one by one, largest first. The candidate places for a frame line it up with an edge of the main part's
 * extent, of the map so far, or of a frame already placed, inside or just outside them; a place is allowed
 * when the frame, grown by a gap, touches no region of the main part and no other frame. Among the allowed
 * places the one that leaves the map filling the most of its page wins (the page as wide as the map and at
 * most {@value #MAX_ASPECT} times as tall, the drawing's own limit); a preferred corner, when given, limits the
 * candidates to that quarter of the main part when any there is allowed. The winner is then slid towards the
 * main part's centre as far as it stays allowed, which tucks frames into empty corners. Every step is
 * arithmetic on fixed candidate lists, so the same parts always get the same places. A caller that knows how
 * small the map will be printed asks for a least name band, as a share of the map's drawn width; the bands,
 * names and area-scale bands then grow together and the layout is made again until the share holds.
 */
public final class PartLayout {

    /** Frame margin, gap between frames and regions, and name band, as shares of the main part's larger side (chosen by eye). */
    static final double MARGIN_SHARE = 0.012;
    static final double GAP_SHARE = 0.02;
    static final double NAME_BAND_SHARE = 0.04;
    /**
     * A name wider than this share of the main part's larger side (and than its regions) takes more lines, up to
     * {@value #MAX_NAME_LINES}, rather than widening its frame (by eye).
     */
    static final double NAME_WRAP_SHARE = 0.3;
    /** The most lines a frame's name takes: a long name on a narrow print wraps instead of widening its frame. */
    public static final int MAX_NAME_LINES = 3;
    /** Each line of a name after the first adds this much of a one-line name band (by eye: 1.7 bands for two lines). */
    static final double EXTRA_LINE_BAND = 0.7;
    /** The width of the longer line of a two-line name, in names (by eye: words break unevenly). */
    public static final double TWO_LINE_WIDTH = 0.6;
    /** The area-scale band of a part at its own area scale, as a share of the main part's larger side (by eye). */
    static final double SCALE_BAND_SHARE = 0.05;
    /** Characters of the widest area-scale label ("5,000,000 km²"), for the frame's least width. */
    private static final int SCALE_LABEL_CHARS = 13;
    /** The drawing's tallest map block relative to its width (drawing's Layout.MAX_MAP_ASPECT). */
    static final double MAX_ASPECT = 1.25;
    /** Layouts made again at most to give the name bands their least share of the drawn width, and the margin added each time. */
    static final int BAND_ROUNDS = 6;
    private static final double BAND_OVERSHOOT = 1.05;
    /** Trials of the slide towards the centre: halving steps down to 1/2^12 of the way. */
    private static final int SLIDE_STEPS = 12;

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    /**
     * One part to place.
     *
     * @param contentM    the envelope of its regions on its own plane, metres (after its area scale)
     * @param nameWidthM  how wide its name is, in the same metres, when drawn in the name band
     * @param twoLineWidthM how wide its longer line is when the name takes two lines
     * @param longestWordWidthM how wide its longest word is: no line of the name is narrower
     * @param corner      {@code top-left}, {@code top-right}, {@code bottom-left}, {@code bottom-right} or empty
     * @param ownScale    whether the part is drawn at another area scale than the main part (it then gets an
     *                    area-scale band)
     */
    public record Inset(Envelope contentM, double nameWidthM, double twoLineWidthM, double longestWordWidthM, String corner,
                        boolean ownScale) {

        /**
         * A part whose name breaks where the drawing finds room: its longer line of two is taken as
         * {@value #TWO_LINE_WIDTH} of it, and its words as short as need be.
         */
        public Inset(Envelope contentM, double nameWidthM, String corner, boolean ownScale) {
            this(contentM, nameWidthM, TWO_LINE_WIDTH * nameWidthM, 0, corner, ownScale);
        }

        /**
         * How wide the longest line is when the name takes {@code lines} lines: three or more lines share the name
         * as unevenly as two do ({@value #TWO_LINE_WIDTH} of it over two), and are never wider than two.
         */
        double widthInLinesM(int lines) {
            return switch (lines) {
                case 1 -> nameWidthM;
                case 2 -> Math.max(longestWordWidthM, twoLineWidthM);
                default -> Math.max(longestWordWidthM, Math.min(twoLineWidthM, TWO_LINE_WIDTH * 2 / lines * nameWidthM));
            };
        }

        /**
         * The fewest lines (1 to {@value #MAX_NAME_LINES}) whose longest line, {@code growth} times its own width,
         * fits {@code roomM}; when none does, the narrowest, in the fewest lines that make it.
         */
        int linesFor(double growth, double roomM) {
            int narrowest = 1;
            for (int lines = 1; lines <= MAX_NAME_LINES; lines++) {
                if (growth * widthInLinesM(lines) <= roomM) {
                    return lines;
                }
                if (widthInLinesM(lines) < widthInLinesM(narrowest)) {
                    narrowest = lines;
                }
            }
            return narrowest;
        }
    }

    /**
     * Where a part goes: add ({@code dxM}, {@code dyM}) to its coordinates to draw it in {@code frameM}.
     *
     * @param nameBandM  the height of the name band at the top of the frame
     * @param nameLines  how many lines the name band holds (1 to {@value #MAX_NAME_LINES})
     * @param scaleBandM the height of the area-scale band at the bottom of the frame (0 when the part is at the
     *                   main part's area scale)
     */
    public record Placement(double dxM, double dyM, Envelope frameM, double nameBandM, int nameLines, double scaleBandM) {
    }

    private PartLayout() {
    }

    /** Width of a name in the name band, per character, as a share of the band's height (generous for sans type, by eye). */
    static final double NAME_CHAR_SHARE = 0.36;

    /** How wide a part's name is in its name band, for a main part of extent {@code mainM}; the drawing fits the name to it. */
    public static double nameWidthM(String name, Envelope mainM) {
        return name.length() * NAME_CHAR_SHARE * NAME_BAND_SHARE * Math.max(mainM.getWidth(), mainM.getHeight());
    }

    /** Places {@code insets} (in order: pass the largest first) around the main part's regions, in the layout's own proportions. */
    public static List<Placement> place(List<Geometry> mainRegionsM, List<Inset> insets) {
        return place(mainRegionsM, insets, 0);
    }

    /**
     * Places {@code insets} (in order: pass the largest first) around the main part's regions, with name bands at
     * least {@code minBandShare} of the map's drawn width high: the map is drawn as wide as its block, or narrower
     * when it is taller than {@value #MAX_ASPECT} of its width, so a band of that share holds a name at the
     * smallest type the print allows however the layout turns out. Bands, names and area-scale bands grow
     * together; the layout is made again until the share holds (at most {@value #BAND_ROUNDS} times).
     */
    public static List<Placement> place(List<Geometry> mainRegionsM, List<Inset> insets, double minBandShare) {
        Envelope main = new Envelope();
        STRtree index = new STRtree();
        for (Geometry g : mainRegionsM) {
            if (!g.isEmpty()) {
                main.expandToInclude(g.getEnvelopeInternal());
                index.insert(g.getEnvelopeInternal(), g);
            }
        }
        double ownBand = NAME_BAND_SHARE * Math.max(main.getWidth(), main.getHeight());
        double band = ownBand;
        List<Placement> placements = place(main, index, insets, 1);
        for (int round = 0; round < BAND_ROUNDS && minBandShare > 0; round++) {
            Envelope whole = new Envelope(main);
            placements.forEach(p -> whole.expandToInclude(p.frameM()));
            double neededM = minBandShare * Math.max(whole.getWidth(), whole.getHeight() / MAX_ASPECT);
            if (neededM <= band) {
                break;
            }
            // a little more than needed: the frames grow with their bands, and so does the map
            band = neededM * BAND_OVERSHOOT;
            placements = place(main, index, insets, band / ownBand);
        }
        return placements;
    }

    /** The layout with name bands, names and area-scale bands {@code growth} times their own proportions. */
    private static List<Placement> place(Envelope main, STRtree index, List<Inset> insets, double growth) {
        double side = Math.max(main.getWidth(), main.getHeight());
        double margin = MARGIN_SHARE * side;
        double gap = GAP_SHARE * side;
        double band = NAME_BAND_SHARE * side * growth;
        List<Envelope> frames = new ArrayList<>();
        Envelope whole = new Envelope(main);
        List<Placement> placements = new ArrayList<>();
        for (Inset inset : insets) {
            Envelope c = inset.contentM();
            double contentW = c.getWidth() + 2 * margin;
            int lines = inset.linesFor(growth, Math.max(contentW, NAME_WRAP_SHARE * side) - 2 * margin);
            double nameW = growth * inset.widthInLinesM(lines) + 2 * margin;
            double nameBand = band * (1 + EXTRA_LINE_BAND * (lines - 1));
            double scaleBand = inset.ownScale() ? SCALE_BAND_SHARE * side * growth : 0;
            double scaleW = inset.ownScale() ? scaleBand + SCALE_LABEL_CHARS * NAME_CHAR_SHARE * band + 2 * margin : 0;
            double w = Math.max(contentW, Math.max(nameW, scaleW));
            double h = c.getHeight() + 2 * margin + nameBand + scaleBand;
            Envelope best = best(candidates(main, whole, frames, w, h, gap), inset.corner(), main, whole, index, frames, gap);
            best = slide(best, inset.corner(), main, index, frames, gap);
            frames.add(best);
            whole.expandToInclude(best);
            double dx = best.getMinX() + (best.getWidth() - c.getWidth()) / 2 - c.getMinX();
            double dy = best.getMinY() + scaleBand + margin - c.getMinY();
            placements.add(new Placement(dx, dy, best, nameBand, lines, scaleBand));
        }
        return placements;
    }

    private static List<Envelope> candidates(Envelope main, Envelope whole, List<Envelope> frames, double w, double h,
                                             double minGap) {
        // places outside keep a hair more than the gap, so a region that runs straight along the map's edge is not touched
        double gap = minGap * (1 + 1e-6);
        List<Double> xs = new ArrayList<>(List.of(main.getMinX(), main.getMaxX() - w, whole.getMinX(), whole.getMaxX() - w,
                whole.getMinX() - gap - w, whole.getMaxX() + gap));
        List<Double> ys = new ArrayList<>(List.of(main.getMinY(), main.getMaxY() - h, whole.getMinY(), whole.getMaxY() - h,
                whole.getMinY() - gap - h, whole.getMaxY() + gap));
        for (Envelope f : frames) {
            xs.addAll(List.of(f.getMaxX() + gap, f.getMinX() - gap - w, f.getMinX(), f.getMaxX() - w));
            ys.addAll(List.of(f.getMaxY() + gap, f.getMinY() - gap - h, f.getMinY(), f.getMaxY() - h));
        }
        List<Envelope> out = new ArrayList<>();
        for (double y : ys) {
            for (double x : xs) {
                out.add(new Envelope(x, x + w, y, y + h));
            }
        }
        return out;
    }

    private static Envelope best(List<Envelope> candidates, String corner, Envelope main, Envelope whole, STRtree index,
                                 List<Envelope> frames, double gap) {
        for (boolean useCorner : new boolean[] {true, false}) {
            if (useCorner && corner.isEmpty()) {
                continue;
            }
            Envelope best = null;
            double bestScore = Double.NEGATIVE_INFINITY;
            for (Envelope f : candidates) {
                if (useCorner && !inCorner(f, corner, main)) {
                    continue;
                }
                if (!allowed(f, index, frames, gap)) {
                    continue;
                }
                Envelope grown = new Envelope(whole);
                grown.expandToInclude(f);
                double score = fill(grown);
                if (score > bestScore * (1 + 1e-9)) {
                    bestScore = score;
                    best = f;
                }
            }
            if (best != null) {
                return best;
            }
        }
        throw new IllegalStateException("no place for a frame"); // the outside candidates are always allowed
    }

    /** The share of a page (as wide as the map, at most MAX_ASPECT as tall) the map leaves, up to a constant. */
    static double fill(Envelope map) {
        double aspect = map.getHeight() / map.getWidth();
        return aspect <= MAX_ASPECT ? 1 / (map.getWidth() * map.getHeight()) : MAX_ASPECT / (map.getHeight() * map.getHeight());
    }

    private static boolean inCorner(Envelope f, String corner, Envelope main) {
        boolean left = f.centre().x < main.centre().x;
        boolean bottom = f.centre().y < main.centre().y;
        return switch (corner) {
            case "top-left" -> left && !bottom;
            case "top-right" -> !left && !bottom;
            case "bottom-left" -> left && bottom;
            case "bottom-right" -> !left && bottom;
            default -> true;
        };
    }

    /** Whether the whole frame lies in the corner's quarter of the main part (not only its centre). */
    private static boolean wholly(Envelope f, String corner, Envelope main) {
        Envelope quarter = new Envelope(corner.endsWith("left") ? Double.NEGATIVE_INFINITY : main.centre().x,
                corner.endsWith("left") ? main.centre().x : Double.POSITIVE_INFINITY,
                corner.startsWith("bottom") ? Double.NEGATIVE_INFINITY : main.centre().y,
                corner.startsWith("bottom") ? main.centre().y : Double.POSITIVE_INFINITY);
        return quarter.contains(f);
    }

    private static boolean allowed(Envelope frame, STRtree index, List<Envelope> frames, double gap) {
        Envelope grown = new Envelope(frame);
        grown.expandBy(gap);
        for (Envelope other : frames) {
            if (other.intersects(grown)) {
                return false;
            }
        }
        PreparedGeometry box = null;
        for (Object o : index.query(grown)) {
            if (box == null) {
                box = PreparedGeometryFactory.prepare(GEOMETRY.toGeometry(grown));
            }
            if (box.intersects((Geometry) o)) {
                return false;
            }
        }
        return true;
    }

    /**
     * Slides the frame towards the main part's centre, along x then y, as far as it stays allowed and, when a
     * corner was asked for and the frame lies wholly in that quarter, as far as it stays wholly there.
     */
    private static Envelope slide(Envelope frame, String corner, Envelope main, STRtree index, List<Envelope> frames, double gap) {
        boolean keepQuarter = !corner.isEmpty() && wholly(frame, corner, main);
        Envelope current = frame;
        for (int axis = 0; axis < 2; axis++) {
            double towards = axis == 0 ? main.centre().x - current.centre().x : main.centre().y - current.centre().y;
            double moved = 0;
            for (int step = 1; step <= SLIDE_STEPS; step++) {
                double trial = moved + towards / (1 << step);
                Envelope shifted = shift(current, axis == 0 ? trial : 0, axis == 0 ? 0 : trial);
                if (allowed(shifted, index, frames, gap) && (!keepQuarter || wholly(shifted, corner, main))) {
                    moved = trial;
                }
            }
            current = shift(current, axis == 0 ? moved : 0, axis == 0 ? 0 : moved);
        }
        return current;
    }

    private static Envelope shift(Envelope e, double dx, double dy) {
        return new Envelope(e.getMinX() + dx, e.getMaxX() + dx, e.getMinY() + dy, e.getMaxY() + dy);
    }
}
