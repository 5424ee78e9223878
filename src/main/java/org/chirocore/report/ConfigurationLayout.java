package org.chirocore.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.ElementSet;

/**
 * Places a rank-3 configuration in the plane the way a geometer draws it: as many lines as
 * possible straight. The points get rational coordinates (homogeneous integers), found by a
 * backtracking search whose incidence decisions are exact ({@link Homogeneous}): three points
 * of a line drawn straight are collinear, three points on no common line are not. First all
 * lines but one are asked to be straight (all of them cannot be: the cores are non-orientable,
 * and a real realisation would orient them), then all but the lines through one element
 * (the configuration minus that element realised), then all but two; the first placement found
 * wins. A line not drawn straight is a smooth closed curve through its points: the circle
 * through them when it has three (the Fano plane's circle), otherwise a closed Catmull–Rom
 * spline through them in angular order. A placement is kept only if every point off a drawn
 * line or curve is at least {@value #CLEARANCE} from it (the points' spread being about 1). Doubles are used for the
 * drawing only; nothing is decided by them.
 *
 * <p>Cost: at most {@value #MAX_NODES} search nodes in all ({@value #MAX_ATTEMPT_NODES} per set of
 * straight lines), each O(k²) for k points.
 */
final class ConfigurationLayout {
    /** Search nodes allowed over all attempts: the bound on the layout's work. */
    static final long MAX_NODES = 400_000;
    /** Placements compared for one set of straight lines. */
    static final int SOLUTIONS = 40;
    /** Search nodes allowed for one set of straight lines. */
    static final long MAX_ATTEMPT_NODES = 20_000;
    /** Least distance between a drawn path and a point not on it (the points' spread is about 1). */
    static final double CLEARANCE = 0.07;
    /** Least distance between two points. */
    static final double APART = 0.15;
    /** A straight line is drawn this far beyond its outermost points. */
    static final double OVERHANG = 0.12;

    /** A drawn line or curve: its distance to a point, in the layout's units. */
    sealed interface Path permits Segment, Circle, Spline {
        double distance(double x, double y);

        /** Points along the path, for bounding boxes and label placement. */
        double[][] samples();
    }

    /** A straight segment. */
    record Segment(double x1, double y1, double x2, double y2) implements Path {
        @Override
        public double distance(double x, double y) {
            return segmentDistance(x, y, x1, y1, x2, y2);
        }

        @Override
        public double[][] samples() {
            double[][] out = new double[17][];
            for (int i = 0; i <= 16; i++) {
                out[i] = new double[] {x1 + (x2 - x1) * i / 16, y1 + (y2 - y1) * i / 16};
            }
            return out;
        }
    }

    /** A circle. */
    record Circle(double cx, double cy, double r) implements Path {
        @Override
        public double distance(double x, double y) {
            return Math.abs(Math.hypot(x - cx, y - cy) - r);
        }

        @Override
        public double[][] samples() {
            double[][] out = new double[64][];
            for (int i = 0; i < 64; i++) {
                out[i] = new double[] {cx + r * Math.cos(2 * Math.PI * i / 64), cy + r * Math.sin(2 * Math.PI * i / 64)};
            }
            return out;
        }
    }

    /**
     * A closed Catmull–Rom spline through {@code points}: piece i is the cubic Bézier from point
     * i to point i + 1 with control points p_i + (p_{i+1} − p_{i−1})/6 and p_{i+1} − (p_{i+2} − p_i)/6.
     */
    record Spline(double[][] points) implements Path {
        /** The control points of piece i: {x1, y1, x2, y2}. */
        double[] controls(int i) {
            int m = points.length;
            double[] prev = points[Math.floorMod(i - 1, m)];
            double[] a = points[i];
            double[] b = points[(i + 1) % m];
            double[] next = points[(i + 2) % m];
            return new double[] {a[0] + (b[0] - prev[0]) / 6, a[1] + (b[1] - prev[1]) / 6,
                b[0] - (next[0] - a[0]) / 6, b[1] - (next[1] - a[1]) / 6};
        }

        @Override
        public double distance(double x, double y) {
            double[][] s = samples();
            double best = Double.MAX_VALUE;
            for (int i = 0; i < s.length; i++) {
                double[] a = s[i];
                double[] b = s[(i + 1) % s.length];
                best = Math.min(best, segmentDistance(x, y, a[0], a[1], b[0], b[1]));
            }
            return best;
        }

