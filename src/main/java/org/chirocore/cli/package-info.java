/**
 * The command-line adapter (picocli): parses options (shared ones as mixins), calls one library
 * method per command (every certificate through {@code pipeline.CertifiedReduction}), formats its
 * result and returns the exit code. May import every other package; none imports it.
 */
package org.chirocore.cli;
