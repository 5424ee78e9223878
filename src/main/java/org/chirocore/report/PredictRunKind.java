package org.chirocore.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * A checked prediction (docs/families.md, {@code family --predict}): one certificate
 * {@code n=K.predicted.cert.json} for each n at which the predicted minor was confirmed to be a
 * minimal non-orientable core. The run keeps no other record, so the report lists the
 * certificates.
 */
final class PredictRunKind implements RunKind {
    static final String SUFFIX = ".predicted.cert.json";

    @Override
    public String name() {
        return "checked prediction";
    }

    @Override
    public boolean recognises(Path dir) {
        return !RunFiles.withSuffix(dir, SUFFIX).isEmpty();
    }

    @Override
    public String title(Path dir) {
        return "Predicted cores confirmed in " + RelativePaths.shown(dir);
    }

    @Override
    public List<Member> certificates(Path dir) {
        List<Member> out = new ArrayList<>();
        for (Path p : RunFiles.withSuffix(dir, SUFFIX)) {
            out.add(new Member("n = " + RunFiles.n(p), p));
        }
        return out;
    }

    @Override
    public List<Document.Block> summary(Path dir, Function<Path, Document.Inline> classOf) {
        return List.of(Document.Paragraph.of("Each certificate below states that the predicted minor of the member at its n "
                + "is a minor-minimal non-orientable matroid; a refuted or undecided prediction leaves no certificate."),
                Document.Paragraph.of("A referee re-checks the certificates with:"),
                RunFiles.verifyCommand(dir, "n=*" + SUFFIX));
    }
}
