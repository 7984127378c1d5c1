package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.ValueSource;
import java.util.List;
import org.stasissheet.apheresis.ExchangeRow;
import org.stasissheet.files.WorksheetPdfs;
import org.stasissheet.flow.FlowCaveats;
import org.stasissheet.flow.WhatIf;
import org.stasissheet.intake.Case;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.Level;
import org.stasissheet.worksheet.Cautions;
import org.stasissheet.rules.TumorLysisVerdict;
import org.stasissheet.worksheet.Worksheet;

class WorksheetPdfTest {
    private static final String LABEL = "Invented patient, bed 4";

    private static byte[] render(String label, PdfOptions options) {
        Worksheet sheet = Fixtures.sheet(Fixtures.igmCase(label), Fixtures.SHIPPED);
        return WorksheetPdf.render(sheet, options, Fixtures.GENERATED, Fixtures.caseJson(label));
    }

    private static String squash(String s) {
        return s.replaceAll("\\s+", " ");
    }

    @Nested
    @DisplayName("every page")
    class EveryPage {
        @ParameterizedTest
        @EnumSource(Paper.class)
        @DisplayName("carries every standing caution and 'Page X of Y'")
        void cautionsAndPageNumbers(Paper paper) throws IOException {
            try (PdfProbe pdf = new PdfProbe(render(LABEL, new PdfOptions(paper, true, "test")))) {
                assertTrue(pdf.pages() >= 1);
                for (int n = 1; n <= pdf.pages(); n++) {
                    String text = squash(pdf.page(n));
                    for (String caution : Cautions.STANDING) {
                        assertTrue(text.contains(squash(caution)), "page " + n + " lacks caution: " + caution);
                    }
                    assertTrue(text.contains("Page " + n + " of " + pdf.pages()), "page " + n + ": " + text);
                }
            }
        }

        @Test
        @DisplayName("a long caution makes the band taller instead of being cut short")
        void longCaution_isPrintedWhole() throws IOException {
            Worksheet s = Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.SHIPPED);
            String longer = "Invented extra caution for this test, long enough to wrap over two or three lines of the "
                    + "band at this size: every word of it must still be printed on every page, because a caution "
                    + "that is cut short is no caution at all, and nobody reads the part that is missing.";
            List<String> cautions = new java.util.ArrayList<>(s.cautions());
            cautions.add(longer);
            Worksheet more = new Worksheet(s.source(), s.ruleSet(), s.inputs(), cautions, s.flow(), s.apheresis(),
                    s.hyperviscosity(), s.leukostasis(), s.tumorLysis(), s.flags(),
                    s.pulmonarySuggestion());
            byte[] bytes = WorksheetPdf.render(more, PdfOptions.defaults("t"), Fixtures.GENERATED,
                    Fixtures.caseJson(LABEL));
            try (PdfProbe pdf = new PdfProbe(bytes)) {
                for (int n = 1; n <= pdf.pages(); n++) {
                    assertTrue(squash(pdf.page(n)).contains(squash(longer)), "page " + n);
                }
            }
        }

