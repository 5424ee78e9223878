/** Matroids as rank oracles: ground sets, explicit and matrix matroids, minors, flats and constructions (affine cubes, pulled points); depends on nothing else of the project. */
package org.chirocore.matroid;