        @Override
        public double[][] samples() {
            int steps = 48;
            double[][] out = new double[points.length * steps][];
            for (int i = 0; i < points.length; i++) {
                double[] a = points[i];
                double[] c = controls(i);
                double[] b = points[(i + 1) % points.length];
                for (int s = 0; s < steps; s++) {
                    double t = (double) s / steps;
                    double u = 1 - t;
                    out[i * steps + s] = new double[] {
                        u * u * u * a[0] + 3 * u * u * t * c[0] + 3 * u * t * t * c[2] + t * t * t * b[0],
                        u * u * u * a[1] + 3 * u * u * t * c[1] + 3 * u * t * t * c[3] + t * t * t * b[1]};
                }
            }
            return out;
        }
    }

    /**
     * A placement.
     *
     * @param exact each element's homogeneous coordinates (x, y, w), w > 0: the point (x/w, y/w)
     * @param points each element's drawing position (an affine image of the exact point that
     *     makes the point set round, for the picture only)
     * @param paths the drawn path of each line, in the order of the lines given
     * @param straight whether each line is drawn straight
     */
    record Layout(long[][] exact, double[][] points, List<Path> paths, boolean[] straight) {
        /** The number of lines drawn straight. */
        int straightCount() {
            int c = 0;
            for (boolean s : straight) {
                c += s ? 1 : 0;
            }
            return c;
        }
    }

    /** Parameters t tried for a point a + t(b − a) on a line through placed points a and b, as p/q. */
    private static final long[][] ON_LINE = {{2, 1}, {-1, 1}, {1, 2}, {3, 1}, {-2, 1}, {1, 3}, {2, 3}, {3, 2}, {-1, 2},
        {4, 1}, {1, 4}, {3, 4}, {4, 3}, {-3, 1}, {5, 2}, {-1, 3}};
    /** Free points (on no straight line through two placed points) are tried at (x, y), |x|, |y| ≤ this. */
    private static final int FREE = 3;

    private final int k;
    private final List<int[]> lines;
    private final ElementSet[] lineSets;
    /** lineOf[a][b]: the line through a and b, or −1. */
    private final int[][] lineOf;
    private long nodes;
    private long attemptNodes;
    /** The best placement of the current attempt, its quality, and how many were found. */
    private Layout best;
    private double bestQuality;
    private int found;

    private ConfigurationLayout(int k, List<int[]> lines) {
        this.k = k;
        this.lines = lines;
        this.lineSets = new ElementSet[lines.size()];
        this.lineOf = new int[k][k];
        for (int[] row : lineOf) {
            Arrays.fill(row, -1);
        }
        for (int l = 0; l < lines.size(); l++) {
            lineSets[l] = ElementSet.of(lines.get(l));
            for (int a : lines.get(l)) {
                for (int b : lines.get(l)) {
                    if (a != b) {
                        lineOf[a][b] = l;
                    }
                }
            }
        }
    }

    /**
     * Lays out k points with the given lines (each at least 3 points; two lines share at most
     * one point). Always returns a layout: the last attempt asks for no line straight, only for
     * points in general position; should even that run out of nodes, the points go on the
     * parabola y = x², with every line curved.
     */
    static Layout of(int k, List<int[]> lines) {
        ConfigurationLayout search = new ConfigurationLayout(k, lines);
        for (boolean[] required : search.attempts()) {
            Layout found = search.place(required);
            if (found != null) {
                return found;
            }
        }
        long[][] parabola = new long[k][];
        for (int e = 0; e < k; e++) {
            parabola[e] = new long[] {e, (long) e * e, 1};
        }
        return search.paths(parabola, new boolean[lines.size()]);
    }

