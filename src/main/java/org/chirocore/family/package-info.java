/**
 * Infinite families of cube constructions: a definition file gives one construction per cube
 * dimension n, and a family run reduces, certifies and verifies each member (through
 * {@code pipeline}) and tabulates the cores. Depends on {@code matroid}, {@code orient} (budgets),
 * {@code search}, {@code cert}, {@code pipeline}, {@code check} (re-verifying existing files) and
 * {@code io}; never on the CLI or {@code report}.
 */
package org.chirocore.family;
