package aequa.planar;

import java.util.List;

/**
 * The distinct vertices of a coverage on a uniform grid of about one vertex per cell, renumbered cell by
 * cell: the vertices of a cell have consecutive numbers and their coordinates lie side by side in memory,
 * so the question the simplifier asks for every removal, "does any other live vertex lie inside or on this
 * triangle?", is answered by sweeping a few short runs of memory. Vertices can be removed, not added.
 */
final class VertexGrid {

    private final VertexTable vertices;
    private final boolean[] removed;
    private final double minX;
    private final double minY;
    private final double cellM;
    private final int columns;
    private final int rows;
    /** The vertices of cell c are numbers cellStart[c] .. cellStart[c + 1] - 1. */
    private final int[] cellStart;

    /**
     * Renumbers the points of {@code table} cell by cell (see {@link VertexTable#renumber}; they keep
     * their order within a cell) and the vertex numbers in {@code rings} to match, both in place.
     */
    VertexGrid(VertexTable table, List<int[]> rings) {
        this.vertices = table;
        int n = table.size();
        double loX = Double.POSITIVE_INFINITY;
        double loY = Double.POSITIVE_INFINITY;
        double hiX = Double.NEGATIVE_INFINITY;
        double hiY = Double.NEGATIVE_INFINITY;
        for (int v = 0; v < n; v++) {
            loX = Math.min(loX, table.x(v));
            loY = Math.min(loY, table.y(v));
            hiX = Math.max(hiX, table.x(v));
            hiY = Math.max(hiY, table.y(v));
        }
        minX = n == 0 ? 0 : loX;
        minY = n == 0 ? 0 : loY;
        double spanM = n == 0 ? 1 : Math.max(Math.max(hiX - loX, hiY - loY), Double.MIN_NORMAL);
        int side = (int) Math.max(1, Math.min(4096, Math.ceil(Math.sqrt(n))));
        cellM = spanM / side;
        columns = side + 1;
        rows = side + 1;
        cellStart = new int[columns * rows + 1];
        int[] gridIdOf = new int[n];
        for (int v = 0; v < n; v++) {
            gridIdOf[v] = cell(column(table.x(v)), row(table.y(v)));
            cellStart[gridIdOf[v] + 1]++;
        }
        for (int c = 0; c < columns * rows; c++) {
            cellStart[c + 1] += cellStart[c];
        }
        // counting sort: each vertex takes the next number of its cell, which moves cellStart[c] on to
        // where cell c + 1 starts; shifting the array by one then restores the starts
        for (int v = 0; v < n; v++) {
            gridIdOf[v] = cellStart[gridIdOf[v]]++;
        }
        System.arraycopy(cellStart, 0, cellStart, 1, cellStart.length - 1);
        cellStart[0] = 0;
        for (int[] ring : rings) {
            for (int i = 0; i < ring.length; i++) {
                ring[i] = gridIdOf[ring[i]];
            }
        }
        table.renumber(gridIdOf);
        removed = new boolean[n];
    }

    int size() {
        return removed.length;
    }

    double x(int vertex) {
        return vertices.x(vertex);
    }

    double y(int vertex) {
        return vertices.y(vertex);
    }

    void remove(int vertex) {
        removed[vertex] = true;
    }

    /** Whether a live vertex other than a, v, b lies inside or on the triangle (a, v, b), closed. */
    boolean anyInTriangle(int a, int v, int b) {
        double ax = x(a);
        double ay = y(a);
        double vx = x(v);
        double vy = y(v);
        double bx = x(b);
        double by = y(b);
        double loX = Math.min(ax, Math.min(vx, bx));
        double hiX = Math.max(ax, Math.max(vx, bx));
        double loY = Math.min(ay, Math.min(vy, by));
        double hiY = Math.max(ay, Math.max(vy, by));
        int firstColumn = column(loX);
        int lastColumn = column(hiX);
        for (int r = row(loY), lastRow = row(hiY); r <= lastRow; r++) {
            // the cells of one row of the box are consecutive, and so are their vertices
            for (int p = cellStart[cell(firstColumn, r)], end = cellStart[cell(lastColumn, r) + 1]; p < end; p++) {
                double px = vertices.x(p);
                double py = vertices.y(p);
                if (px >= loX && px <= hiX && py >= loY && py <= hiY && !removed[p]
                        && p != a && p != v && p != b && insideOrOn(ax, ay, vx, vy, bx, by, px, py)) {
                    return true;
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
