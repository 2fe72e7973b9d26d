package org.streetcomb.solve;

import java.util.AbstractSet;
import java.util.Iterator;
import java.util.NoSuchElementException;
import java.util.Set;
import java.util.function.Supplier;
import org.jgrapht.GraphType;
import org.jgrapht.graph.AbstractGraph;
import org.jgrapht.graph.DefaultGraphType;

/**
 * The matching's candidate pairs as a read-only JGraphT graph over primitive arrays: vertices are the
 * integers 0..n-1, edge i joins {@code source[i]} and {@code target[i]} with weight {@code weight[i]}.
 *
 * <p>Why by hand: Blossom V ({@code KolmogorovWeightedPerfectMatching}) reads its input graph only through
 * the vertex and edge sets, the edge ends and the weights, and builds its own structure from them. A
 * {@code SimpleWeightedGraph} keeps a hash map of boxed edge objects and an index for fast lookup that
 * Blossom V never uses; building it was a fifth of the solve on town-like grids (JFR samples, 300k odd
 * nodes). The sparse primitive graphs of JGraphT live in its optional module, which the registry here does
 * not serve. Incidence queries are not needed by Blossom V and are refused.
 */
final class CandidateGraph extends AbstractGraph<Integer, Integer> {

    private static final GraphType TYPE = new DefaultGraphType.Builder()
            .undirected().weighted(true).allowMultipleEdges(false).allowSelfLoops(false).build();

    private final int vertices;
    private final int[] source;
    private final int[] target;
    private final double[] weight;
    private final Set<Integer> vertexSet;
    private final Set<Integer> edgeSet;

    /** The arrays are kept, not copied; {@code source.length} edges. */
    CandidateGraph(int vertices, int[] source, int[] target, double[] weight) {
        this.vertices = vertices;
        this.source = source;
        this.target = target;
        this.weight = weight;
        this.vertexSet = new Range(vertices);
        this.edgeSet = new Range(source.length);
    }

    @Override
    public Set<Integer> vertexSet() {
        return vertexSet;
    }

    @Override
    public Set<Integer> edgeSet() {
        return edgeSet;
    }

    @Override
    public Integer getEdgeSource(Integer e) {
        return source[e];
    }

    @Override
    public Integer getEdgeTarget(Integer e) {
        return target[e];
    }

    @Override
    public double getEdgeWeight(Integer e) {
        return weight[e];
    }

    @Override
    public boolean containsVertex(Integer v) {
        return v != null && v >= 0 && v < vertices;
    }

    @Override
    public boolean containsEdge(Integer e) {
        return e != null && e >= 0 && e < source.length;
    }

    @Override
    public GraphType getType() {
        return TYPE;
    }

    @Override
    public Supplier<Integer> getVertexSupplier() {
        return null;
    }

    @Override
    public Supplier<Integer> getEdgeSupplier() {
        return null;
    }

    @Override
    public Set<Integer> getAllEdges(Integer u, Integer v) {
        throw readOnly();
    }

    @Override
    public Integer getEdge(Integer u, Integer v) {
        throw readOnly();
    }

    @Override
    public Integer addEdge(Integer u, Integer v) {
        throw readOnly();
    }

    @Override
    public boolean addEdge(Integer u, Integer v, Integer e) {
        throw readOnly();
    }

    @Override
    public Integer addVertex() {
        throw readOnly();
    }

    @Override
    public boolean addVertex(Integer v) {
        throw readOnly();
    }

    @Override
    public int degreeOf(Integer v) {
        throw readOnly();
    }

    @Override
    public Set<Integer> edgesOf(Integer v) {
        throw readOnly();
    }

    @Override
    public int inDegreeOf(Integer v) {
        throw readOnly();
    }

    @Override
    public Set<Integer> incomingEdgesOf(Integer v) {
        throw readOnly();
    }

    @Override
    public int outDegreeOf(Integer v) {
        throw readOnly();
    }

    @Override
    public Set<Integer> outgoingEdgesOf(Integer v) {
        throw readOnly();
    }

    @Override
    public Integer removeEdge(Integer u, Integer v) {
        throw readOnly();
    }

    @Override
    public boolean removeEdge(Integer e) {
        throw readOnly();
    }

    @Override
    public boolean removeVertex(Integer v) {
        throw readOnly();
    }

    @Override
    public void setEdgeWeight(Integer e, double w) {
        throw readOnly();
    }

    private static UnsupportedOperationException readOnly() {
        return new UnsupportedOperationException("the candidate graph only serves Blossom V's reads");
    }

    /** The integers 0..size-1 as an unmodifiable set. */
    private static final class Range extends AbstractSet<Integer> {
        private final int size;

        Range(int size) {
            this.size = size;
        }

        @Override
        public int size() {
            return size;
        }

        @Override
        public boolean contains(Object o) {
            return o instanceof Integer i && i >= 0 && i < size;
        }

        @Override
        public Iterator<Integer> iterator() {
            return new Iterator<>() {
                private int next;

                @Override
                public boolean hasNext() {
                    return next < size;
                }

                @Override
                public Integer next() {
                    if (next >= size) {
                        throw new NoSuchElementException();
                    }
                    return next++;
                }
            };
        }
    }
}
