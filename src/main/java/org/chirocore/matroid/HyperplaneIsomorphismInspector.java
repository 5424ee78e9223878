package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Arrays;
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
 * <p>Method: a matroid of positive rank is determined by its hyperplanes ([Ox, §2.1]); in
 * fact by those with at least r elements, because an r-set is a non-basis exactly when it lies
 * in some hyperplane, which then has at least r elements. So an isomorphism of the bipartite
 * incidence graphs between elements and these large hyperplanes that sends elements to elements
 * and hyperplanes to hyperplanes restricts to a matroid isomorphism, and every matroid
 * isomorphism extends to one. Leaving out the small hyperplanes (independent (r − 1)-sets,
 * most of the hyperplanes of a sparse paving matroid) keeps the graphs small; on the full
 * hyperplane graph of a renumbered Vámos matroid (36 interchangeable 3-element hyperplanes)
 * VF2 took minutes even with the colours below, on the large hyperplanes milliseconds. Cheap invariants
 * ({@link MatroidShape}: size, rank, basis count, hyperplane-size histogram) are compared
 * first. The vertices of both graphs are then coloured by joint colour refinement, starting
 * from the two kinds (element, hyperplane), and the graphs are compared by VF2 (JGraphT's
 * {@link VF2GraphIsomorphismInspector}) with a vertex comparator that matches only vertices of
 * the same kind and colour. A matroid with no large hyperplane (rank 0, or uniform) gives an
 * edgeless graph, on which any bijection of the elements works, as it should.
 *
 * <p>Cost: materialising each matroid (C(n, r) rank queries), enumerating hyperplanes (about
 * C(n, r − 1) rank queries), colour refinement (polynomial), then VF2, which is exponential in
 * the worst case but fast on the refined incidence graphs of cores up to a few dozen elements.
 * The bijection found is re-checked against the bases ({@link Isomorphism#isIsomorphism})
 * before it is returned.
 *
 * <p>Both matroids must have at most {@link Limits#ELEMENTS} elements. Stateless apart from its input; each call of
 * {@link #find()} recomputes.
 */
public final class HyperplaneIsomorphismInspector {
    private final Matroid first;
    private final Matroid second;

    /**
     * A vertex of an incidence graph: element {@code index} or hyperplane number {@code index},
     * with its stable refinement colour.
     */
    private record Vertex(boolean element, int index, int colour) {
    }

    /** Compatible (0) exactly when both vertices are of the same kind and colour. */
    private static final Comparator<Vertex> SAME_KIND_AND_COLOUR =
            Comparator.comparing(Vertex::element).thenComparingInt(Vertex::colour);

    /** An inspector for the pair; nothing is computed until {@link #find()}. */
    public HyperplaneIsomorphismInspector(Matroid first, Matroid second) {
        this.first = first;
        this.second = second;
    }

    /**
     * An isomorphism from the first matroid to the second, or empty when they are not
     * isomorphic.
     *
     * @throws InvalidMatroidException when a matroid has more than {@link Limits#ELEMENTS} elements
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
        List<int[]> largeA = atLeast(a.rank(), hyperplanesA);
        List<int[]> largeB = atLeast(b.rank(), hyperplanesB);
        int[][] adjacencyA = incidence(a.size(), largeA);
        int[][] adjacencyB = incidence(b.size(), largeB);
        List<int[]> colours = ColourRefinement.stableColours(List.of(adjacencyA, adjacencyB),
                List.of(kinds(a.size(), largeA.size()), kinds(b.size(), largeB.size())));
        if (!Arrays.equals(sorted(colours.get(0)), sorted(colours.get(1)))) {
            return Optional.empty();
        }
        List<Vertex> verticesA = vertices(a.size(), colours.get(0));
        List<Vertex> verticesB = vertices(b.size(), colours.get(1));
        Iterator<GraphMapping<Vertex, DefaultEdge>> mappings = new VF2GraphIsomorphismInspector<>(
                graph(verticesA, adjacencyA), graph(verticesB, adjacencyB), SAME_KIND_AND_COLOUR, null)
                .getMappings();
        if (!mappings.hasNext()) {
            return Optional.empty();
        }
        GraphMapping<Vertex, DefaultEdge> mapping = mappings.next();
        List<Integer> image = new ArrayList<>(a.size());
        for (int e = 0; e < a.size(); e++) {
            image.add(mapping.getVertexCorrespondence(verticesA.get(e), true).index());
        }
        Isomorphism iso = new Isomorphism(image);
        if (!iso.isIsomorphism(a, b)) {
            throw new IllegalStateException("The incidence-graph isomorphism gives the element bijection " + image
                    + ", which does not map bases to bases.");
        }
        return Optional.of(iso);
    }

    /** The hyperplanes with at least {@code size} elements. */
    private static List<int[]> atLeast(int size, List<int[]> hyperplanes) {
        return hyperplanes.stream().filter(h -> h.length >= size).toList();
    }

    /** Neighbour lists of the incidence graph: vertices 0..n−1 are elements, n + h is hyperplane h. */
    private static int[][] incidence(int elements, List<int[]> hyperplanes) {
        List<List<Integer>> around = new ArrayList<>();
        for (int v = 0; v < elements + hyperplanes.size(); v++) {
            around.add(new ArrayList<>());
        }
        for (int h = 0; h < hyperplanes.size(); h++) {
            for (int e : hyperplanes.get(h)) {
                around.get(e).add(elements + h);
                around.get(elements + h).add(e);
            }
        }
        return around.stream().map(l -> l.stream().mapToInt(Integer::intValue).toArray()).toArray(int[][]::new);
    }

    /** The starting colours: 0 for elements, 1 for hyperplanes. */
    private static int[] kinds(int elements, int hyperplanes) {
        int[] kind = new int[elements + hyperplanes];
        Arrays.fill(kind, elements, kind.length, 1);
        return kind;
    }

    private static int[] sorted(int[] values) {
        int[] copy = values.clone();
        Arrays.sort(copy);
        return copy;
    }

    private static List<Vertex> vertices(int elements, int[] colours) {
        List<Vertex> out = new ArrayList<>(colours.length);
        for (int v = 0; v < colours.length; v++) {
            out.add(v < elements ? new Vertex(true, v, colours[v]) : new Vertex(false, v - elements, colours[v]));
        }
        return out;
    }

    private static Graph<Vertex, DefaultEdge> graph(List<Vertex> vertices, int[][] adjacency) {
        Graph<Vertex, DefaultEdge> g = new SimpleGraph<>(DefaultEdge.class);
        vertices.forEach(g::addVertex);
        for (int v = 0; v < adjacency.length; v++) {
            for (int w : adjacency[v]) {
                if (v < w) {
                    g.addEdge(vertices.get(v), vertices.get(w));
                }
            }
        }
        return g;
    }
}
