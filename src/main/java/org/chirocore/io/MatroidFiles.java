package org.chirocore.io;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Field;
import org.chirocore.matroid.InvalidMatroidException;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.MatrixMatroid;
import org.chirocore.matroid.TooLargeException;

/**
 * Reads and writes the matroid file format of {@code docs/matroid-format.md}: a JSON object with
 * {@code rank}, optional {@code labels} / {@code elements} / {@code comment}, and exactly one of
 * {@code bases}, {@code nonbases} or {@code matrix}.
 *
 * <p>Reading checks everything a file can get wrong and reports the first problem as a
 * {@link MatroidFileException} naming the file and the item. Cost: for bases or non-bases,
 * the basis-exchange check of {@link ExplicitMatroid#fromBases} (quadratic in the number of
 * bases, times the rank); for a matrix, one rank computation.
 */
public final class MatroidFiles {
    private static final List<String> DATA_FIELDS = List.of("bases", "nonbases", "matrix");
    private static final List<String> TOP_FIELDS = List.of("rank", "labels", "elements", "comment", "bases",
            "nonbases", "matrix");
    private static final List<String> MATRIX_FIELDS = List.of("field", "columns");

    private MatroidFiles() {
    }

    /**
     * Reads a matroid file: an {@link ExplicitMatroid} for bases or non-bases, a
     * {@link MatrixMatroid} for a matrix.
     *
     * @throws MatroidFileException naming {@code file} when it cannot be read or is not a valid
     *     matroid file
     */
    public static Matroid read(Path file) throws MatroidFileException {
        return readHashed(file).matroid();
    }

    /**
     * A matroid read from a file together with the SHA-256 of the file's bytes, which identifies
     * the input in result files.
     *
     * @param matroid the matroid
     * @param sha256 the digest of the bytes read, 64 lower-case hex digits
     */
    public record Hashed(Matroid matroid, String sha256) {
    }

    /**
     * Reads a matroid file as {@link #read(Path)} and digests the same bytes, so the digest is
     * that of exactly the content interpreted.
     *
     * @throws MatroidFileException as {@link #read(Path)}
     */
    public static Hashed readHashed(Path file) throws MatroidFileException {
        byte[] bytes;
        try {
            bytes = InputFiles.read(file);
        } catch (IOException e) {
            throw new MatroidFileException(file.toString(), "cannot read the file: " + IoMessages.plain(e), e);
        }
        Json json;
        try {
            json = Json.parseUtf8(bytes);
        } catch (JsonFormatException e) {
            throw notJson(file.toString(), e);
        }
        return new Hashed(fromJson(json, file.toString()), Sha256.hex(bytes));
    }

    /**
     * Reads a matroid from JSON text, e.g. in tests or from standard input.
     *
     * @param source the name used in messages in place of a file path
     * @throws MatroidFileException as {@link #read(Path)}
     */
    public static Matroid parse(String text, String source) throws MatroidFileException {
        Json json;
        try {
            json = Json.parse(text);
        } catch (JsonFormatException e) {
            throw notJson(source, e);
        }
        return fromJson(json, source);
    }

    /**
     * Reads a matroid from an already parsed JSON value.
     *
     * @throws MatroidFileException as {@link #read(Path)}
     */
    public static Matroid fromJson(Json json, String source) throws MatroidFileException {
        try {
            return interpret(json.asObject("the top-level value"));
        } catch (JsonValueException e) {
            throw new MatroidFileException(source, e.getMessage(), e);
        }
    }

    private static MatroidFileException notJson(String source, JsonFormatException e) {
        return new MatroidFileException(source, "not valid JSON: " + e.getMessage(), e);
    }

    /**
     * The file format of an explicit matroid: {@code rank}, {@code labels}, {@code bases} in
     * canonical order. Reading it back gives an equal matroid.
     */
    public static Json.Obj toJson(ExplicitMatroid m) {
        return Json.Obj.builder()
                .put("rank", m.rank())
                .put("labels", Json.Arr.ofStrings(m.labels()))
                .put("bases", new Json.Arr(m.bases().stream().<Json>map(Json.Arr::ofInts).toList()))
                .build();
    }

