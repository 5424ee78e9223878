package org.chirocore.report;

/**
 * Exact plane geometry in homogeneous integer coordinates (x, y, w): the join of two points and
 * the meet of two lines are cross products; three points are collinear exactly when their
 * determinant is 0. Overflow of {@code long} is detected ({@code Math.*Exact}) and reported as
 * {@code null}, so a layout never rests on a wrong sign.
 */
final class Homogeneous {
    private Homogeneous() {
    }

    /** The cross product, reduced by the gcd; null on overflow. */
    static long[] cross(long[] u, long[] v) {
        try {
            return reduce(new long[] {
                Math.subtractExact(Math.multiplyExact(u[1], v[2]), Math.multiplyExact(u[2], v[1])),
                Math.subtractExact(Math.multiplyExact(u[2], v[0]), Math.multiplyExact(u[0], v[2])),
                Math.subtractExact(Math.multiplyExact(u[0], v[1]), Math.multiplyExact(u[1], v[0]))});
        } catch (ArithmeticException | NullPointerException e) {
            return null;
        }
    }

    /** The determinant of the three points; null on overflow. */
    static Long detOrNull(long[] a, long[] b, long[] c) {
        long[] ab = cross(a, b);
        if (ab == null) {
            return null;
        }
        try {
            return Math.addExact(Math.addExact(Math.multiplyExact(ab[0], c[0]), Math.multiplyExact(ab[1], c[1])),
                    Math.multiplyExact(ab[2], c[2]));
        } catch (ArithmeticException e) {
            return null;
        }
    }

    /** The determinant, or 1 (not collinear) on overflow. */
    static long det(long[] a, long[] b, long[] c) {
        Long d = detOrNull(a, b, c);
        return d == null ? 1 : d;
    }

    /** Whether two points with w > 0 are the same point. */
    static boolean same(long[] a, long[] b) {
        long[] c = cross(a, b);
        return c != null && c[0] == 0 && c[1] == 0 && c[2] == 0;
    }

    /** The point with w > 0 and coprime coordinates. */
    static long[] normal(long[] q) {
        return q[2] < 0 ? new long[] {-q[0], -q[1], -q[2]} : q;
    }

    /** The point a + (p/q)(b − a) for a, b with w > 0; null on overflow. */
    static long[] between(long[] a, long[] b, long p, long q) {
        try {
            long aw = a[2];
            long bw = b[2];
            long x = Math.addExact(Math.multiplyExact(q - p, Math.multiplyExact(a[0], bw)), Math.multiplyExact(p, Math.multiplyExact(b[0], aw)));
            long y = Math.addExact(Math.multiplyExact(q - p, Math.multiplyExact(a[1], bw)), Math.multiplyExact(p, Math.multiplyExact(b[1], aw)));
            return normal(reduce(new long[] {x, y, Math.multiplyExact(q, Math.multiplyExact(aw, bw))}));
        } catch (ArithmeticException e) {
            return null;
        }
    }

    private static long[] reduce(long[] v) {
        long g = gcd(gcd(Math.abs(v[0]), Math.abs(v[1])), Math.abs(v[2]));
        return g <= 1 ? v : new long[] {v[0] / g, v[1] / g, v[2] / g};
    }

    private static long gcd(long a, long b) {
        return b == 0 ? a : gcd(b, a % b);
    }
}