    /** The sets of lines asked to be straight, most first. */
    private List<boolean[]> attempts() {
        int n = lines.size();
        List<boolean[]> out = new ArrayList<>();
        boolean[] all = new boolean[n];
        Arrays.fill(all, true);
        // All lines straight is not tried: the layouts are of non-orientable cores, and a real
        // realisation would orient them.
        for (int l = 0; l < n; l++) {
            boolean[] r = all.clone();
            r[l] = false;
            out.add(r);
        }
        for (int e = 0; e < k; e++) {
            boolean[] r = all.clone();
            for (int l = 0; l < n; l++) {
                r[l] = !lineSets[l].contains(e);
            }
            out.add(r);
        }
        for (int a = 0; a < n && n <= 30; a++) {
            for (int b = a + 1; b < n; b++) {
                boolean[] r = all.clone();
                r[a] = false;
                r[b] = false;
                out.add(r);
            }
        }
        out.add(new boolean[n]);
        return out;
    }

    /**
     * The best of the first {@value #SOLUTIONS} placements found with these lines straight, by
     * {@link #quality}; null when none is found within the budget.
     */
    private Layout place(boolean[] required) {
        attemptNodes = 0;
        best = null;
        found = 0;
        if (nodes < MAX_NODES) {
            extend(order(required), 0, new long[k][], required);
        }
        return best;
    }

    /**
     * How well a placement reads: the least distance between two points or between a point and
     * a path it is not on (the points' spread being about 1). Larger is better.
     */
    private double quality(Layout layout) {
        double[][] p = layout.points();
        double q = Double.MAX_VALUE;
        for (int a = 0; a < k; a++) {
            for (int b = a + 1; b < k; b++) {
                q = Math.min(q, Math.hypot(p[a][0] - p[b][0], p[a][1] - p[b][1]));
            }
        }
        for (int l = 0; l < lines.size(); l++) {
            for (int e = 0; e < k; e++) {
                if (!lineSets[l].contains(e)) {
                    q = Math.min(q, 2 * layout.paths().get(l).distance(p[e][0], p[e][1]));
                }
            }
        }
        return q;
    }

    /** Elements in search order: each next one on the most straight lines with two points placed. */
    private int[] order(boolean[] required) {
        int[] order = new int[k];
        boolean[] used = new boolean[k];
        for (int i = 0; i < k; i++) {
            int best = -1;
            long bestScore = -1;
            for (int e = 0; e < k; e++) {
                if (used[e]) {
                    continue;
                }
                long determined = 0;
                long touching = 0;
                for (int l = 0; l < lines.size(); l++) {
                    if (required[l] && lineSets[l].contains(e)) {
                        int placed = 0;
                        for (int j = 0; j < i; j++) {
                            placed += lineSets[l].contains(order[j]) ? 1 : 0;
                        }
                        determined += placed >= 2 ? 1 : 0;
                        touching += 1;
                    }
                }
                long score = determined * 1000 + touching;
                if (score > bestScore) {
                    bestScore = score;
                    best = e;
                }
            }
            order[i] = best;
            used[best] = true;
        }
        return order;
    }

    /** Searches on; true once enough placements were found or the budget is spent. */
    private boolean extend(int[] order, int depth, long[][] at, boolean[] required) {
        if (depth == k) {
            Layout layout = paths(at, required);
            if (clear(layout)) {
                double q = quality(layout);
                if (best == null || q > bestQuality) {
                    best = layout;
                    bestQuality = q;
                }
                found++;
            }
            return found >= SOLUTIONS;
        }
        int p = order[depth];
        for (long[] q : candidates(order, depth, at, required)) {
            if (++nodes > MAX_NODES || ++attemptNodes > MAX_ATTEMPT_NODES) {
                return true;
            }
            if (fits(order, depth, at, required, p, q)) {
                at[p] = q;
                boolean done = extend(order, depth + 1, at, required);
                at[p] = null;
                if (done) {
                    return true;
                }
            }
        }
        return false;
    }

