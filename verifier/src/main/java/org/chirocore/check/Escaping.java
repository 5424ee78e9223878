package org.chirocore.check;

/**
 * Text from a certificate made safe for a terminal: a certificate's writer controls its labels,
 * file names and messages quoted from it, and control characters in them could rewrite what the
 * terminal shows (for example repaint a FAIL line as PASS).
 */
public final class Escaping {
    private Escaping() {
    }

    /**
     * {@code s} with every character that is not printable (C0 and C1 controls, DEL, line and
     * paragraph separators, bidirectional and other format characters, unpaired surrogates)
     * replaced by a {@code \}{@code uXXXX} escape, so that the result is one line of characters
     * that only print. Backslashes are kept as they are, so that the trade's notation ({@code M/C\D},
     * {@code AG(2,3)\e}) reads as written; a label that spells out an escape can look like one but
     * never acts on the terminal, and escaping twice changes nothing.
     */
    public static String printable(String s) {
        StringBuilder out = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            boolean pairedSurrogate = Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))
                    || Character.isLowSurrogate(c) && i > 0 && Character.isHighSurrogate(s.charAt(i - 1));
            int type = Character.getType(c);
            boolean unsafe = type == Character.CONTROL || type == Character.FORMAT || type == Character.LINE_SEPARATOR
                    || type == Character.PARAGRAPH_SEPARATOR || type == Character.UNASSIGNED || type == Character.PRIVATE_USE
                    || (type == Character.SURROGATE && !pairedSurrogate);
            if (unsafe) {
                out.append(String.format("\\u%04x", (int) c));
            } else {
                out.append(c);
            }
        }
        return out.toString();
    }
}
