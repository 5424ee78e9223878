/** File formats: a strict JSON model, parser and writer, matroid and result files, atomic writes; depends only on the JDK, {@code matroid} and {@code orient}. */
package org.chirocore.io;
