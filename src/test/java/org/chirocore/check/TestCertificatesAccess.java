package org.chirocore.check;

import org.chirocore.io.Json;

/** Test certificates as file text, for tests outside this package (the CLI's). */
public final class TestCertificatesAccess {
    private TestCertificatesAccess() {
    }

    /** The n = 3 corner construction's certificate. */
    public static String corner() {
        return TestCertificates.corner(TestCertificates.DEFAULT_SOLVER).toText() + "\n";
    }

    /** The same with the first deletion sign of element 000 flipped, rehashed. */
    public static String cornerWithAFlippedWitnessSign() {
        Json.Obj cert = TestCertificates.corner(TestCertificates.DEFAULT_SOLVER);
        String signs = TestCertificates.get(cert, "content", "minimality", "0", "deletion").asString("signs");
        String flipped = (signs.charAt(0) == '+' ? "-" : "+") + signs.substring(1);
        return TestCertificates.tamper(cert, new Json.Str(flipped), "minimality", "0", "deletion").toText() + "\n";
    }
}