    /**
     * Where p may go: the meet of two straight lines through placed points when it has two such
     * lines; points a + t(b − a) when it has one; otherwise a free point. Collinearity is
     * invariant under affine maps, so the first point is (0, 0), the second free point (1, 0),
     * and the first free point off their line (0, 1); later free points come from a small grid.
     */
    private List<long[]> candidates(int[] order, int depth, long[][] at, boolean[] required) {
        int p = order[depth];
        List<long[]> through = new ArrayList<>();
        List<long[][]> pairs = new ArrayList<>();
        for (int l = 0; l < lines.size(); l++) {
            if (!required[l] || !lineSets[l].contains(p)) {
                continue;
            }
            long[] a = null;
            for (int i = 0; i < depth; i++) {
                if (lineSets[l].contains(order[i])) {
                    if (a == null) {
                        a = at[order[i]];
                    } else {
                        through.add(Homogeneous.cross(a, at[order[i]]));
                        pairs.add(new long[][] {a, at[order[i]]});
                        break;
                    }
                }
            }
        }
        List<long[]> out = new ArrayList<>();
        if (through.size() >= 2) {
            long[] q = Homogeneous.cross(through.get(0), through.get(1));
            if (q != null && q[2] != 0) {
                out.add(Homogeneous.normal(q));
            }
            return out;
        }
        if (through.size() == 1) {
            long[] a = pairs.get(0)[0];
            long[] b = pairs.get(0)[1];
            for (long[] t : ON_LINE) {
                long[] q = Homogeneous.between(a, b, t[0], t[1]);
                if (q != null) {
                    out.add(q);
                }
            }
            return out;
        }
        if (depth == 0) {
            return List.of(new long[] {0, 0, 1});
        }
        boolean collinear = true;
        for (int i = 2; i < depth; i++) {
            collinear &= Homogeneous.det(at[order[0]], at[order[1]], at[order[i]]) == 0;
        }
        if (depth == 1) {
            return List.of(new long[] {1, 0, 1});
        }
        if (collinear) {
            return List.of(new long[] {0, 1, 1});
        }
        for (int r = 1; r <= FREE; r++) {
            for (long x = -r; x <= r; x++) {
                for (long y = -r; y <= r; y++) {
                    if (Math.max(Math.abs(x), Math.abs(y)) == r) {
                        out.add(new long[] {x, y, 1});
                    }
                }
            }
        }
        return out;
    }

    /** The exact incidence conditions between q (for p) and every placed pair. */
    private boolean fits(int[] order, int depth, long[][] at, boolean[] required, int p, long[] q) {
        for (int i = 0; i < depth; i++) {
            long[] a = at[order[i]];
            if (Homogeneous.same(a, q)) {
                return false;
            }
        }
        for (int i = 0; i < depth; i++) {
            for (int j = i + 1; j < depth; j++) {
                int l = lineOf[order[i]][order[j]];
                boolean onLine = l >= 0 && lineSets[l].contains(p);
                Long d = Homogeneous.detOrNull(at[order[i]], at[order[j]], q);
                if (d == null || (onLine ? required[l] && d != 0 : d == 0)) {
                    return false;
                }
            }
        }
        return true;
    }

    /** The drawn paths of a placement. */
    private Layout paths(long[][] at, boolean[] required) {
        double[][] xy = round(at);
        List<Path> paths = new ArrayList<>();
        boolean[] straight = new boolean[lines.size()];
        for (int l = 0; l < lines.size(); l++) {
            int[] line = lines.get(l);
            double[][] pts = new double[line.length][];
            for (int i = 0; i < line.length; i++) {
                pts[i] = xy[line[i]];
            }
            straight[l] = collinear(line, at);
            paths.add(straight[l] ? segment(pts) : pts.length == 3 ? circle(pts) : spline(pts));
        }
        return new Layout(at.clone(), xy, List.copyOf(paths), straight);
    }

    /**
     * The points under the affine map that gives them mean 0 and the identity as covariance
     * (so a sheared placement is drawn round), scaled to about unit spread.
     */
    private static double[][] round(long[][] at) {
        int k = at.length;
        double[][] p = new double[k][];
        double mx = 0;
        double my = 0;
        for (int e = 0; e < k; e++) {
            p[e] = new double[] {(double) at[e][0] / at[e][2], (double) at[e][1] / at[e][2]};
            mx += p[e][0] / k;
            my += p[e][1] / k;
        }
        double sxx = 0;
        double sxy = 0;
        double syy = 0;
        for (double[] q : p) {
            sxx += (q[0] - mx) * (q[0] - mx) / k;
            sxy += (q[0] - mx) * (q[1] - my) / k;
            syy += (q[1] - my) * (q[1] - my) / k;
        }
        // the inverse square root of [[sxx, sxy], [sxy, syy]] by its eigen decomposition
        double tr = sxx + syy;
        double disc = Math.sqrt(Math.max(0, (sxx - syy) * (sxx - syy) / 4 + sxy * sxy));
        double l1 = tr / 2 + disc;
        double l2 = Math.max(1e-12, tr / 2 - disc);
        double angle = 0.5 * Math.atan2(2 * sxy, sxx - syy);
        double c = Math.cos(angle);
        double s = Math.sin(angle);
        double[][] out = new double[k][];
        for (int e = 0; e < k; e++) {
            double u = (p[e][0] - mx) * c + (p[e][1] - my) * s;
            double v = -(p[e][0] - mx) * s + (p[e][1] - my) * c;
            u /= Math.sqrt(l1);
            v /= Math.sqrt(l2);
            out[e] = new double[] {u * c - v * s, u * s + v * c};
        }
        return out;
    }