    /** The file format of a matrix matroid: {@code rank}, {@code labels}, {@code matrix}. */
    public static Json.Obj toJson(MatrixMatroid m) {
        List<Json> columns = new ArrayList<>();
        for (int j = 0; j < m.size(); j++) {
            columns.add(new Json.Arr(Arrays.stream(m.column(j)).<Json>mapToObj(Json.Num::of).toList()));
        }
        return Json.Obj.builder()
                .put("rank", m.rank())
                .put("labels", Json.Arr.ofStrings(m.labels()))
                .put("matrix", Json.Obj.builder().put("field", m.field().name()).put("columns", new Json.Arr(columns))
                        .build())
                .build();
    }

    /**
     * Writes {@link #toJson(ExplicitMatroid)} to {@code file} atomically ({@link AtomicFiles}).
     *
     * @throws IOException when the file cannot be written; it is then unchanged
     */
    public static void write(Path file, ExplicitMatroid m) throws IOException {
        AtomicFiles.writeJson(file, toJson(m));
    }

    private static Matroid interpret(Json.Obj o) {
        o.requireOnly(TOP_FIELDS);
        o.find("comment").ifPresent(c -> c.asString(Json.Obj.describe("comment")));
        int rank = o.requireInt("rank");
        if (rank < 0) {
            throw new JsonValueException("field \"rank\" must be at least 0, found " + rank);
        }
        List<String> present = DATA_FIELDS.stream().filter(o::has).toList();
        if (present.size() != 1) {
            throw new JsonValueException("expected exactly one of \"bases\", \"nonbases\", \"matrix\", but "
                    + (present.isEmpty() ? "found none"
                            : "found " + present.stream().map(Json.Str::quote).collect(Collectors.joining(" and "))));
        }
        Optional<List<String>> labels = o.find("labels").map(MatroidFiles::labels);
        Optional<Integer> elements = o.find("elements").map(e -> e.asInt(Json.Obj.describe("elements")));
        if (elements.isPresent() && elements.get() < 0) {
            throw new JsonValueException("field \"elements\" must be at least 0, found " + elements.get());
        }
        if (labels.isPresent() && elements.isPresent() && labels.get().size() != elements.get()) {
            throw new JsonValueException("field \"elements\" is " + elements.get() + ", but there are "
                    + labels.get().size() + " labels");
        }
        Optional<Integer> declared = labels.map(List::size).or(() -> elements);
        String data = present.get(0);
        if (data.equals("matrix")) {
            return matrix(o.requireObject("matrix"), rank, labels, declared);
        }
        int n = declared.orElseThrow(() -> new JsonValueException("field \"elements\" is missing; it is required "
                + "with \"" + data + "\" when there are no \"labels\""));
        if (rank > n) {
            throw new JsonValueException("field \"rank\" is " + rank + ", but there are only " + n + " elements");
        }
        if (n > ExplicitMatroid.MAX_ELEMENTS) {
            throw new JsonValueException("a matroid given by \"" + data + "\" has at most "
                    + ExplicitMatroid.MAX_ELEMENTS + " elements, but there are " + n);
        }
        List<int[]> sets = sets(o.requireArray(data), data, n, rank);
        List<String> names = labels.orElseGet(() -> MatrixMatroid.indexLabels(n));
        try {
            return data.equals("bases") ? ExplicitMatroid.fromBases(names, rank, sets)
                    : ExplicitMatroid.fromNonBases(names, rank, sets);
        } catch (TooLargeException e) {
            throw new JsonValueException("too large: " + e.getMessage());
        } catch (InvalidMatroidException e) {
            throw new JsonValueException((data.equals("bases") ? "the bases do not form a matroid: "
                    : "the non-bases do not define a matroid: ") + e.getMessage());
        }
    }

