/**
 * Orientability: the SAT encoding of 3-term Grassmann–Plücker relations, sound normalisation,
 * lazy solving with sat4j and checked orientation witnesses. Depends on {@code matroid}; the only
 * package that imports sat4j.
 */
package org.chirocore.orient;
