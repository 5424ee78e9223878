package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.BiFunction;
import java.util.function.Supplier;

import org.chirocore.cert.Source;
import org.chirocore.io.InputFiles;
import org.chirocore.io.IoMessages;
import org.chirocore.io.Json;
import org.chirocore.io.Sha256;
import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.Field;
import org.chirocore.matroid.GeneralPositionException;
import org.chirocore.matroid.InvalidHyperplaneException;
import org.chirocore.matroid.Matroid;
import org.chirocore.pipeline.Subject;

/**
 * A family of cube constructions, one per cube dimension n in a range: the field, a rule for the
 * hyperplane H, a rule for the pulled vertex O and whether O is contracted (docs/families.md).
 * {@link #read} checks the file's form; whether H is a hyperplane and (H, O) are in general
 * position can only be decided per n, by {@link #build}. Every error message starts with the
 * file's name and names the field and the n at which it fails. Immutable.
 *
 * @param source the file name as given, the prefix of every message
 * @param name a short name of the family
 * @param description a sentence saying what the family is, and where it fails
 * @param field the field of every member's cube
 * @param hyperplane the rule for H
 * @param pulled the rule for O
 * @param contractPulled whether O is contracted after pulling
 * @param from the smallest n of the family
 * @param to the largest n of the family
 * @param sha256 the SHA-256 of the definition as re-serialised by chirocore (independent of
 *     whitespace in the file); shards of one run must agree on it
 */
