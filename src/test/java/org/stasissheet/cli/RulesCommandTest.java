package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.*;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RulesCommandTest {
    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return StasisCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    @DisplayName("rules check on the shipped folder: valid, counts by topic and basis, exit 0")
    void checkShipped() {
        assertEquals(ExitCode.DONE, run("rules", "check", "rules"), err.toString());
        assertTrue(out.toString().contains("valid"));
        assertTrue(out.toString().contains("hyperviscosity: "), out.toString());
        assertTrue(out.toString().contains("from-memory: "), out.toString());
        assertTrue(out.toString().contains("(the shipped set)"), out.toString());
    }

    @Test
    @DisplayName("rules check on a broken copy: exit 2 with file:line:column, no stack trace")
    void checkBroken(@TempDir Path dir) throws Exception {
        for (Path p : Files.list(Path.of("rules")).toList()) {
            Files.copy(p, dir.resolve(p.getFileName()));
        }
        Path f = dir.resolve("artefacts.yaml");
        Files.writeString(f, Files.readString(f).replace("    basis: from-memory\n", ""));
        assertEquals(ExitCode.INVALID_INPUT, run("rules", "check", dir.toString()));
        assertTrue(err.toString().contains("artefacts.yaml:"), err.toString());
        assertTrue(err.toString().contains("missing key \"basis\""), err.toString());
        assertFalse(err.toString().contains("\tat "));
    }

    @Test
    @DisplayName("rules check on an edited but valid copy says LOCAL")
    void checkLocal(@TempDir Path dir) throws Exception {
        for (Path p : Files.list(Path.of("rules")).toList()) {
            Files.copy(p, dir.resolve(p.getFileName()));
        }
        Path f = dir.resolve("manifest.yaml");
        Files.writeString(f, Files.readString(f).replace("version: 1.0.0", "version: 1.0.0-st-alder"));
        assertEquals(ExitCode.DONE, run("rules", "check", dir.toString()), err.toString());
        assertTrue(out.toString().contains("LOCAL"), out.toString());
    }

    @Test
    @DisplayName("rules list --basis from-memory lists only from-memory entries")
    void listByBasis() {
        assertEquals(ExitCode.DONE, run("rules", "list", "--basis", "from-memory"), err.toString());
        assertTrue(out.toString().contains("hyperleukocytosis.CML"), out.toString());
        assertFalse(out.toString().contains("hyperviscosity.likely"), out.toString());
        // the ASFA categories now rest on a secondary transcription, not on memory
        assertFalse(out.toString().contains("apheresis.leukostasis"), out.toString());
    }

    @Test
    @DisplayName("rules list --basis with an unknown word: exit 2")
    void listUnknownBasis() {
        assertEquals(ExitCode.INVALID_INPUT, run("rules", "list", "--basis", "guess"));
        assertTrue(err.toString().contains("from-memory"));
    }

    @Test
    @DisplayName("rules list --basis from-memory --markdown prints README's generated list")
    void markdown() {
        assertEquals(ExitCode.DONE, run("rules", "list", "--basis", "from-memory", "--markdown"), err.toString());
        assertTrue(out.toString().startsWith("Rules:"), out.toString());
        assertTrue(out.toString().contains("`leukostasis.assessFrom`"));
    }
}
