package aequa.planar;

import java.util.Arrays;

/**
 * An indexed binary min-heap of the inner vertices of one edge, keyed by triangle area: each vertex is in
 * the heap at most once and its key can be changed in place, so no stale entries pile up and nothing is
 * boxed (Sedgewick &amp; Wayne, Algorithms 4th ed., section 2.4, "index priority queue"). Keys are stored
 * beside the vertex at each heap position, so a comparison reads one place. Equal areas are ordered by
 * vertex, so the order of removal is deterministic. Reused edge after edge.
 */
final class AreaHeap {

    /** The vertex at heap position k, and its area. */
    private int[] vertexAt = new int[16];
    private double[] areaAt = new double[16];
    /** Where vertex v sits in the heap, or -1. */
    private int[] positionOf = new int[16];
    private int size;

    /** Empties the heap and makes room for vertices 0 .. vertexCount - 1. */
    void reset(int vertexCount) {
        if (positionOf.length < vertexCount) {
            int capacity = Math.max(vertexCount, 2 * positionOf.length);
            vertexAt = new int[capacity];
            areaAt = new double[capacity];
            positionOf = new int[capacity];
        }
        Arrays.fill(positionOf, 0, vertexCount, -1);
        size = 0;
    }

    boolean isEmpty() {
        return size == 0;
    }

    /** Inserts {@code vertex} with this area, or changes its area when it is already queued. */
    void put(int vertex, double area) {
        int k = positionOf[vertex];
        if (k < 0) {
            k = size++;
        }
        settle(vertex, area, k);
    }

    /** Takes {@code vertex} out of the heap if it is queued. */
    void remove(int vertex) {
        int k = positionOf[vertex];
        if (k < 0) {
            return;
        }
        positionOf[vertex] = -1;
        size--;
        if (k < size) {
            settle(vertexAt[size], areaAt[size], k);
        }
    }

    /** Removes and returns the vertex of smallest area (ties: smallest vertex). */
    int poll() {
        int top = vertexAt[0];
        remove(top);
        return top;
    }

    /** Puts (vertex, area) into the hole at position k, moving it up or down to where it belongs. */
    private void settle(int vertex, double area, int k) {
        while (k > 0) {
            int parent = (k - 1) >>> 1;
            if (!less(area, vertex, areaAt[parent], vertexAt[parent])) {
                break;
            }
            place(vertexAt[parent], areaAt[parent], k);
            k = parent;
        }
        while (true) {
            int child = 2 * k + 1;
            if (child >= size) {
                break;
            }
            if (child + 1 < size && less(areaAt[child + 1], vertexAt[child + 1], areaAt[child], vertexAt[child])) {
                child++;
            }
            if (!less(areaAt[child], vertexAt[child], area, vertex)) {
                break;
            }
            place(vertexAt[child], areaAt[child], k);
            k = child;
        }
        place(vertex, area, k);
    }

    private void place(int vertex, double area, int k) {
        vertexAt[k] = vertex;
        areaAt[k] = area;
        positionOf[vertex] = k;
    }

    private static boolean less(double area, int vertex, double otherArea, int otherVertex) {
        return area < otherArea || (area == otherArea && vertex < otherVertex);
    }
}
