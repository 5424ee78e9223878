package org.chirocore.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

import org.chirocore.report.Document.Block;
import org.chirocore.report.Document.Inline;

/**
 * The output formats of a report. {@link #render} walks a {@link Document} once; each format
 * says how to write each kind of block and inline piece, escaping plain text for itself.
 */
public enum ReportFormat {
    /** Markdown (CommonMark with pipe tables); pictures as SVG files beside it, linked. */
    MD {
        @Override
        String begin(String title) {
            return "# " + text(title) + "\n\n";
        }

        @Override
        String end() {
            return "";
        }

        @Override
        String heading(String text) {
            return "## " + text(text) + "\n\n";
        }

        @Override
        String paragraph(String inline) {
            return inline + "\n\n";
        }

        @Override
        String bullets(List<String> items) {
            return items.stream().map(i -> "- " + i + "\n").collect(Collectors.joining()) + "\n";
        }

        @Override
        String table(List<String> header, List<List<String>> rows) {
            return row(header) + header.stream().map(h -> "---").collect(Collectors.joining("|", "|", "|\n"))
                    + rows.stream().map(this::row).collect(Collectors.joining()) + "\n";
        }

        private String row(List<String> cells) {
            return cells.stream().map(this::text).collect(Collectors.joining(" | ", "| ", " |\n"));
        }

        @Override
        String code(String text) {
            return "```\n" + text + "\n```\n\n";
        }

        @Override
        String figure(Document.Picture picture, String stem, Map<String, String> files) {
            String file = stem + "-" + picture.name() + ".svg";
            files.put(file, picture.svg().replaceFirst("<svg ", "<svg xmlns=\"http://www.w3.org/2000/svg\" ") + "\n");
            return "![" + text(picture.caption()) + "](" + file + ")\n\n";
        }

        @Override
        String text(String text) {
            return text.replaceAll("([\\\\`*_\\[\\]<>|#])", "\\\\$1");
        }

        @Override
        String mono(String text) {
            return text.contains("`") ? "`` " + text + " ``" : "`" + text + "`";
        }
    },
    /**
     * A LaTeX fragment for the body of an ordinary article: no preamble, no packages beyond the
     * LaTeX kernel; pictures are left out (the kernel cannot include SVG) with a comment saying so.
     */
    TEX {
        @Override
        String begin(String title) {
            return "% Report written by chirocore: a fragment for the body of a LaTeX article.\n"
                    + "% It needs no package beyond the LaTeX kernel (not even amsmath).\n"
                    + "\\section*{" + text(title) + "}\n\n";
        }

        @Override
        String end() {
            return "";
        }

        @Override
        String heading(String text) {
            return "\\subsection*{" + text(text) + "}\n\n";
        }

        @Override
        String paragraph(String inline) {
            return inline + "\n\n";
        }

        @Override
        String bullets(List<String> items) {
            return "\\begin{itemize}\n" + items.stream().map(i -> "\\item " + i + "\n").collect(Collectors.joining())
                    + "\\end{itemize}\n\n";
        }

        @Override
        String table(List<String> header, List<List<String>> rows) {
            return "{\\small\\setlength{\\tabcolsep}{3pt}\n\\begin{tabular}{" + "l".repeat(header.size()) + "}\n\\hline\n"
                    + row(header) + "\\hline\n" + rows.stream().map(this::row).collect(Collectors.joining())
                    + "\\hline\n\\end{tabular}}\n\n";
        }

        private String row(List<String> cells) {
            return cells.stream().map(this::text).collect(Collectors.joining(" & ", "", " \\\\\n"));
        }

        @Override
        String code(String text) {
            return "\\begin{verbatim}\n" + text + "\n\\end{verbatim}\n\n";
        }

        @Override
        String figure(Document.Picture picture, String stem, Map<String, String> files) {
            return "% Picture \"" + picture.name() + "\" is in the HTML and Markdown reports (SVG): "
                    + picture.caption().replace('\n', ' ') + "\n\n";
        }

        @Override
        String text(String text) {
            StringBuilder s = new StringBuilder();
            for (char c : text.toCharArray()) {
                switch (c) {
                    case '\\' -> s.append("\\textbackslash{}");
                    case '{', '}', '$', '&', '#', '_', '%' -> s.append('\\').append(c);
                    case '~' -> s.append("\\textasciitilde{}");
                    case '^' -> s.append("\\textasciicircum{}");
                    case '<' -> s.append("\\textless{}");
                    case '>' -> s.append("\\textgreater{}");
                    default -> s.append(c);
                }
            }
            return s.toString();
        }

        @Override
        String mono(String text) {
            return "\\texttt{" + text(text) + "}";
        }
    },
    /** One self-contained HTML5 file: inline CSS and inline SVG, no external resources. */
    HTML {
        @Override
        String begin(String title) {
            return "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>" + text(title)
                    + "</title>\n<style>\n" + CSS + "</style>\n</head>\n<body>\n<h1>" + text(title) + "</h1>\n";
        }

        @Override
        String end() {
            return "</body>\n</html>\n";
        }

        @Override
        String heading(String text) {
            return "<h2>" + text(text) + "</h2>\n";
        }

        @Override
        String paragraph(String inline) {
            return "<p>" + inline + "</p>\n";
        }

        @Override
        String bullets(List<String> items) {
            return "<ul>\n" + items.stream().map(i -> "<li>" + i + "</li>\n").collect(Collectors.joining()) + "</ul>\n";
        }

        @Override
        String table(List<String> header, List<List<String>> rows) {
            return "<table>\n<thead>\n" + row("th", header) + "</thead>\n<tbody>\n"
                    + rows.stream().map(r -> row("td", r)).collect(Collectors.joining()) + "</tbody>\n</table>\n";
        }

        private String row(String cell, List<String> cells) {
            return cells.stream().map(c -> "<" + cell + ">" + text(c) + "</" + cell + ">")
                    .collect(Collectors.joining("", "<tr>", "</tr>\n"));
        }

        @Override
        String code(String text) {
            return "<pre>" + text(text) + "</pre>\n";
        }

        @Override
        String figure(Document.Picture picture, String stem, Map<String, String> files) {
            return "<figure>\n" + picture.svg() + "\n<figcaption>" + text(picture.caption()) + "</figcaption>\n</figure>\n";
        }

        @Override
        String text(String text) {
            return Svg.escape(text);
        }

        @Override
        String mono(String text) {
            return "<code>" + text(text) + "</code>";
        }
    };