    /** Distinct non-empty labels, as in the file format; shared with the chirotope reader. */
    static List<String> labels(Json json) {
        Json.Arr a = json.asArray(Json.Obj.describe("labels"));
        Map<String, Integer> firstIndex = new HashMap<>();
        List<String> out = new ArrayList<>(a.size());
        for (int i = 0; i < a.size(); i++) {
            String label = a.get(i).asString("labels[" + i + "]");
            if (label.isEmpty()) {
                throw new JsonValueException("labels[" + i + "] is empty; labels must be non-empty strings");
            }
            Integer earlier = firstIndex.putIfAbsent(label, i);
            if (earlier != null) {
                throw new JsonValueException("labels[" + i + "] repeats the label \"" + label + "\" of labels["
                        + earlier + "]");
            }
            out.add(label);
        }
        return out;
    }

    /**
     * The sets listed under {@code name}, each sorted, after checking size, range, repeats and
     * duplicates with messages that point at the item.
     */
    private static List<int[]> sets(Json.Arr list, String name, int n, int rank) {
        Map<ElementSet, Integer> firstIndex = new HashMap<>();
        List<int[]> out = new ArrayList<>(list.size());
        for (int i = 0; i < list.size(); i++) {
            String where = name + "[" + i + "]";
            Json.Arr set = list.get(i).asArray(where);
            if (set.size() != rank) {
                throw new JsonValueException(where + " has " + set.size() + " elements, but the rank is " + rank);
            }
            int[] elements = new int[rank];
            ElementSet seen = ElementSet.EMPTY;
            for (int j = 0; j < rank; j++) {
                int e = set.get(j).asInt(where + "[" + j + "]");
                if (e < 0) {
                    throw new JsonValueException(where + " names element " + e + ", but element indices start at 0");
                }
                if (e >= n) {
                    throw new JsonValueException(where + " names element " + e + ", but there are only " + n
                            + " elements (0.." + (n - 1) + ")");
                }
                if (seen.contains(e)) {
                    throw new JsonValueException(where + " repeats element " + e);
                }
                seen = seen.with(e);
                elements[j] = e;
            }
            Integer earlier = firstIndex.putIfAbsent(seen, i);
            if (earlier != null) {
                throw new JsonValueException(where + " is the same set as " + name + "[" + earlier + "]");
            }
            Arrays.sort(elements);
            out.add(elements);
        }
        return out;
    }

    private static MatrixMatroid matrix(Json.Obj m, int rank, Optional<List<String>> labels,
            Optional<Integer> declared) {
        Field field;
        List<long[]> columns = new ArrayList<>();
        try {
            m.requireOnly(MATRIX_FIELDS);
            String fieldName = m.requireString("field");
            try {
                field = Field.parse(fieldName);
            } catch (IllegalArgumentException e) {
                throw new JsonValueException(e.getMessage());
            }
            Json.Arr cols = m.requireArray("columns");
            for (int j = 0; j < cols.size(); j++) {
                Json.Arr c = cols.get(j).asArray("columns[" + j + "]");
                if (j > 0 && c.size() != columns.get(0).length) {
                    throw new JsonValueException("columns[" + j + "] has " + c.size() + " entries, but columns[0] has "
                            + columns.get(0).length);
                }
                long[] column = new long[c.size()];
                for (int i = 0; i < column.length; i++) {
                    column[i] = c.get(i).asLong("columns[" + j + "][" + i + "]");
                }
                columns.add(column);
            }
        } catch (JsonValueException e) {
            throw new JsonValueException("in \"matrix\": " + e.getMessage());
        }
        if (declared.isPresent() && declared.get() != columns.size()) {
            throw new JsonValueException("the matrix has " + columns.size() + " columns, but "
                    + (labels.isPresent() ? "there are " + declared.get() + " labels"
                            : "field \"elements\" is " + declared.get()));
        }
        MatrixMatroid matroid = new MatrixMatroid(field, columns,
                labels.orElseGet(() -> MatrixMatroid.indexLabels(columns.size())));
        if (matroid.rank() != rank) {
            throw new JsonValueException("field \"rank\" is " + rank + ", but the matrix has rank " + matroid.rank()
                    + " over " + field);
        }
        return matroid;
    }
}
