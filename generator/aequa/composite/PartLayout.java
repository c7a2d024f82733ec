package aequa.composite;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

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
 * or three, breaking between words, when that makes the frame at least {@value #MORE_LINES_SAVING} smaller in
 * area (then the frame is as wide as the longest line, not the whole name). A part drawn at another area
 * scale than the main part also has a band at the bottom for its own area-scale square. Parts are placed
 * one by one, largest first. The candidate places for a frame line it up with an edge of the main part's
 * extent, of the map so far, or of a frame already placed, inside or just outside them; a place is allowed
 * when the frame, grown by a gap, touches no region of the main part and no other frame. Among the allowed
 * places the one that leaves the map filling the most of its page wins (the page as wide as the map and at
 * most {@value #MAX_ASPECT} times as tall, the drawing's own limit); a preferred corner, when given, limits the
 * candidates to that quarter of the main part when any there is allowed. The winner is then slid towards the
 * main part, across the side it lies beside (or diagonally from a corner), as far as it stays allowed, which
 * tucks frames into empty corners. Every step is arithmetic on fixed candidate lists, so the same parts always
 * get the same places. A caller that knows how small the map will be drawn asks for a least name band, as a
 * share of the map's drawn width; the layout then searches the least growth of the bands, names and area-scale
 * bands at which every frame finds a place on a page whose drawn width makes the band that share.
 */
public final class PartLayout {

    /** Frame margin, gap between frames and regions, and name band, as shares of the main part's larger side (chosen by eye). */
    static final double MARGIN_SHARE = 0.012;
    static final double GAP_SHARE = 0.02;
    static final double NAME_BAND_SHARE = 0.04;
    /** A name takes another line only when that makes its frame at least this share smaller (by eye). */
    static final double MORE_LINES_SAVING = 0.1;
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
    /**
     * The search for the least growth of the name bands at which every frame finds a place on the page: steps of
     * {@value #GROWTH_STEP} times (at most {@value #GROWTH_STEPS} of them, about 66 times the least growth), then
     * {@value #BISECTIONS} halvings of the last step.
     */
    static final double GROWTH_STEP = 1.15;
    static final int GROWTH_STEPS = 30;
    static final int BISECTIONS = 4;
    /** Rounding room on the page's bounds, so that a map exactly as wide as its page fits. */
    private static final double PAGE_SLACK = 1 + 1e-9;
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
     * together, from the least growth at which the main part alone fits such a page, in steps of
     * {@value #GROWTH_STEP} times until every frame finds a place on the page (so the frames cannot spread the map
     * wider than its bands allow), then by halving the last step; the least growth found is the largest map.
     * When no growth gives every frame a place (a word wider than the page), the frames keep the least growth on
     * an unbounded page and a name may reach past its band.
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
        if (minBandShare <= 0) {
            return place(main, index, insets, 1, Double.POSITIVE_INFINITY);
        }
        double ownBand = NAME_BAND_SHARE * Math.max(main.getWidth(), main.getHeight());
        // the page (metres) whose drawn width makes a band of growth g exactly minBandShare of it
        DoubleUnaryOperator pageWidth = g -> g * ownBand / minBandShare;
        double lowest = Math.max(1, minBandShare * Math.max(main.getWidth(), main.getHeight() / MAX_ASPECT) / ownBand);
        double tooSmall = Double.NaN;
        double growth = lowest;
        List<Placement> found = place(main, index, insets, growth, pageWidth.applyAsDouble(growth));
        for (int step = 0; found == null && step < GROWTH_STEPS; step++) {
            tooSmall = growth;
            growth *= GROWTH_STEP;
            found = place(main, index, insets, growth, pageWidth.applyAsDouble(growth));
        }
        if (found == null) {
            // no page holds the names at their least share (a word longer than the print is wide): the layout
            // keeps its own proportions at the least growth on an unbounded page, and a name may run past its band
            return place(main, index, insets, lowest, Double.POSITIVE_INFINITY);
        }
        for (int round = 0; round < BISECTIONS && !Double.isNaN(tooSmall); round++) {
            double middle = Math.sqrt(tooSmall * growth);
            List<Placement> trial = place(main, index, insets, middle, pageWidth.applyAsDouble(middle));
            if (trial == null) {
                tooSmall = middle;
            } else {
                growth = middle;
                found = trial;
            }
        }
        return found;
    }

    /**
     * The layout with name bands, names and area-scale bands {@code growth} times their own proportions, on a
     * page {@code pageWidthM} wide and at most {@value #MAX_ASPECT} times as tall, or null when a frame finds
     * no place on it.
     */
    private static List<Placement> place(Envelope main, STRtree index, List<Inset> insets, double growth, double pageWidthM) {
        double pageHeightM = MAX_ASPECT * pageWidthM;
        if (main.getWidth() > pageWidthM * PAGE_SLACK || main.getHeight() > pageHeightM * PAGE_SLACK) {
            return null;
        }
        double side = Math.max(main.getWidth(), main.getHeight());
        double gap = GAP_SHARE * side;
        List<Envelope> frames = new ArrayList<>();
        Envelope whole = new Envelope(main);
        List<Placement> placements = new ArrayList<>();
        for (Inset inset : insets) {
            Envelope c = inset.contentM();
            FrameSize size = FrameSize.smallest(inset, side, growth);
            double w = size.widthM();
            double h = size.heightM();
            Envelope best = best(candidates(main, whole, frames, w, h, gap), inset.corner(), main, whole, index, frames, gap,
                    pageWidthM * PAGE_SLACK, pageHeightM * PAGE_SLACK);
            if (best == null) {
                return null;
            }
            best = slide(best, inset.corner(), main, index, frames, gap);
            frames.add(best);
            whole.expandToInclude(best);
            double dx = best.getMinX() + (best.getWidth() - c.getWidth()) / 2 - c.getMinX();
            double dy = best.getMinY() + size.scaleBandM() + MARGIN_SHARE * side - c.getMinY();
            placements.add(new Placement(dx, dy, best, size.nameBandM(), size.nameLines(), size.scaleBandM()));
        }
        return placements;
    }

    /**
     * A frame's size: its regions with a margin, its name band above them, its area-scale band below them (when
     * it has one), and as wide as the widest of the three.
     */
    private record FrameSize(double widthM, double heightM, double nameBandM, int nameLines, double scaleBandM) {

        /**
         * The frame whose name takes the lines (1 to {@value #MAX_NAME_LINES}) that make it smallest in area; more
         * lines only when they save at least {@value #MORE_LINES_SAVING} of it.
         */
        static FrameSize smallest(Inset inset, double side, double growth) {
            Envelope c = inset.contentM();
            double margin = MARGIN_SHARE * side;
            double band = NAME_BAND_SHARE * side * growth;
            double scaleBand = inset.ownScale() ? SCALE_BAND_SHARE * side * growth : 0;
            double scaleW = inset.ownScale() ? scaleBand + SCALE_LABEL_CHARS * NAME_CHAR_SHARE * band + 2 * margin : 0;
            FrameSize best = null;
            for (int lines = 1; lines <= MAX_NAME_LINES; lines++) {
                double nameBand = band * (1 + EXTRA_LINE_BAND * (lines - 1));
                double nameW = growth * inset.widthInLinesM(lines) + 2 * margin;
                double w = Math.max(c.getWidth() + 2 * margin, Math.max(nameW, scaleW));
                double h = c.getHeight() + 2 * margin + nameBand + scaleBand;
                if (best == null || w * h < best.widthM() * best.heightM() * (1 - MORE_LINES_SAVING)) {
                    best = new FrameSize(w, h, nameBand, lines, scaleBand);
                }
            }
            return best;
        }
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
                                 List<Envelope> frames, double gap, double pageWidthM, double pageHeightM) {
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
                Envelope grown = new Envelope(whole);
                grown.expandToInclude(f);
                if (grown.getWidth() > pageWidthM || grown.getHeight() > pageHeightM || !allowed(f, index, frames, gap)) {
                    continue;
                }
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
        return null; // on an unbounded page the outside candidates are always allowed
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
            if (!approaches(current, main, axis)) {
                continue;
            }
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

    /**
     * Whether sliding along {@code axis} (0 for x) brings the frame nearer the main part rather than along it: the
     * frame lies beside the main part on that axis (its span on the other axis overlaps the main part's), or off
     * a corner (its spans overlap on neither). A frame below the main part that slid sideways to the middle would
     * split the room left beside it in two.
     */
    private static boolean approaches(Envelope frame, Envelope main, int axis) {
        boolean besideX = frame.getMaxY() > main.getMinY() && frame.getMinY() < main.getMaxY();
        boolean besideY = frame.getMaxX() > main.getMinX() && frame.getMinX() < main.getMaxX();
        return (axis == 0 ? besideX : besideY) || (!besideX && !besideY);
    }

    private static Envelope shift(Envelope e, double dx, double dy) {
        return new Envelope(e.getMinX() + dx, e.getMaxX() + dx, e.getMinY() + dy, e.getMaxY() + dy);
    }
}
