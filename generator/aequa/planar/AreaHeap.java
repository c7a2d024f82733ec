package aequa.planar;

import java.util.Arrays;

/**
 * An indexed binary min-heap of the inner vertices of one edge, keyed by triangle area: each vertex is in
 * the heap at most once and its key can be changed in place, so no stale entries pile up and nothing is
 * boxed (Sedgewick &amp; Wayne, Algorithms 4th ed., section 2.4, "index priority queue"). Equal areas are
 * ordered by vertex position, so the order of removal is deterministic. Reused edge after edge.
 */
final class AreaHeap {

    private double[] areaM2 = new double[16];
    /** heap[k]: the vertex at heap position k. */
    private int[] heap = new int[16];
    /** positionOf[v]: where vertex v sits in the heap, or -1. */
    private int[] positionOf = new int[16];
    private int size;

    /** Empties the heap and makes room for vertices 0 .. vertexCount - 1. */
    void reset(int vertexCount) {
        if (positionOf.length < vertexCount) {
            int capacity = Math.max(vertexCount, 2 * positionOf.length);
            areaM2 = new double[capacity];
            heap = new int[capacity];
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
        areaM2[vertex] = area;
        if (k < 0) {
            k = size++;
            heap[k] = vertex;
            positionOf[vertex] = k;
        }
        siftDown(siftUp(k));
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
            heap[k] = heap[size];
            positionOf[heap[k]] = k;
            siftDown(siftUp(k));
        }
    }

    /** Removes and returns the vertex of smallest area (ties: smallest vertex). */
    int poll() {
        int top = heap[0];
        remove(top);
        return top;
    }

    private int siftUp(int k) {
        int vertex = heap[k];
        while (k > 0) {
            int parent = (k - 1) >>> 1;
            if (!less(vertex, heap[parent])) {
                break;
            }
            place(heap[parent], k);
            k = parent;
        }
        place(vertex, k);
        return k;
    }

    private void siftDown(int k) {
        int vertex = heap[k];
        while (true) {
            int child = 2 * k + 1;
            if (child >= size) {
                break;
            }
            if (child + 1 < size && less(heap[child + 1], heap[child])) {
                child++;
            }
            if (!less(heap[child], vertex)) {
                break;
            }
            place(heap[child], k);
            k = child;
        }
        place(vertex, k);
    }

    private void place(int vertex, int k) {
        heap[k] = vertex;
        positionOf[vertex] = k;
    }

    private boolean less(int v, int w) {
        return areaM2[v] < areaM2[w] || (areaM2[v] == areaM2[w] && v < w);
    }
}
