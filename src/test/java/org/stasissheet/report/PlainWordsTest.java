package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.course.Course;
import org.stasissheet.course.CourseAssessor;
import org.stasissheet.course.CourseEntry;
import org.stasissheet.course.CourseReader;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.CourseWriter;
import org.stasissheet.course.Procedure;
import org.stasissheet.files.CaseFiles;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.CaseWriter;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.rules.SafetyPropertiesTest;
import org.stasissheet.ui.sheet.SheetContent;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/**
 * What a clinician reads speaks one clinical vocabulary: the text worksheet, the handoff note, the PDF and the form's
 * worksheet labels, for every demo case and for generated cases. Rule ids, case-file keys and hashes belong only in
 * the "source and basis" lines and the provenance; UCUM codes only in files and JSON.
 */
class PlainWordsTest {
    private static final RuleSet RULES = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();

    /** A rule or parameter id, or a case-file key, inside a sentence. */
    private static final Pattern CODE_IN_SENTENCE = Pattern.compile("\\b(hyperviscosity|leukostasis|hyperleukocytosis"
            + "|tumorLysis|artefact|apheresis|apl|hyperkalaemia|exchange|leukocrit|transfusion|labs|findings|patient"
            + "|condition|plan|baseline)\\.[a-zA-Z]");
    /** A UCUM code where a unit symbol belongs. */
    private static final Pattern UCUM_IN_PROSE = Pattern.compile("10\\*|\\{rel}|umol|\\bum\\b|mm\\[Hg]|/uL|mPa\\.s"
            + "|\\bmeq/|x10\\^");
    private static final Pattern OLD_MARKS = Pattern.compile("\\[!!!]|\\[!]|\\[i]|▲");

    static List<Case> cases() throws IOException {
        List<Case> cases = new ArrayList<>();
        try (Stream<Path> samples = Files.list(Path.of("samples"))) {
            for (Path p : samples.filter(p -> p.toString().endsWith(".json")).sorted().toList()) {
                cases.add(((CaseReader.Accepted) CaseFiles.read(p)).c());
            }
        }
        Random r = new Random(2026L);
        for (int i = 0; i < 150; i++) {
            cases.add(SafetyPropertiesTest.randomCase(r));
        }
        return cases;
    }

    /** The lines a person reads as sentences: source-and-basis lines and the provenance are left out. */
    private static List<String> sentences(String text) {
        List<String> out = new ArrayList<>();
        boolean provenance = false;
        for (String line : text.split("\\R")) {
            // the provenance block ends a text; the rule-set line stands near the top, so only it is left out
            if (line.trim().equalsIgnoreCase("Provenance")) {
                provenance = true;
            }
            if (provenance || line.startsWith("Rule set:") || line.contains("source and basis:") || line.contains(" · rule ")
                    || line.contains("basis: ")) {
                continue;
            }
            out.add(line);
        }
        return out;
    }

    private static void check(String where, String text, List<String> problems) {
        for (String line : sentences(text)) {
            for (Pattern p : List.of(CODE_IN_SENTENCE, UCUM_IN_PROSE, OLD_MARKS)) {
                Matcher m = p.matcher(line);
                if (m.find()) {
                    problems.add(where + ": '" + m.group() + "' in: " + line.trim());
                }
            }
            if (line.toLowerCase(java.util.Locale.ROOT).contains("not assessable")) {
                problems.add(where + ": 'not assessable' in: " + line.trim());
            }
            // a reason is said once: "not estimated: not estimated: ..." reads as a stutter
            if (line.matches(".*not estimated:\\s*not estimated.*")) {
                problems.add(where + ": a doubled 'not estimated' in: " + line.trim());
            }
        }
    }

    private static String form(SheetContent s) {
        StringBuilder sb = new StringBuilder();
        s.verdicts().forEach(v -> sb.append(v.title()).append('\n').append(v.word()).append('\n')
                .append(String.join("\n", v.lines())).append('\n'));
        s.flagGroups().forEach(g -> {
            sb.append(g.heading()).append('\n');
            g.flags().forEach(f -> sb.append(f.title()).append('\n').append(f.explanation()).append('\n'));
        });
        s.volumes().forEach(r -> sb.append(r.label()).append(' ').append(r.value()).append('\n'));
        s.leukapheresis().forEach(r -> sb.append(r.label()).append(' ').append(r.value()).append('\n'));
        s.inputs().forEach(r -> sb.append(r.label()).append(' ').append(r.value()).append('\n'));
        s.apheresisNotes().forEach(n -> sb.append(n).append('\n'));
        sb.append(s.ruleSetBadge()).append('\n');
        return sb.toString();
    }

    @Test
    @DisplayName("text worksheet, handoff note and the form's worksheet speak plain clinical words")
    void textNoteAndForm() throws IOException {
        List<String> problems = new ArrayList<>();
        int i = 0;
        for (Case c : cases()) {
            Worksheet ws = Assessor.assess(c, RULES);
            String name = "case " + i++;
            check(name + " text", WorksheetText.render(ws), problems);
            check(name + " note", HandoffNote.render(ws, true), problems);
            check(name + " form", form(SheetContent.of(ws, List.of())), problems);
        }
        assertEquals(List.of(), problems.stream().distinct().limit(40).toList());
    }

