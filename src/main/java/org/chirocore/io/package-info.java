/**
 * File formats: a strict JSON model, parser and writer, matroid and result files, atomic writes,
 * and the producer's SHA-256 helper. May import the JDK, {@code matroid} and {@code orient} only.
 */
package org.chirocore.io;
