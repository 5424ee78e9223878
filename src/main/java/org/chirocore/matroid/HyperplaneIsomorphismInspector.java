package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.List;
import java.util.Optional;

import org.jgrapht.Graph;
import org.jgrapht.GraphMapping;
import org.jgrapht.alg.isomorphism.VF2GraphIsomorphismInspector;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.graph.SimpleGraph;

/**
 * Decides whether two matroids are isomorphic and finds an element bijection when they are.
 *
 * <p>Method: a matroid of positive rank is determined by its hyperplanes ([Ox, §2.1]), so an
 * isomorphism of the bipartite element–hyperplane incidence graphs that sends elements to
 * elements and hyperplanes to hyperplanes restricts to a matroid isomorphism, and every matroid
 * isomorphism extends to one. The graphs are compared by VF2 (JGraphT's
 * {@link VF2GraphIsomorphismInspector}) with a vertex comparator that keeps the two kinds of
 * vertex apart. Cheap invariants ({@link MatroidShape}: size, rank, basis count, hyperplane-size
 * histogram) are compared first. A rank-0 matroid has no hyperplanes and is all loops; any
 * bijection then works, and VF2 on the edgeless graphs finds one.
 *
 * <p>Cost: materialising each matroid (C(n, r) rank queries), enumerating hyperplanes (about
 * C(n, r − 1) rank queries), then VF2, which is exponential in the worst case but fast on the
 * incidence graphs of cores up to a few dozen elements. The bijection found is re-checked
 * against the bases ({@link Isomorphism#isIsomorphism}) before it is returned.
 *
 * <p>Both matroids must have at most 64 elements. Stateless apart from its input; each call of
 * {@link #find()} recomputes.
 */
public final class HyperplaneIsomorphismInspector {
    private final Matroid first;
    private final Matroid second;

    /** A vertex of the incidence graph: element {@code index}, or hyperplane number {@code index}. */
    private record Vertex(boolean element, int index) {
    }

    /** Compatible (0) exactly when both are elements or both are hyperplanes. */
    private static final Comparator<Vertex> SAME_KIND = Comparator.comparing(Vertex::element);

    /** An inspector for the pair; nothing is computed until {@link #find()}. */
    public HyperplaneIsomorphismInspector(Matroid first, Matroid second) {
        this.first = first;
        this.second = second;
    }

    /**
     * An isomorphism from the first matroid to the second, or empty when they are not
     * isomorphic.
     *
     * @throws InvalidMatroidException when a matroid has more than 64 elements
     * @throws IllegalStateException when the bijection read off the graph isomorphism fails the
     *     basis re-check (a defect in this class or in its input's rank oracle)
     */
    public Optional<Isomorphism> find() {
        ExplicitMatroid a = ExplicitMatroid.of(first);
        ExplicitMatroid b = ExplicitMatroid.of(second);
        List<int[]> hyperplanesA = MatroidShape.hyperplanes(first);
        List<int[]> hyperplanesB = MatroidShape.hyperplanes(second);
        if (!MatroidShape.of(a, hyperplanesA).equals(MatroidShape.of(b, hyperplanesB))) {
            return Optional.empty();
        }
        Graph<Vertex, DefaultEdge> graphA = incidenceGraph(a.size(), hyperplanesA);
        Graph<Vertex, DefaultEdge> graphB = incidenceGraph(b.size(), hyperplanesB);
        Iterator<GraphMapping<Vertex, DefaultEdge>> mappings =
                new VF2GraphIsomorphismInspector<>(graphA, graphB, SAME_KIND, null).getMappings();
        if (!mappings.hasNext()) {
            return Optional.empty();
        }
        GraphMapping<Vertex, DefaultEdge> mapping = mappings.next();
        List<Integer> image = new ArrayList<>(a.size());
        for (int e = 0; e < a.size(); e++) {
            image.add(mapping.getVertexCorrespondence(new Vertex(true, e), true).index());
        }
        Isomorphism iso = new Isomorphism(image);
        if (!iso.isIsomorphism(a, b)) {
            throw new IllegalStateException("The incidence-graph isomorphism gives the element bijection " + image
                    + ", which does not map bases to bases.");
        }
        return Optional.of(iso);
    }

    private static Graph<Vertex, DefaultEdge> incidenceGraph(int elements, List<int[]> hyperplanes) {
        Graph<Vertex, DefaultEdge> g = new SimpleGraph<>(DefaultEdge.class);
        for (int e = 0; e < elements; e++) {
            g.addVertex(new Vertex(true, e));
        }
        for (int h = 0; h < hyperplanes.size(); h++) {
            Vertex hv = new Vertex(false, h);
            g.addVertex(hv);
            for (int e : hyperplanes.get(h)) {
                g.addEdge(new Vertex(true, e), hv);
            }
        }
        return g;
    }
}
