/**
 * Matroids as rank oracles: ground sets, explicit and matrix matroids, minors, flats, duality,
 * isomorphism, and constructions ({@link org.chirocore.matroid.Construction}: affine cubes built
 * once per dimension and field, pulled points). May import the JDK and jgrapht only, nothing else
 * of the project.
 */
package org.chirocore.matroid;
