/**
 * The certificate verifier: re-checks a certificate (docs/certificate-format.md) with its own small
 * code. Depends only on the JDK and, for parsing and the canonical text, on {@code org.chirocore.io.Json};
 * never on the encoder, solver, search or matroid packages ({@code CheckIndependenceTest} enforces it).
 */
package org.chirocore.check;