    private static boolean collinear(int[] line, long[][] at) {
        for (int i = 2; i < line.length; i++) {
            Long d = Homogeneous.detOrNull(at[line[0]], at[line[1]], at[line[i]]);
            if (d == null || d != 0) {
                return false;
            }
        }
        return true;
    }

    /**
     * Every point off a path is at least {@link #CLEARANCE} from it, points are at least
     * {@link #APART} apart, and no curve is much wider than the points (units: the points'
     * spread is about 1).
     */
    private boolean clear(Layout layout) {
        double[][] p = layout.points();
        for (int a = 0; a < k; a++) {
            for (int b = a + 1; b < k; b++) {
                if (Math.hypot(p[a][0] - p[b][0], p[a][1] - p[b][1]) < APART) {
                    return false;
                }
            }
        }
        for (int l = 0; l < lines.size(); l++) {
            Path path = layout.paths().get(l);
            if (path instanceof Circle c && c.r() > 4) {
                return false;
            }
            for (int e = 0; e < k; e++) {
                if (!lineSets[l].contains(e) && path.distance(p[e][0], p[e][1]) < CLEARANCE) {
                    return false;
                }
            }
        }
        return true;
    }

    private static Segment segment(double[][] pts) {
        double[] from = pts[0];
        double[] to = pts[0];
        double widest = -1;
        for (double[] a : pts) {
            for (double[] b : pts) {
                double d = Math.hypot(a[0] - b[0], a[1] - b[1]);
                if (d > widest) {
                    widest = d;
                    from = a;
                    to = b;
                }
            }
        }
        double ux = (to[0] - from[0]) / widest * OVERHANG;
        double uy = (to[1] - from[1]) / widest * OVERHANG;
        return new Segment(from[0] - ux, from[1] - uy, to[0] + ux, to[1] + uy);
    }

    /** The circle through three non-collinear points. */
    private static Circle circle(double[][] p) {
        double ax = p[0][0];
        double ay = p[0][1];
        double bx = p[1][0];
        double by = p[1][1];
        double cx = p[2][0];
        double cy = p[2][1];
        double d = 2 * (ax * (by - cy) + bx * (cy - ay) + cx * (ay - by));
        double ux = ((ax * ax + ay * ay) * (by - cy) + (bx * bx + by * by) * (cy - ay) + (cx * cx + cy * cy) * (ay - by)) / d;
        double uy = ((ax * ax + ay * ay) * (cx - bx) + (bx * bx + by * by) * (ax - cx) + (cx * cx + cy * cy) * (bx - ax)) / d;
        return new Circle(ux, uy, Math.hypot(ax - ux, ay - uy));
    }

    /** A closed spline through the points in angular order about their centroid. */
    private static Spline spline(double[][] pts) {
        double mx = 0;
        double my = 0;
        for (double[] p : pts) {
            mx += p[0] / pts.length;
            my += p[1] / pts.length;
        }
        double cx = mx;
        double cy = my;
        double[][] sorted = pts.clone();
        Arrays.sort(sorted, (a, b) -> Double.compare(Math.atan2(a[1] - cy, a[0] - cx), Math.atan2(b[1] - cy, b[0] - cx)));
        return new Spline(sorted);
    }

    static double segmentDistance(double x, double y, double x1, double y1, double x2, double y2) {
        double dx = x2 - x1;
        double dy = y2 - y1;
        double len = dx * dx + dy * dy;
        double t = len == 0 ? 0 : Math.max(0, Math.min(1, ((x - x1) * dx + (y - y1) * dy) / len));
        return Math.hypot(x - x1 - t * dx, y - y1 - t * dy);
    }
}
