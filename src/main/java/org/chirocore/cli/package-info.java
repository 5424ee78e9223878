/** The command-line adapter (picocli): parses options, calls one library method per command, formats its result; the library never depends on it. */
package org.chirocore.cli;
