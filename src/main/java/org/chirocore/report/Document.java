package org.chirocore.report;

import java.util.List;
import java.util.Objects;

/**
 * A report as format-neutral content: a title and a list of blocks, rendered by a
 * {@link ReportFormat}. Text is plain (no markup); each renderer escapes it for its format.
 *
 * @param title the report's title in plain text
 * @param heading the same title as inline pieces (with mathematics where it has any)
 * @param blocks the content, in order
 */
public record Document(String title, List<Inline> heading, List<Block> blocks) {
    public Document {
        Objects.requireNonNull(title, "The title is null.");
        heading = List.copyOf(heading);
        blocks = List.copyOf(blocks);
    }

    /** A document whose title is plain text. */
    public Document(String title, List<Block> blocks) {
        this(title, List.of(new Text(title)), blocks);
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

    /** A table; a cell is an inline piece (text, mono or mathematics); every row has as many cells as the header. */
    public record Table(List<String> header, List<List<Inline>> rows) implements Block {
        /** A table of plain-text cells. */
        public static Table plain(List<String> header, List<List<String>> rows) {
            return new Table(header, rows.stream().map(r -> r.stream().<Inline>map(Text::new).toList()).toList());
        }

        public Table {
            header = List.copyOf(header);
            rows = rows.stream().map(List::copyOf).toList();
            for (List<Inline> row : rows) {
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
    public sealed interface Inline permits Text, Mono, Math, Link {
    }

    /**
     * Mathematics: LaTeX source for math mode and the same in plain text for the other formats.
     *
     * @param latex for example {@code M\\setminus e}
     * @param text for example {@code M\\e}
     */
    public record Math(String latex, String text) implements Inline {
    }

    /** Plain text. */
    public record Text(String text) implements Inline {
    }

    /**
     * A link to a file beside the report.
     *
     * @param href the relative file name (never a URL: reports are self-contained)
     * @param text what the link says
     */
    public record Link(String href, String text) implements Inline {
        public Link {
            if (href.contains(":") || href.startsWith("/")) {
                throw new IllegalArgumentException("A link names a file beside the report, not \"" + href + "\".");
            }
        }
    }

    /** Text set in a monospaced font: labels, hashes, file names. */
    public record Mono(String text) implements Inline {
    }

    /**
     * A picture, drawn as SVG (HTML, Markdown) or TikZ (LaTeX).
     *
     * @param name a short file-name-safe name, e.g. {@code configuration}
     * @param caption what the picture shows
     * @param canvas its shapes
     */
    public record Picture(String name, String caption, Canvas canvas) {
        public Picture {
            if (!name.matches("[a-z0-9-]+")) {
                throw new IllegalArgumentException("A picture name must be lower-case letters, digits and '-', found \"" + name + "\".");
            }
        }

        /** The {@code <svg>} element, without an XML namespace declaration (added where a stand-alone file needs it). */
        public String svg() {
            return canvas.toSvg(caption);
        }

        /** The {@code tikzpicture} environment. */
        public String tikz() {
            return canvas.toTikz();
        }
    }
}
