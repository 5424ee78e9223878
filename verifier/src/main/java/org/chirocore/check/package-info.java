/**
 * The certificate verifier: re-checks a certificate (docs/certificate-format.md) with its own small
 * code. Depends only on the JDK (its JSON reader and canonical writer are its own, {@code JsonTree});
 * never on the encoder, solver, search or matroid packages ({@code CheckIndependenceTest} enforces it).
 */
package org.chirocore.check;