public record FamilyDefinition(String source, String name, String description, Field field,
        HyperplaneRule hyperplane, VertexRule pulled, boolean contractPulled, int from, int to, String sha256) {
    private static final List<String> FIELDS = List.of("name", "description", "field", "hyperplane", "pulled",
            "contractPulled", "range");
    private static final Set<Character> N = Set.of('n');
    private static final Set<Character> N_AND_I = Set.of('n', 'i');

    public FamilyDefinition {
        if (from < 1 || from > to || to > AffineCube.MAX_DIMENSION) {
            throw new FamilyException(source + ": range: [" + from + ", " + to + "] is not a range a <= b within 1.."
                    + AffineCube.MAX_DIMENSION + ".");
        }
    }

    /**
     * One member of the family: the construction at n and the matroid it builds.
     *
     * @param construction the construction at n
     * @param matroid the pulled cube, contracted by O when the family says so
     */
    public record Member(CubeConstruction construction, Matroid matroid) {
        /** The member as the pipeline's subject: its matroid, provenance and focus (H's vertices). */
        public Subject subject() {
            return new Subject(matroid, new Source.Constructed(construction), construction.focus());
        }
    }

    /**
     * Reads the definition in {@code file}.
     *
     * @throws FamilyException naming the file and the offending field
     */
    public static FamilyDefinition read(Path file) {
        return readJson(file, FamilyDefinition::parse);
    }

    /**
     * Reads the JSON in {@code file} and parses it with {@code parse}, given the file name as the
     * prefix of every message.
     *
     * @throws FamilyException naming the file: it cannot be read, is not JSON, or a field is wrong
     */
    static <T> T readJson(Path file, BiFunction<String, Json, T> parse) {
        String source = file.toString();
        try {
            return parse.apply(source, Json.parseUtf8(InputFiles.read(file)));
        } catch (IOException e) {
            throw new FamilyException(source + ": cannot read the file: " + IoMessages.plain(e), e);
        } catch (FamilyException e) {
            throw e;
        } catch (IllegalArgumentException e) {
            // JSON syntax, or a member of the wrong type: the message names the field
            throw new FamilyException(source + ": " + e.getMessage(), e);
        }
    }

    /**
     * The definition in {@code json}; {@code source} prefixes every message.
     *
     * @throws FamilyException naming the source and the offending field
     */
    public static FamilyDefinition parse(String source, Json json) {
        Json.Obj o = json.asObject("the family definition");
        o.requireOnly(FIELDS);
        Field field = field(source, o.requireString("field"));
        Json.Arr range = o.requireArray("range");
        if (range.size() != 2) {
            throw new FamilyException(source + ": range: must be [a, b], found " + range.size() + " numbers.");
        }
        return new FamilyDefinition(source, o.requireString("name"), o.requireString("description"), field,
                hyperplane(source, o.requireObject("hyperplane")),
                in(source, "pulled", () -> VertexRule.parse(o.requireString("pulled"))),
                o.requireBoolean("contractPulled"), range.get(0).asInt("range[0]"), range.get(1).asInt("range[1]"),
                Sha256.hex(json));
    }

    /**
     * The construction at cube dimension n, not yet validated.
     *
     * @throws FamilyException when n is outside the range, or a rule gives nothing sensible at n
     */
    public CubeConstruction construction(int n) {
        if (n < from || n > to) {
            throw new FamilyException(source + ": n = " + n + " is outside the family's range [" + from + ", " + to
                    + "].");
        }
        return new CubeConstruction(n, field, atN(n, "hyperplane", () -> hyperplane.spec(n)),
                atN(n, "pulled", () -> pulled.label(n)), contractPulled);
    }

    /**
     * Builds the member at n: resolves H, checks that O lies outside it and that (H, O) are in
     * general position, and pulls. Costs what {@link CubeConstruction#build} costs.
     *
     * @throws FamilyException naming the file, the part and n when any of this fails
     */
    public Member build(int n) {
        CubeConstruction c = construction(n);
        try {
            return new Member(c, c.build());
        } catch (InvalidHyperplaneException e) {
            throw new FamilyException(source + ": hyperplane at n = " + n + ": " + e.getMessage(), e);
        } catch (GeneralPositionException e) {
            throw new FamilyException(source + ": (H, O) are not in general position at n = " + n + ": "
                    + e.getMessage(), e);
        } catch (IllegalArgumentException e) {
            throw new FamilyException(source + ": pulled at n = " + n + ": " + e.getMessage(), e);
        }
    }

    private static Field field(String source, String text) {
        return in(source, "field", () -> Field.parse(text));
    }

    private static HyperplaneRule hyperplane(String source, Json.Obj h) {
        if (h.has("vertices")) {
            h.requireOnly(List.of("vertices"));
            String rule = h.requireString("vertices").trim();
            if (!rule.startsWith("weight ")) {
                throw new FamilyException(source + ": hyperplane.vertices: \"" + rule
                        + "\" is not a vertex-set rule: use \"weight E\" (the vertices with E ones).");
            }
            return new HyperplaneRule.Weight(in(source, "hyperplane.vertices",
                    () -> Expression.parse(rule.substring("weight ".length()), N)));
        }
        h.requireOnly(List.of("normal", "offset"));
        Expression offset = in(source, "hyperplane.offset", () -> Expression.parse(h.requireString("offset"), N));
        Json normal = h.require("normal");
        if (normal instanceof Json.Arr listed) {
            List<Expression> coefficients = new ArrayList<>();
            for (int k = 0; k < listed.size(); k++) {
                String what = "hyperplane.normal[" + k + "]";
                Json item = listed.get(k);
                coefficients.add(in(source, what, () -> Expression.parse(item.asString(what), N)));
            }
            return new HyperplaneRule.Listed(coefficients, offset);
        }
        return new HyperplaneRule.Formula(in(source, "hyperplane.normal",
                () -> Expression.parse(normal.asString("hyperplane.normal"), N_AND_I)), offset);
    }

    /** Evaluates {@code part}, prefixing a rejection with the file and the field. */
    private static <T> T in(String source, String field, Supplier<T> part) {
        try {
            return part.get();
        } catch (IllegalArgumentException e) {
            throw new FamilyException(source + ": " + field + ": " + e.getMessage(), e);
        }
    }

    /** Evaluates {@code part} at n, prefixing a rejection with the file, the field and n. */
    private <T> T atN(int n, String field, Supplier<T> part) {
        try {
            return part.get();
        } catch (IllegalArgumentException | ArithmeticException e) {
            throw new FamilyException(source + ": " + field + " at n = " + n + ": " + e.getMessage(), e);
        }
    }
}
