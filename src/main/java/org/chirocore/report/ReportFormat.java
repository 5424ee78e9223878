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
        String begin(String title, String heading) {
            return "# " + heading + "\n\n";
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
            return String.join(" | ", cells).transform(r -> "| " + r + " |\n");
        }

        @Override
        String code(String text) {
            return "```\n" + text + "\n```\n\n";
        }

        @Override
        String figure(Document.Picture picture, String stem, Map<String, String> files) {
            String file = stem + "-" + picture.name() + ".svg";
            for (int i = 2; files.containsKey(file); i++) {
                file = stem + "-" + picture.name() + "-" + i + ".svg";
            }
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
     * A LaTeX fragment for the body of an ordinary article: no preamble; mathematics in math mode;
     * pictures as TikZ (the only package it needs); long hashes may break, tables in small type.
     */
    TEX {
        @Override
        String begin(String title, String heading) {
            return "% Report written by chirocore: a fragment for the body of a LaTeX article.\n"
                    + "% Its pictures need \\usepackage{tikz} in the preamble (Debian: texlive-pictures); nothing else\n"
                    + "% beyond the LaTeX kernel (not even amsmath). It is set \\sloppy inside a group, so that long\n"
                    + "% hashes break at their allowed points instead of running into the margin.\n"
                    + "\\begingroup\\sloppy\n"
                    + "\\section*{" + heading + "}\n\n";
        }

        @Override
        String end() {
            return "\\endgroup\n";
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
            // centred, so that two tables in a row are apart and neither gets a paragraph indent
            return "\\begin{center}\\footnotesize\\setlength{\\tabcolsep}{3pt}\n\\begin{tabular}{" + "l".repeat(header.size())
                    + "}\n\\hline\n" + row(header) + "\\hline\n" + rows.stream().map(this::row).collect(Collectors.joining())
                    + "\\hline\n\\end{tabular}\n\\end{center}\n\n";
        }

        private String row(List<String> cells) {
            return String.join(" & ", cells) + " \\\\\n";
        }

        @Override
        String code(String text) {
            return "{\\footnotesize\n\\begin{verbatim}\n" + wrap(text) + "\n\\end{verbatim}\n}\n\n";
        }

        /** Lines longer than {@value #CODE_WIDTH} characters broken at a space with a shell continuation. */
        private static String wrap(String text) {
            StringBuilder out = new StringBuilder();
            for (String line : text.split("\n", -1)) {
                while (line.length() > CODE_WIDTH && line.lastIndexOf(' ', CODE_WIDTH - 2) > 0) {
                    int cut = line.lastIndexOf(' ', CODE_WIDTH - 2);
                    out.append(line, 0, cut).append(" \\\n");
                    line = "    " + line.substring(cut + 1);
                }
                out.append(line).append('\n');
            }
            return out.toString().stripTrailing();
        }

        @Override
        String figure(Document.Picture picture, String stem, Map<String, String> files) {
            return "\\begin{center}\n" + picture.tikz() + "\n\\end{center}\n{\\small " + text(picture.caption())
                    + "\\par}\n\\medskip\n\n";
        }

        @Override
        String text(String text) {
            StringBuilder s = new StringBuilder();
            for (int i = 0; i < text.length(); i++) {
                char c = text.charAt(i);
                switch (c) {
                    // "--" and "---" are dash ligatures in text: an option such as --input keeps its hyphens
                    case '-' -> s.append(i + 1 < text.length() && text.charAt(i + 1) == '-' ? "-{}" : "-");
                    case '\\' -> s.append("\\textbackslash{}");
                    case '{', '}', '$', '&', '#', '_', '%' -> s.append('\\').append(c);
                    case '~' -> s.append("\\textasciitilde{}");
                    case '^' -> s.append("\\textasciicircum{}");
                    case '<' -> s.append("\\textless{}");
                    case '>' -> s.append("\\textgreater{}");
                    case '\u2013', '\u2212' -> s.append("--");
                    case '\u2014' -> s.append("---");
                    case '\u2264' -> s.append("$\\le$");
                    case '\u2265' -> s.append("$\\ge$");
                    case '\u00d7' -> s.append("$\\times$");
                    case '\u2026' -> s.append("\\ldots{}");
                    default -> s.append(c);
                }
            }
            return s.toString();
        }

        @Override
        String mono(String text) {
            // a long run without spaces (a hash) may break every 8 characters
            StringBuilder s = new StringBuilder();
            int run = 0;
            for (char c : text.toCharArray()) {
                run = c == ' ' ? 0 : run + 1;
                s.append(run > 1 && run % 8 == 1 ? "\\allowbreak{}" : "").append(text(String.valueOf(c)));
            }
            return "\\texttt{" + s + "}";
        }

        @Override
        String math(Document.Math math) {
            return "$" + math.latex() + "$";
        }
    },
    /** One self-contained HTML5 file: inline CSS and inline SVG, no external resources. */
    HTML {
        @Override
        String begin(String title, String heading) {
            return "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>" + text(title)
                    + "</title>\n<style>\n" + CSS + "</style>\n</head>\n<body>\n<h1>" + heading + "</h1>\n";
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
            return cells.stream().map(c -> "<" + cell + ">" + c + "</" + cell + ">")
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
            return Canvas.escape(text);
        }

        @Override
        String mono(String text) {
            return "<code>" + text(text) + "</code>";
        }
    };

    /** Characters of a code line in LaTeX (footnotesize typewriter fits about 80 in an article's text width). */
    private static final int CODE_WIDTH = 76;

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
        StringBuilder out = new StringBuilder(begin(doc.title(), inline(doc.heading())));
        Map<String, String> files = new LinkedHashMap<>();
        for (Block b : doc.blocks()) {
            if (b instanceof Document.Heading h) {
                out.append(heading(h.text()));
            } else if (b instanceof Document.Paragraph p) {
                out.append(paragraph(inline(p.pieces())));
            } else if (b instanceof Document.Bullets l) {
                out.append(bullets(l.items().stream().map(this::inline).toList()));
            } else if (b instanceof Document.Table t) {
                out.append(table(t.header().stream().map(this::text).toList(),
                        t.rows().stream().map(r -> r.stream().map(c -> inline(List.of(c))).toList()).toList()));
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
        return pieces.stream().map(i -> i instanceof Document.Mono m ? mono(m.text())
                : i instanceof Document.Math m ? math(m) : i instanceof Document.Link l ? link(l)
                : text(((Document.Text) i).text())).collect(Collectors.joining());
    }

    /** A link to a file beside the report: in LaTeX its name. */
    String link(Document.Link link) {
        return this == TEX ? mono(link.href()) : this == HTML ? "<a href=\"" + text(link.href()) + "\">" + text(link.text()) + "</a>"
                : "[" + text(link.text()) + "](" + link.href() + ")";
    }

    /** Mathematics; plain text except in LaTeX. */
    String math(Document.Math math) {
        return text(math.text());
    }

    /** The start of the document: {@code title} in plain text, {@code heading} rendered in the format. */
    abstract String begin(String title, String heading);

    abstract String end();

    abstract String heading(String text);

    abstract String paragraph(String inline);

    abstract String bullets(List<String> items);

    /** A table of cells already rendered in the format. */
    abstract String table(List<String> header, List<List<String>> rows);

    abstract String code(String text);

    /** Writes a figure; a format that links pictures adds the file to {@code files}. */
    abstract String figure(Document.Picture picture, String stem, Map<String, String> files);

    /** Plain text, escaped for the format. */
    abstract String text(String text);

    abstract String mono(String text);
}