    @Test
    @DisplayName("the PDF's text speaks plain clinical words (every demo case and some generated ones)")
    void pdfText() throws IOException {
        List<String> problems = new ArrayList<>();
        List<Case> cases = cases().subList(0, 14);
        int i = 0;
        for (Case c : cases) {
            Worksheet ws = Assessor.assess(c, RULES);
            byte[] pdf = WorksheetPdf.render(ws, PdfOptions.defaults("test"),
                    OffsetDateTime.parse("2026-06-11T03:15:00+02:00"),
                    CaseWriter.write(c).getBytes(StandardCharsets.UTF_8));
            try (PdfProbe probe = new PdfProbe(pdf)) {
                check("case " + i++ + " pdf", probe.allText(), problems);
            }
        }
        assertEquals(List.of(), problems.stream().distinct().limit(40).toList());
    }

    /**
     * The sample courses, the Gertz 2018 course of the tests, and courses made of generated cases (same patient and
     * condition, a day apart) with a plasma exchange and a leukapheresis between them.
     */
    static List<CourseReport> courses() throws IOException {
        List<Course> courses = new ArrayList<>();
        List<Path> files = new ArrayList<>();
        try (Stream<Path> samples = Files.list(Path.of("samples", "courses"))) {
            samples.filter(p -> p.toString().endsWith(".json")).sorted().forEach(files::add);
        }
        files.add(Path.of("src", "test", "resources", "courses", "gertz-2018-iga.json"));
        for (Path p : files) {
            CourseReader.Result r = CourseReader.read(Files.readAllBytes(p));
            assertInstanceOf(CourseReader.Accepted.class, r, p + ": " + r);
            courses.add(((CourseReader.Accepted) r).course());
        }
        Random r = new Random(2015L);
        OffsetDateTime start = OffsetDateTime.parse("2026-06-11T08:00:00+02:00");
        for (int i = 0; i < 20; i++) {
            Case first = SafetyPropertiesTest.randomCase(r);
            List<CourseEntry> entries = new ArrayList<>();
            for (int n = 0; n < 3; n++) {
                Case c = n == 0 ? first : SafetyPropertiesTest.randomCase(r);
                entries.add(new CourseEntry.Assessment(new Case(first.patient(), first.condition(), c.labs(),
                        c.baseline(), c.findings(), c.plan(), java.util.Optional.of(start.plusDays(n)), c.assessor(),
                        c.extraJson())));
            }
            entries.add(new Procedure.PlasmaExchange(start.plusHours(2), java.util.Optional.of(1.0),
                    java.util.Optional.empty(), Procedure.Replacement.ALBUMIN));
            entries.add(new Procedure.Leukapheresis(start.plusDays(1).plusHours(2), 2));
            courses.add(new Course(first.patient(), first.condition(), entries, "{}"));
        }
        List<CourseReport> reports = new ArrayList<>();
        courses.forEach(c -> reports.add(CourseAssessor.assess(c, RULES)));
        return reports;
    }

    @Test
    @DisplayName("the course's text report, handoff note with its trend line and the form's course table and chart "
            + "titles speak plain clinical words")
    void courseTextAndNote() throws IOException {
        List<String> problems = new ArrayList<>();
        int i = 0;
        for (CourseReport report : courses()) {
            String name = "course " + i++;
            check(name + " text", CourseText.render(report), problems);
            check(name + " note", CourseText.note(report, true), problems);
            CourseText.trendLine(report).ifPresent(t -> check(name + " trend", t, problems));
            StringBuilder form = new StringBuilder();
            org.stasissheet.ui.course.CourseRows.rows(report).forEach(r -> form.append(String.join("\n",
                    r.procedure(), r.analyte(), r.before(), r.projectedLow(), r.projectedHigh(), r.measuredNext(),
                    r.difference(), r.review())).append('\n'));
            org.stasissheet.ui.course.CourseRows.trends(report).forEach(t -> {
                form.append(t.title()).append('\n');
                t.procedures().forEach(p -> form.append(p.label()).append('\n'));
            });
            check(name + " form", form.toString(), problems);
        }
        assertEquals(List.of(), problems.stream().distinct().limit(40).toList());
    }

    @Test
    @DisplayName("the course PDF's text speaks plain clinical words (every sample course, the Gertz course, some "
            + "generated ones)")
    void coursePdfText() throws IOException {
        List<String> problems = new ArrayList<>();
        List<CourseReport> reports = courses();
        int i = 0;
        for (CourseReport report : reports.subList(0, 6)) {
            byte[] pdf = CoursePdf.render(report, PdfOptions.defaults("test"),
                    OffsetDateTime.parse("2026-06-12T15:00:00+02:00"),
                    CourseWriter.write(report.course()).getBytes(StandardCharsets.UTF_8));
            try (PdfProbe probe = new PdfProbe(pdf)) {
                check("course " + i++ + " pdf", probe.allText(), problems);
            }
        }
        assertEquals(List.of(), problems.stream().distinct().limit(40).toList());
    }
}
