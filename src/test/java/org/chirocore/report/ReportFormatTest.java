package org.chirocore.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Escaping of plain text and monospaced pieces in each format. */
class ReportFormatTest {
    @ParameterizedTest(name = "{0}: {1}")
    @CsvSource(delimiter = '@', value = {
        "TEX@ a_b {c} 50% $x$ #1 ^ ~ \\@ a\\_b \\{c\\} 50\\% \\$x\\$ \\#1 \\textasciicircum{} \\textasciitilde{} \\textbackslash{}",
        "TEX@ without --input, a - b@ without -{}-input, a - b",
        "MD@ a_b *c* [d] |e| <f>@ a\\_b \\*c\\* \\[d\\] \\|e\\| \\<f\\>",
        "HTML@ a<b & \"c\"@ a&lt;b &amp; &quot;c&quot;"})
    void plainTextIsEscaped(ReportFormat format, String text, String escaped) {
        assertEquals(escaped, format.text(text));
    }

    @Test
    void monospacedTextWithABacktickKeepsItInMarkdown() {
        assertEquals("`` a`b ``", ReportFormat.MD.mono("a`b"));
        assertEquals("\\texttt{a\\_b}", ReportFormat.TEX.mono("a_b"));
    }

    @Test
    void tableRowsMustMatchTheHeader() {
        assertThrows(IllegalArgumentException.class, () -> Document.Table.plain(List.of("a", "b"), List.of(List.of("1"))));
    }
}
