package org.chirocore.report;

import java.util.List;
import java.util.Objects;

/**
 * A report as format-neutral content: a title and a list of blocks, rendered by a
 * {@link ReportFormat}. Text is plain (no markup); each renderer escapes it for its format.
 *
 * @param title the report's title
 * @param blocks the content, in order
 */
public record Document(String title, List<Block> blocks) {
    public Document {
        Objects.requireNonNull(title, "The title is null.");
        blocks = List.copyOf(blocks);
    }

    /** A block of content. */
    public sealed interface Block permits Heading, Paragraph, Bullets, Table, Code, Figure {
    }

    /** A section heading. */
    public record Heading(String text) implements Block {
    }

    /** A paragraph of inline pieces. */
    public record Paragraph(List<Inline> pieces) implements Block {
        public Paragraph {
            pieces = List.copyOf(pieces);
        }

        /** A paragraph of plain text. */
        public static Paragraph of(String text) {
            return new Paragraph(List.of(new Text(text)));
        }
    }

    /** A bulleted list; each item is a list of inline pieces. */
    public record Bullets(List<List<Inline>> items) implements Block {
        public Bullets {
            items = items.stream().map(List::copyOf).toList();
        }
    }

    /** A table of plain-text cells; every row has as many cells as the header. */
    public record Table(List<String> header, List<List<String>> rows) implements Block {
        public Table {
            header = List.copyOf(header);
            rows = rows.stream().map(List::copyOf).toList();
            for (List<String> row : rows) {
                if (row.size() != header.size()) {
                    throw new IllegalArgumentException("A table row has " + row.size() + " cells, but the header has "
                            + header.size() + ": " + row + ".");
                }
            }
        }
    }

    /** Preformatted text, such as a command or a hash. */
    public record Code(String text) implements Block {
    }

    /** A picture with a caption. */
    public record Figure(Picture picture) implements Block {
    }

    /** An inline piece of a paragraph. */
    public sealed interface Inline permits Text, Mono {
    }

    /** Plain text. */
    public record Text(String text) implements Inline {
    }

    /** Text set in a monospaced font: labels, hashes, file names. */
    public record Mono(String text) implements Inline {
    }

    /**
     * An SVG picture.
     *
     * @param name a short file-name-safe name, e.g. {@code configuration}
     * @param caption what the picture shows
     * @param svg the {@code <svg>} element, without an XML namespace declaration (added where a
     *     stand-alone file needs it)
     */
    public record Picture(String name, String caption, String svg) {
        public Picture {
            if (!name.matches("[a-z0-9-]+")) {
                throw new IllegalArgumentException("A picture name must be lower-case letters, digits and '-', found \"" + name + "\".");
            }
            if (!svg.startsWith("<svg ")) {
                throw new IllegalArgumentException("A picture must be an <svg> element.");
            }
        }
    }
}