        @Test
        @DisplayName("the paper option sets the page size (A4 595 × 842 pt, Letter 612 × 792 pt, ISO 216 / ANSI)")
        void paperSizes() throws IOException {
            try (var a4 = org.apache.pdfbox.Loader.loadPDF(render(LABEL, new PdfOptions(Paper.A4, true, "t")));
                 var letter = org.apache.pdfbox.Loader.loadPDF(render(LABEL, new PdfOptions(Paper.LETTER, true, "t")))) {
                // A4 is 210 × 297 mm = 595.3 × 841.9 pt; Letter 8.5 × 11 in = 612 × 792 pt (1 pt = 1/72 in)
                assertEquals(595.3, a4.getPage(0).getMediaBox().getWidth(), 0.5);
                assertEquals(841.9, a4.getPage(0).getMediaBox().getHeight(), 0.5);
                assertEquals(612, letter.getPage(0).getMediaBox().getWidth(), 0.5);
                assertEquals(792, letter.getPage(0).getMediaBox().getHeight(), 0.5);
            }
        }
    }

    @Test
    @DisplayName("the provenance block shows the rule set's full SHA-256, name and version")
    void provenance_fullSha256() throws IOException {
        try (PdfProbe pdf = new PdfProbe(render(LABEL, PdfOptions.defaults("9.9.9")))) {
            String text = squash(pdf.allText());
            assertTrue(text.contains(Fixtures.SHA256), text);
            assertTrue(text.contains("stasis-core, version 1.0.0"), text);
            assertTrue(text.contains("Stasis Sheet 9.9.9"), text);
            assertFalse(text.contains("LOCAL PROTOCOL"), "the shipped set is not a local protocol");
        }
    }

    @Test
    @DisplayName("a local rule set is announced as a local protocol")
    void localProtocol_isAnnounced() throws IOException {
        Worksheet sheet = Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.LOCAL);
        byte[] bytes = WorksheetPdf.render(sheet, PdfOptions.defaults("t"), Fixtures.GENERATED,
                Fixtures.caseJson(LABEL));
        try (PdfProbe pdf = new PdfProbe(bytes)) {
            assertTrue(squash(pdf.allText()).contains("LOCAL PROTOCOL: this rule set differs"));
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {Fixtures.GREEK_LABEL, Fixtures.CYRILLIC_LABEL, "Zoë Ångström-Łukasiewicz"})
    @DisplayName("patient labels in Greek, Cyrillic and accented Latin are extractable text in embedded fonts")
    void unicodeLabels_areExtractable(String label) throws IOException {
        try (PdfProbe pdf = new PdfProbe(render(label, PdfOptions.defaults("t")))) {
            assertTrue(pdf.page(1).contains(label), pdf.page(1));
            for (PDFont font : pdf.fonts()) {
                assertTrue(font.isEmbedded(), font.getName() + " must be embedded");
                assertTrue(font.getName().contains("LiberationSans"), font.getName());
            }
        }
    }

    @Test
    @DisplayName("the case file is embedded byte for byte, and OpenPDF and PDFBox both read it back")
    void attachment_equalsTheCase() throws IOException {
        byte[] json = Fixtures.caseJson(Fixtures.GREEK_LABEL);
        Worksheet sheet = Fixtures.sheet(Fixtures.igmCase(Fixtures.GREEK_LABEL), Fixtures.SHIPPED);
        byte[] bytes = WorksheetPdf.render(sheet, PdfOptions.defaults("t"), Fixtures.GENERATED, json);
        try (PdfProbe pdf = new PdfProbe(bytes)) {
            Map<String, byte[]> files = pdf.attachments();
            assertEquals(1, files.size(), files.keySet().toString());
            assertArrayEquals(json, files.get(WorksheetPdf.ATTACHMENT_NAME));
        }
        assertArrayEquals(json, WorksheetPdfs.extractCase(bytes));
        assertEquals(WorksheetPdf.ATTACHMENT_NAME, WorksheetPdfs.ATTACHMENT_NAME);
    }

    @Test
    @DisplayName("metadata carries the fixed title and no patient data")
    void metadata_hasNoPatientData() throws IOException {
        try (PdfProbe pdf = new PdfProbe(render(LABEL, PdfOptions.defaults("t")))) {
            assertEquals("Stasis Sheet worksheet", pdf.title());
            String meta = pdf.allMetadata();
            assertFalse(meta.contains("Invented"), meta);
            assertFalse(meta.contains("bed 4"), meta);
            assertEquals(Fixtures.GENERATED.toInstant(), pdf.creationDate(), "the generation time handed in");
        }
    }

    @Test
    @DisplayName("--no-identifiers leaves the label, the assessor and extra out of every page and the embedded case,"
            + " which still reads back")
    void noIdentifiers_removesTheLabelEverywhere() throws IOException {
        byte[] bytes = render(Fixtures.CYRILLIC_LABEL, new PdfOptions(Paper.A4, false, "t"));
        try (PdfProbe pdf = new PdfProbe(bytes)) {
            assertFalse(pdf.allText().contains("Анна"), "label text on a page");
            assertFalse(pdf.allText().contains("палата"), "label text on a page");
            assertTrue(pdf.allText().contains("left out of this copy"));
            String embedded = new String(pdf.attachments().get(WorksheetPdf.ATTACHMENT_NAME), StandardCharsets.UTF_8);
            assertFalse(embedded.contains("Анна"), embedded);
            assertTrue(embedded.contains("\"ageYears\""), "the rest of the case stays: " + embedded);
            assertFalse(embedded.contains("St. Alder Infirmary"), "extra (a hospital name) is dropped: " + embedded);
            assertFalse(embedded.contains("Invented night resident"), "the assessor is dropped: " + embedded);
            assertFalse(pdf.allText().contains("Invented night resident"), "the assessor on a page");
            assertInstanceOf(org.stasissheet.intake.CaseReader.Accepted.class,
                    org.stasissheet.intake.CaseReader.read(embedded.getBytes(StandardCharsets.UTF_8)),
                    "the teaching copy's case reads back");
        }
        // the raw bytes hold no UTF-16 or UTF-8 trace of the label either (the font subset is not searched)
        assertFalse(new String(bytes, StandardCharsets.ISO_8859_1).contains("bed 4"));
    }

    @Test
    @DisplayName("the same inputs give the same visible text (the renderer has no clock of its own)")
    void rendering_isDeterministicInText() throws IOException {
        try (PdfProbe a = new PdfProbe(render(LABEL, PdfOptions.defaults("t")));
             PdfProbe b = new PdfProbe(render(LABEL, PdfOptions.defaults("t")))) {
            assertEquals(a.allText(), b.allText());
            assertTrue(a.allText().contains("2026-03-05 03:05 +01:00"), "generation time as passed in");
        }
    }

    @Nested
    @DisplayName("the flow estimate")
    class Flow {
        @Test
        @DisplayName("is a vector chart with real text: axes, reference line, legend, values and every caveat")
        void chartIsVectorWithText() throws IOException {
            Worksheet sheet = Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.SHIPPED);
            byte[] bytes = WorksheetPdf.render(sheet, PdfOptions.defaults("t"), Fixtures.GENERATED,
                    Fixtures.caseJson(LABEL));
            try (PdfProbe pdf = new PdfProbe(bytes)) {
                String text = squash(pdf.allText());
                for (String expected : List.of("Microvascular flow estimate", "vessel diameter (µm, log scale)",
                        "relative flow (patient ÷ reference)", "1.0 = reference", "patient, in vitro law (Pries 1992)",
                        "patient, in vivo law (Pries 1994)", "10 µm", "What this estimate leaves out")) {
                    assertTrue(text.contains(expected), "missing: " + expected);
                }
                for (WhatIf w : sheet.flow().whatIf()) {
                    if (w.movedSeries().isKnown()) {
                        assertTrue(text.contains("what-if: " + w.name()), "legend lacks " + w.name());
                    }
                }
                for (String caveat : FlowCaveats.ALL) {
                    assertTrue(text.contains(squash(caveat)), "caveat missing: " + caveat);
                }
                assertEquals(0, pdf.rasterImages(), "the chart must be vector graphics, not a picture");
            }
        }

        @Test
        @DisplayName("the values table shows the worksheet's relative flow at 10 µm, as computed by the core")
        void tableMatchesTheWorksheet() throws IOException {
            Worksheet sheet = Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.SHIPPED);
            double at10 = sheet.flow().byDiameter().known().orElseThrow().stream()
                    .filter(p -> p.diameterUm() == 10).findFirst().orElseThrow().relativeFlow();
            byte[] bytes = WorksheetPdf.render(sheet, PdfOptions.defaults("t"), Fixtures.GENERATED,
                    Fixtures.caseJson(LABEL));
            try (PdfProbe pdf = new PdfProbe(bytes)) {
                assertTrue(squash(pdf.allText()).contains("patient, in vitro law (Pries 1992) "
                        + Numbers.rounded(sheet.flow().byDiameter().known().orElseThrow().get(1).relativeFlow(), 3)
                        + " " + Numbers.rounded(at10, 3)), squash(pdf.allText()));
            }
        }

        @Test
        @DisplayName("without a hematocrit the PDF says why there is no estimate instead of drawing one")
        void noHematocrit_saysSo() throws IOException {
            Case c = Fixtures.igmCase(LABEL);
            Case without = new Case(c.patient(), c.condition(), c.labs().without(Analyte.HEMATOCRIT), c.baseline(),
                    c.findings(), c.plan(), c.assessedAt(), c.assessor(), c.extraJson());
            Worksheet sheet = Fixtures.sheet(without, Fixtures.SHIPPED);
            String reason = sheet.flow().byDiameter().whyUnknown().orElseThrow();
            byte[] bytes = WorksheetPdf.render(sheet, PdfOptions.defaults("t"), Fixtures.GENERATED,
                    Fixtures.caseJson(LABEL));
            try (PdfProbe pdf = new PdfProbe(bytes)) {
                String text = squash(pdf.allText());
                assertTrue(text.contains("No flow chart. " + squash(PdfEstimateSections.sentence(reason))), text);
                assertFalse(text.contains("vessel diameter (µm, log scale)"), "no chart without a hematocrit");
                assertTrue(text.contains(squash(FlowCaveats.ALL.get(0))), "the caveats stay");
            }
        }
    }

    @Test
    @DisplayName("the apheresis table carries the worksheet's volumes and every exchange row")
    void apheresisTable() throws IOException {
        Worksheet sheet = Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.SHIPPED);
        byte[] bytes = WorksheetPdf.render(sheet, PdfOptions.defaults("t"), Fixtures.GENERATED,
                Fixtures.caseJson(LABEL));
        try (PdfProbe pdf = new PdfProbe(bytes)) {
            String text = squash(pdf.allText());
            assertTrue(text.contains("Total blood volume (Nadler)"), text);
            assertTrue(text.contains(Numbers.rounded(sheet.apheresis().bloodVolumeL().known().orElseThrow(), 3) + " L"));
            for (ExchangeRow row : sheet.apheresis().exchanges()) {
                assertTrue(text.contains(Numbers.rounded(row.intravascularRemaining() * 100, 3) + " %"),
                        "exchange row " + row.plasmaVolumes());
            }
        }
    }

    @Test
    @DisplayName("a full worksheet runs over several pages, each with the cautions and its page number")
    void fullWorksheet_isMultiPage() throws IOException {
        try (PdfProbe pdf = new PdfProbe(render(LABEL, PdfOptions.defaults("t")))) {
            assertTrue(pdf.pages() >= 2, "pages: " + pdf.pages());
            for (int n = 1; n <= pdf.pages(); n++) {
                String text = squash(pdf.page(n));
                assertTrue(text.contains(squash(Cautions.SHORT)), "page " + n);
                assertTrue(text.contains("Page " + n + " of " + pdf.pages()), "page " + n);
            }
        }
    }

    @Nested
    @DisplayName("verdicts and flags")
    class VerdictsAndFlags {
        @Test
        @DisplayName("every flag shows its level word and symbol, and cites its source by a number in the list")
        void everyFlagCitesANumberedSource() throws IOException {
            Worksheet sheet = Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.SHIPPED);
            assertFalse(sheet.flags().isEmpty(), "the invented IgM case fires rules");
            byte[] bytes = WorksheetPdf.render(sheet, PdfOptions.defaults("t"), Fixtures.GENERATED,
                    Fixtures.caseJson(LABEL));
            try (PdfProbe pdf = new PdfProbe(bytes)) {
                String text = squash(pdf.allText());
                int list = text.lastIndexOf("Sources cited");
                assertTrue(list > 0, "the numbered source list is there");
                String sources = text.substring(list);
                for (Flag f : sheet.flags()) {
                    int at = text.indexOf(squash(f.title()));
                    assertTrue(at >= 0 && at < list, "flag shown before the list: " + f.id());
                    java.util.regex.Matcher m = java.util.regex.Pattern.compile("Source \\[(\\d+)\\][^\\[]*rule "
                            + java.util.regex.Pattern.quote(f.id())).matcher(text);
                    assertTrue(m.find(), "flag " + f.id() + " cites a numbered source");
                    String entry = "[" + m.group(1) + "] " + squash(f.source());
                    assertTrue(sources.contains(entry), "source list lacks " + entry);
                }
                for (Level level : Level.values()) {
                    if (sheet.flags().stream().anyMatch(f -> f.level() == level)) {
                        assertTrue(text.contains(level.badge()), "group heading " + level.badge());
                    }
                }
            }
        }

        @Test
        @DisplayName("the three verdicts appear in words")
        void verdictsInWords() throws IOException {
            Worksheet sheet = Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.SHIPPED);
            try (PdfProbe pdf = new PdfProbe(WorksheetPdf.render(sheet, PdfOptions.defaults("t"), Fixtures.GENERATED,
                    Fixtures.caseJson(LABEL)))) {
                String text = squash(pdf.allText());
                assertTrue(text.contains(VerdictWords.hyperviscosity(sheet.hyperviscosity())), text);
                // a long verdict wraps in its narrow column, and text extraction may interleave the next column
                for (String word : VerdictWords.leukostasis(sheet.leukostasis()).split(" ")) {
                    assertTrue(text.contains(word), word + " in " + text);
                }
                assertTrue(text.contains("Tumor lysis"), text);
                // the invented IgM case has no leukemia, no therapy and no tumor-lysis value: one quiet line
                assertFalse(sheet.tumorLysis().applies());
                assertTrue(text.contains(squash(TumorLysisVerdict.NOT_CHECKED)), text);
                assertFalse(text.contains("only 0 of the 4"), text);
            }
        }
    }
}
