package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stasissheet.course.CourseAssessor;
import org.stasissheet.course.CourseReader;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.CourseWriter;
import org.stasissheet.files.RuleSources;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;

/** The course PDF's time charts keep every label on the page. */
class CourseChartTest {
    private static final RuleSet RULES = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();
    /** The page margin of the course PDF (CoursePdf.MARGIN), in points. */
    private static final float MARGIN = 40;

    @ParameterizedTest
    @ValueSource(strings = {"samples/courses/igm-exchange-series.json",
            "samples/courses/aml-leukapheresis-hydroxyurea.json",
            "src/test/resources/courses/gertz-2018-iga.json"})
    @DisplayName("regression: a procedure at the course's last time had its label cut at the chart's right edge "
            + "(\"#6 ri\" for rituximab); every glyph now lies inside the page margins")
    void labelsInsideTheMargins(String file) throws IOException {
        CourseReport report = CourseAssessor.assess(((CourseReader.Accepted) CourseReader.read(
                Files.readAllBytes(Path.of(file)))).course(), RULES);
        byte[] pdf = CoursePdf.render(report, PdfOptions.defaults("test"),
                OffsetDateTime.parse("2026-06-12T15:00:00+02:00"),
                CourseWriter.write(report.course()).getBytes(StandardCharsets.UTF_8));
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            float right = doc.getPage(1).getMediaBox().getWidth() - MARGIN;
            List<String> outside = new ArrayList<>();
            StringBuilder chartText = new StringBuilder();
            PDFTextStripper stripper = new PDFTextStripper() {
                @Override
                protected void writeString(String text, List<TextPosition> glyphs) {
                    chartText.append(text).append('\n');
                    for (TextPosition g : glyphs) {
                        if (g.getXDirAdj() + g.getWidthDirAdj() > right + 0.5f || g.getXDirAdj() < MARGIN - 0.5f) {
                            outside.add(text);
                            return;
                        }
                    }
                }
            };
            stripper.setStartPage(2);
            stripper.setEndPage(2);
            stripper.getText(doc);
            assertEquals(List.of(), outside, "text leaving the chart area on page 2");
            if (file.contains("igm")) {
                assertTrue(chartText.toString().contains("#6 rituximab"), chartText.toString());
            }
        }
    }

    @Test
    @DisplayName("labels flip left of their line at the right edge and step down a row instead of overlapping")
    void labelRows() {
        CourseChart.LabelRows rows = new CourseChart.LabelRows(46, 500);
        float[] first = rows.place(100, 40);
        assertEquals(101.5f, first[0], 1e-4);
        assertEquals(0, first[1], 1e-9);
        float[] near = rows.place(110, 40);
        assertEquals(1, near[1], 1e-9, "would overlap the first: one row lower");
        float[] edge = rows.place(499, 40);
        assertEquals(499 - 1.5f - 40, edge[0], 1e-4);
        assertTrue(edge[0] + 40 <= 500);
    }
}
