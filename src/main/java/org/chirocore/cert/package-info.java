/** Certificates of minor-minimal non-orientability (docs/certificate-format.md): the model, the writer and the DIMACS/DRAT export; depends on {@code matroid}, {@code orient}, {@code search} and {@code io}, never on the checker. */
package org.chirocore.cert;
