package org.chirocore.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The checkers themselves: they accept good text and catch each kind of mistake. */
class StructureTest {
    @ParameterizedTest
    @ValueSource(strings = {"<html><body><p>x</body></html>", "<html><p>a</p>", "<p>a</q>", "<p>1 < 2</p>", "<html></html>"})
    void badHtmlIsCaught(String html) {
        assertNotEquals("", Structure.htmlProblem(html.equals("<html></html>") ? html : "<!DOCTYPE html>" + html));
    }

    @ParameterizedTest
    @ValueSource(strings = {"<!DOCTYPE html><html><head><meta charset=\"utf-8\"></head><body><svg><circle r=\"1\" /></svg></body></html>"})
    void goodHtmlPasses(String html) {
        assertEquals("", Structure.htmlProblem(html));
    }

    @ParameterizedTest
    @ValueSource(strings = {"a_b", "{a", "a}", "\\begin{itemize}\n\\item x\n", "\\begin{itemize}\\end{tabular}", "$x",
        "\\begin{verbatim}\nx"})
    void badLatexIsCaught(String tex) {
        assertNotEquals("", Structure.latexProblem(tex));
    }

    @ParameterizedTest
    @ValueSource(strings = {"a\\_b \\{x\\} % a_comment", "\\begin{itemize}\n\\item \\texttt{x}\n\\end{itemize}",
        "\\begin{verbatim}\na_b {\n\\end{verbatim}"})
    void goodLatexPasses(String tex) {
        assertEquals("", Structure.latexProblem(tex));
    }
}
