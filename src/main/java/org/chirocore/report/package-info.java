/**
 * Human-readable reports of verified certificates and family runs for papers and referees, in
 * Markdown, LaTeX and HTML, with SVG pictures drawn by our own code. Depends only on the JDK,
 * {@code org.chirocore.io} and the verifier {@code org.chirocore.check}; never on the CLI.
 */
package org.chirocore.report;
