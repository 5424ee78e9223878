/**
 * Readable non-orientability proofs: sign propagation through 3-term Grassmann–Plücker relations
 * with case splits, their text, and their conversion to RUP lemmas. Depends on {@code orient} and
 * {@code matroid} only.
 */
package org.chirocore.proof;
