package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;

/** {@code labs import} and {@code export fhir} on the command line: valid cases written, bad input refused. */
class LabsCommandTest {
    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return StasisCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    private static Case read(Path p) throws IOException {
        CaseReader.Result r = CaseReader.read(Files.readAllBytes(p));
        assertTrue(r instanceof CaseReader.Accepted, r::toString);
        return ((CaseReader.Accepted) r).c();
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"aml-night.txt", "aml-night.hl7", "wm-ward.fhir.json"})
    @DisplayName("labs import writes a case the case reader accepts, from text, HL7 v2 and FHIR alike")
    void import_writesAValidCase(String report) throws IOException {
        Path out = dir.resolve("case.json");
        assertEquals(ExitCode.DONE, run("labs", "import", Path.of("lab-reports", report).toString(), "-o",
                out.toString()), err.toString());
        Case c = read(out);
        assertFalse(c.labs().values().isEmpty());
        assertTrue(c.extraJson().contains("\"labImport\""), c.extraJson());
        assertTrue(this.out.toString().contains("not imported"), this.out.toString());
    }

    @Test
    @DisplayName("--into keeps the case and replaces only the imported values, and says which")
    void into_mergesAndReportsReplacements() throws IOException {
        Path report = dir.resolve("r.txt");
        Files.writeString(report, "WBC 210 x10^9/L H\nSodium 131 mmol/L\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("merged.json");
        Path sample = Path.of("samples", "aml-breathless.json");
        assertEquals(ExitCode.DONE, run("labs", "import", report.toString(), "--into", sample.toString(),
                "-o", out.toString()), err.toString());
        Case before = read(sample);
        Case after = read(out);
        assertEquals(Optional.of(Measurement.of(Analyte.WBC, 210, "10*9/L")), after.labs().get(Analyte.WBC));
        assertEquals(before.labs().get(Analyte.HEMOGLOBIN), after.labs().get(Analyte.HEMOGLOBIN));
        assertEquals(before.findings(), after.findings());
        assertTrue(after.extraJson().contains("St. Alder Infirmary"), "the earlier extra is kept");
        assertTrue(this.out.toString().contains("labs.wbc: 182 10*3/uL replaced by 210 10*9/L"), this.out.toString());
    }

    @Test
    @DisplayName("an ambiguous line stops the import: exit 2, the line located, nothing written")
    void ambiguity_exit2NothingWritten() throws IOException {
        Path report = dir.resolve("r.txt");
        Files.writeString(report, "WBC 182.4 x10^9/L\nK 6.8\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("case.json");
        assertEquals(ExitCode.INVALID_INPUT, run("labs", "import", report.toString(), "-o", out.toString()));
        assertFalse(Files.exists(out));
        assertTrue(err.toString().contains("line 2: potassium: no unit printed after 6.8"), err.toString());
        assertTrue(err.toString().contains("nothing was written"), err.toString());
    }

    @Test
    @DisplayName("an unreadable value of a named analyte stops the import with the field, value and unit")
    void unreadableNamedValue_exit2() throws IOException {
        Path report = dir.resolve("r.txt");
        Files.writeString(report, "Sodium 14 mmol/L\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("case.json");
        assertEquals(ExitCode.INVALID_INPUT, run("labs", "import", report.toString(), "-o", out.toString()));
        assertFalse(Files.exists(out));
        assertTrue(err.toString().contains("line 1: sodium: 14 mmol/L is not plausible for sodium"), err.toString());
    }

    @Test
    @DisplayName("a broken FHIR bundle, a non-UTF-8 file and a missing file: exit 2, nothing written")
    void brokenInputs_exit2() throws IOException {
        Path out = dir.resolve("case.json");
        Path json = dir.resolve("b.json");
        Files.writeString(json, "{\"resourceType\": \"Bundle\", \"type\": \"collection\", \"entry\": [", StandardCharsets.UTF_8);
        assertEquals(ExitCode.INVALID_INPUT, run("labs", "import", json.toString(), "-o", out.toString()));
        Path latin1 = dir.resolve("l.txt");
        Files.write(latin1, "Harns\u00e4ure 541 umol/L".getBytes(StandardCharsets.ISO_8859_1));
        assertEquals(ExitCode.INVALID_INPUT, run("labs", "import", latin1.toString(), "-o", out.toString()));
        assertEquals(ExitCode.INVALID_INPUT, run("labs", "import", dir.resolve("none.txt").toString(), "-o",
                out.toString()));
        assertFalse(Files.exists(out));
        assertTrue(err.toString().contains("not a readable FHIR R4 Bundle"), err.toString());
        assertTrue(err.toString().contains("not UTF-8"), err.toString());
        assertFalse(err.toString().contains("Exception"), err.toString());
    }

    @Test
    @DisplayName("export fhir writes a bundle that labs import reads back to the same current labs")
    void exportThenImport() throws IOException {
        Path bundle = dir.resolve("out.json");
        Path sample = Path.of("samples", "iga-borderline.json");
        assertEquals(ExitCode.DONE, run("export", "fhir", sample.toString(), "-o", bundle.toString(),
                "--subject", "Patient/demo-2"), err.toString());
        String json = Files.readString(bundle);
        assertTrue(json.contains("\"resourceType\": \"Provenance\""));
        assertFalse(json.contains(read(sample).patient().label()), "the case's label never goes into the bundle");
        Path back = dir.resolve("back.json");
        assertEquals(ExitCode.DONE, run("labs", "import", bundle.toString(), "-o", back.toString()), err.toString());
        assertEquals(read(sample).labs().values().keySet(), read(back).labs().values().keySet());
    }

    @Test
    @DisplayName("export fhir refuses a subject that is not a FHIR reference")
    void exportSubject_checked() {
        assertEquals(ExitCode.INVALID_INPUT, run("export", "fhir", "samples/iga-borderline.json", "-o",
                dir.resolve("o.json").toString(), "--subject", "Mrs Example"));
        assertTrue(err.toString().contains("--subject"), err.toString());
    }
}