    private static final String CSS = """
            body { font-family: Georgia, serif; max-width: 60em; margin: 2em auto; padding: 0 1em; line-height: 1.45; }
            code, pre { font-family: Menlo, Consolas, monospace; font-size: 0.9em; }
            pre { background: #f4f4f4; padding: 0.6em; overflow-x: auto; }
            table { border-collapse: collapse; margin: 1em 0; font-size: 0.9em; }
            th, td { border: 1px solid #ccc; padding: 0.2em 0.5em; text-align: left; }
            figure { margin: 1em 0; }
            figcaption { font-size: 0.9em; color: #444; }
            """;

    /**
     * Renders {@code doc}. Cost: linear in its size.
     *
     * @param stem the main file's name without extension, prefix of side files' names
     */
    public Rendered render(Document doc, String stem) {
        StringBuilder out = new StringBuilder(begin(doc.title()));
        Map<String, String> files = new LinkedHashMap<>();
        for (Block b : doc.blocks()) {
            if (b instanceof Document.Heading h) {
                out.append(heading(h.text()));
            } else if (b instanceof Document.Paragraph p) {
                out.append(paragraph(inline(p.pieces())));
            } else if (b instanceof Document.Bullets l) {
                out.append(bullets(l.items().stream().map(this::inline).toList()));
            } else if (b instanceof Document.Table t) {
                out.append(table(t.header(), t.rows()));
            } else if (b instanceof Document.Code c) {
                out.append(code(c.text()));
            } else if (b instanceof Document.Figure f) {
                out.append(figure(f.picture(), stem, files));
            }
        }
        return new Rendered(out.toString().stripTrailing() + "\n" + end(), files);
    }

    /** The usual file extension, without the dot. */
    public String extension() {
        return name().toLowerCase(Locale.ROOT);
    }

    private String inline(List<Inline> pieces) {
        return pieces.stream().map(i -> i instanceof Document.Mono m ? mono(m.text()) : text(((Document.Text) i).text()))
                .collect(Collectors.joining());
    }

    abstract String begin(String title);

    abstract String end();

    abstract String heading(String text);

    abstract String paragraph(String inline);

    abstract String bullets(List<String> items);

    abstract String table(List<String> header, List<List<String>> rows);

    abstract String code(String text);

    /** Writes a figure; a format that links pictures adds the file to {@code files}. */
    abstract String figure(Document.Picture picture, String stem, Map<String, String> files);

    /** Plain text, escaped for the format. */
    abstract String text(String text);

    abstract String mono(String text);
}
