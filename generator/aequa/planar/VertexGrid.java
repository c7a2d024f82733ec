package aequa.planar;

/**
 * A fixed uniform grid over the live vertices of a {@link VertexTable}, about one vertex per cell, answering
 * "does any other live vertex lie inside or on this triangle?". Vertices can be removed, not added.
 */
final class VertexGrid {

    private final VertexTable vertices;
    private final double minX;
    private final double minY;
    private final double cellM;
    private final int columns;
    private final int rows;
    private final int[] cellStart;
    private final int[] members;
    private final boolean[] removed;

    VertexGrid(VertexTable vertices) {
        this.vertices = vertices;
        int n = vertices.size();
        double loX = Double.POSITIVE_INFINITY;
        double loY = Double.POSITIVE_INFINITY;
        double hiX = Double.NEGATIVE_INFINITY;
        double hiY = Double.NEGATIVE_INFINITY;
        for (int v = 0; v < n; v++) {
            loX = Math.min(loX, vertices.x(v));
            loY = Math.min(loY, vertices.y(v));
            hiX = Math.max(hiX, vertices.x(v));
            hiY = Math.max(hiY, vertices.y(v));
        }
        minX = n == 0 ? 0 : loX;
        minY = n == 0 ? 0 : loY;
        double spanM = n == 0 ? 1 : Math.max(Math.max(hiX - loX, hiY - loY), Double.MIN_NORMAL);
        int side = (int) Math.max(1, Math.min(4096, Math.ceil(Math.sqrt(n))));
        cellM = spanM / side;
        columns = side + 1;
        rows = side + 1;
        cellStart = new int[columns * rows + 1];
        members = new int[n];
        removed = new boolean[n];
        int[] cellOf = new int[n];
        for (int v = 0; v < n; v++) {
            cellOf[v] = cell(column(vertices.x(v)), row(vertices.y(v)));
            cellStart[cellOf[v] + 1]++;
        }
        for (int c = 0; c < columns * rows; c++) {
            cellStart[c + 1] += cellStart[c];
        }
        int[] fill = cellStart.clone();
        for (int v = 0; v < n; v++) {
            members[fill[cellOf[v]]++] = v;
        }
    }

    void remove(int vertex) {
        removed[vertex] = true;
    }

    /** Whether a live vertex other than a, v, b lies inside or on the triangle (a, v, b), closed. */
    boolean anyInTriangle(int a, int v, int b) {
        double ax = vertices.x(a);
        double ay = vertices.y(a);
        double vx = vertices.x(v);
        double vy = vertices.y(v);
        double bx = vertices.x(b);
        double by = vertices.y(b);
        double loX = Math.min(ax, Math.min(vx, bx));
        double hiX = Math.max(ax, Math.max(vx, bx));
        double loY = Math.min(ay, Math.min(vy, by));
        double hiY = Math.max(ay, Math.max(vy, by));
        for (int r = row(loY); r <= row(hiY); r++) {
            for (int c = column(loX); c <= column(hiX); c++) {
                int cell = cell(c, r);
                for (int k = cellStart[cell]; k < cellStart[cell + 1]; k++) {
                    int p = members[k];
                    if (removed[p] || p == a || p == v || p == b) {
                        continue;
                    }
                    double px = vertices.x(p);
                    double py = vertices.y(p);
                    if (px >= loX && px <= hiX && py >= loY && py <= hiY
                            && insideOrOn(ax, ay, vx, vy, bx, by, px, py)) {
                        return true;
                    }
                }
            }
        }
        return false;
    }

    /** Sign test of the three edge orientations (common practice); a point in the bounding box of a degenerate triangle counts as on it. */
    private static boolean insideOrOn(double ax, double ay, double vx, double vy, double bx, double by,
                                      double px, double py) {
        double d1 = (vx - ax) * (py - ay) - (vy - ay) * (px - ax);
        double d2 = (bx - vx) * (py - vy) - (by - vy) * (px - vx);
        double d3 = (ax - bx) * (py - by) - (ay - by) * (px - bx);
        boolean negative = d1 < 0 || d2 < 0 || d3 < 0;
        boolean positive = d1 > 0 || d2 > 0 || d3 > 0;
        return !(negative && positive);
    }

    private int column(double x) {
        return (int) Math.min(columns - 1, Math.max(0, (x - minX) / cellM));
    }

    private int row(double y) {
        return (int) Math.min(rows - 1, Math.max(0, (y - minY) / cellM));
    }

    private int cell(int column, int row) {
        return row * columns + column;
    }
}
