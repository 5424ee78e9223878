/** File formats: a strict JSON model, parser and writer, matroid and result files; depends only on the JDK, {@code matroid}, {@code orient} and {@code search} (for reduction files). */
package org.chirocore.io;
