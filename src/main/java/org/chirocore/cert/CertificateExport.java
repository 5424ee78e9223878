package org.chirocore.cert;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.io.JsonValueException;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.ClauseEncoding;

/**
 * Exports a certificate's unsatisfiability claim for external tools: {@code <name>.cnf} in DIMACS
 * and {@code <name>.drat} as standard DRAT text, so that e.g. drat-trim can check it (for a
 * certificate that states LRAT, its steps without their hints), and on request
 * {@code <name>.lrat}. The CNF is
 * regenerated from the certificate's content alone (core bases, normalised bases, relations)
 * through the canonical encoding of {@link ClauseEncoding}, never taken from the solver. The
 * content digest is checked first, so a tampered certificate is refused. Cost: linear in the
 * certificate plus the clauses written.
 */
public final class CertificateExport {
    private CertificateExport() {
    }

    /**
     * What {@link #export} wrote.
     *
     * @param cnf the DIMACS file
     * @param drat the proof file
     * @param variables the number of variables (bases of the core)
     * @param clauses the number of clauses in the CNF
     * @param lrat the LRAT file, when asked for
     */
    public record Exported(Path cnf, Path drat, int variables, int clauses, Optional<Path> lrat) {
    }

    /**
     * Writes {@code outDir/<name>.cnf} and {@code outDir/<name>.drat} for {@code certificate},
     * {@code <name>} being its file name without {@code .json}; with {@code lrat}, also
     * {@code outDir/<name>.lrat}, the proof with the unit-propagation hints of each step (so that
     * formally verified LRAT checkers can consume it): the certificate's own when it states LRAT,
     * else converted from its DRAT ({@link LratConversion}).
     * {@code outDir} is created when missing, once the certificate has been read and checked.
     *
     * @throws IOException when a file cannot be read or written
     * @throws JsonValueException when the certificate is not of this format, its digest does not
     *     match its content, or its proof file does not match its recorded digest
     * @throws org.chirocore.matroid.InvalidMatroidException when its bases are not a matroid's
     * @throws IllegalArgumentException when a relation is malformed, or (with {@code lrat}) when
     *     the proof does not check
     */
    public static Exported export(Path certificate, Path outDir, boolean lrat) throws IOException {
        Json.Obj content = CertificateReader.readChecked(certificate).requireObject("content");
        Json.Obj proof = content.requireObject("nonOrientability");
        CertificateReader.Claim claim = CertificateReader.claim(content);
        BasisIndex index = claim.index();
        List<int[]> cnf = ClauseEncoding.cnf(index, claim.normalised(), claim.relations());
        StringBuilder dimacs = new StringBuilder("p cnf " + index.basisCount() + " " + cnf.size() + "\n");
        for (int[] clause : cnf) {
            for (int lit : clause) {
                dimacs.append(lit).append(' ');
            }
            dimacs.append("0\n");
        }
        String name = CertificateWriter.baseName(certificate);
        Path cnfFile = outDir.resolve(name + ".cnf");
        Path dratFile = outDir.resolve(name + ".drat");
        StatedProof stated = StatedProof.read(proof, certificate);
        // Everything that can fail is done before the directory or any file is created.
        String drat = stated.drat(cnf);
        Optional<String> hinted = !lrat ? Optional.empty()
                : Optional.of(stated.lrat() ? stated.text() : LratConversion.convert(index.basisCount(), cnf, drat));
        Files.createDirectories(outDir);
        AtomicFiles.writeString(cnfFile, dimacs.toString());
        AtomicFiles.writeString(dratFile, drat);
        Optional<Path> lratFile = Optional.empty();
        if (hinted.isPresent()) {
            lratFile = Optional.of(outDir.resolve(name + ".lrat"));
            AtomicFiles.writeString(lratFile.get(), hinted.get());
        }
        return new Exported(cnfFile, dratFile, index.basisCount(), cnf.size(), lratFile);
    }
}
