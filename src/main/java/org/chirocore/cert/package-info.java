/** Certificates of minor-minimal non-orientability (docs/certificate-format.md): the model (a core, its path and witnesses, how it was found), the writer and the DIMACS/DRAT/LRAT export; depends on {@code matroid}, {@code orient}, {@code search}, {@code io} and {@code proof} (certificates whose proof is a readable derivation). */
package org.chirocore.cert;
