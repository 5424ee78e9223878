/**
 * Minimisation of a non-orientable matroid to a minor-minimal non-orientable minor, with its
 * minimality witnesses; the search receives its {@code orient.OrientabilityDecider}. May import
 * {@code matroid} and {@code orient} only.
 */
package org.chirocore.search;
