/**
 * Minimisation of a non-orientable matroid to a minor-minimal non-orientable minor, with its
 * minimality witnesses. Depends on {@code matroid} and {@code orient}.
 */
package org.chirocore.search;
