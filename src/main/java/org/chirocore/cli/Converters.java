package org.chirocore.cli;

import java.util.ArrayList;
import java.util.function.Function;

import org.chirocore.matroid.Field;
import org.chirocore.matroid.HyperplaneSpec;
import org.chirocore.search.Strategy;

import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.TypeConversionException;

/**
 * Option value converters. Each delegates to the library's parser and passes its message on as
 * picocli's conversion error, so a bad value is reported like any other usage error.
 */
final class Converters {
    private Converters() {
    }

    /**
     * A range of cube dimensions written "A..B" or "A", as {A, B}.
     *
     * @throws ParameterException naming {@code option} when the text is not such a range with A ≤ B
     */
    static int[] range(CommandSpec spec, String option, String text) {
        String[] parts = text.trim().split("\\.\\.", -1);
        try {
            int a = Integer.parseInt(parts[0].trim());
            int b = parts.length == 2 ? Integer.parseInt(parts[1].trim()) : a;
            if (parts.length <= 2 && a <= b) {
                return new int[] {a, b};
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new ParameterException(spec.commandLine(), option + " must be A..B with integers A <= B, or one integer; "
                + "got \"" + text + "\".");
    }

    /** A field: "Q", "GF(p)", or just the prime p. */
    static final class FieldConverter implements ITypeConverter<Field> {
        @Override
        public Field convert(String text) {
            return library(text, t -> t.matches("\\d+") ? Field.gf(Integer.parseInt(t)) : Field.parse(t));
        }
    }

    /** A hyperplane description as {@link HyperplaneSpec#parse}. */
    static final class HyperplaneConverter implements ITypeConverter<HyperplaneSpec> {
        @Override
        public HyperplaneSpec convert(String text) {
            return library(text, HyperplaneSpec::parse);
        }
    }

    /** A strategy as {@link Strategy#fromId}. */
    static final class StrategyConverter implements ITypeConverter<Strategy> {
        @Override
        public Strategy convert(String text) {
            return library(text, Strategy::fromId);
        }
    }

    /** The names of the strategies, for help and completion. */
    static final class StrategyNames extends ArrayList<String> {
        private static final long serialVersionUID = 1L;

        StrategyNames() {
            for (Strategy s : Strategy.values()) {
                add(s.id());
            }
        }
    }

    private static <T> T library(String text, Function<String, T> parser) {
        try {
            return parser.apply(text);
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }
}
