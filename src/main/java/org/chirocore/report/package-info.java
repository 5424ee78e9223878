/**
 * Human-readable reports of verified certificates and of run directories (family runs,
 * explorations, predictions) for papers and referees, in Markdown, LaTeX and HTML, with pictures
 * drawn by our own code (SVG and TikZ). The core is the matroid package's {@code ExplicitMatroid};
 * its lines come from {@code Flats}, its name from {@code Catalogue}. Depends only on the JDK,
 * {@code org.chirocore.io}, {@code org.chirocore.matroid} and the verifier
 * {@code org.chirocore.check}; never on the CLI.
 */
package org.chirocore.report;
