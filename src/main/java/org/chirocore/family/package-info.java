/**
 * Infinite families of cube constructions: a definition file gives one construction per cube
 * dimension n, and a family run reduces, certifies and verifies each member and tabulates the
 * cores. Depends on {@code matroid}, {@code search}, {@code cert}, {@code check} and {@code io};
 * never on the CLI.
 */
package org.chirocore.family;
