package org.chirocore.matroid;

/**
 * The field a matrix matroid is represented over: the rationals (exact, fraction-free integer
 * elimination) or the prime field GF(p).
 *
 * @param characteristic 0 for the rationals, else a prime p
 */
public record Field(int characteristic) {
    /** The rational numbers. */
    public static final Field RATIONALS = new Field(0);

    public Field {
        if (characteristic < 0 || characteristic == 1 || (characteristic > 1 && !isPrime(characteristic))) {
            throw new IllegalArgumentException("A field characteristic must be 0 or a prime, not " + characteristic + ".");
        }
        if (characteristic > 46_340) {
            throw new IllegalArgumentException("GF(p) is supported for p up to 46340 so that products fit an int; got "
                    + characteristic + ".");
        }
    }

    /** GF(p) for a prime p. */
    public static Field gf(int p) {
        return new Field(p);
    }

    /** Whether this is the rationals. */
    public boolean isRational() {
        return characteristic == 0;
    }

    /** "Q" or "GF(p)", as in the matroid file format. */
    public String name() {
        return isRational() ? "Q" : "GF(" + characteristic + ")";
    }

    /**
     * Parses "Q" or "GF(p)".
     *
     * @throws IllegalArgumentException naming the text when it is neither
     */
    public static Field parse(String text) {
        String t = text.trim();
        if (t.equals("Q")) {
            return RATIONALS;
        }
        if (t.startsWith("GF(") && t.endsWith(")")) {
            try {
                return gf(Integer.parseInt(t.substring(3, t.length() - 1).trim()));
            } catch (NumberFormatException e) {
                // fall through to the message below
            }
        }
        throw new IllegalArgumentException("Field \"" + text + "\" is not \"Q\" or \"GF(p)\" for a prime p.");
    }

    private static boolean isPrime(int p) {
        for (int d = 2; (long) d * d <= p; d++) {
            if (p % d == 0) {
                return false;
            }
        }
        return p >= 2;
    }

    @Override
    public String toString() {
        return name();
    }
}
