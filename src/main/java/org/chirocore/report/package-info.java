/**
 * Human-readable reports of verified certificates and of run directories (family runs,
 * explorations, predictions) for papers and referees, in Markdown, LaTeX and HTML, with pictures
 * drawn by our own code (SVG and TikZ). The core is the matroid package's {@code ExplicitMatroid};
 * its lines come from {@code Flats}, its name from {@code Catalogue}; certificates are read
 * through the producer side's one reader, {@code org.chirocore.cert.CertificateReader}. Depends
 * only on the JDK, {@code org.chirocore.io}, {@code org.chirocore.matroid}, {@code org.chirocore.cert}
 * and the verifier {@code org.chirocore.check}; never on the CLI.
 */
package org.chirocore.report;
