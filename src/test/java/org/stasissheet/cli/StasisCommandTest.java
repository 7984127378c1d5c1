package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class StasisCommandTest {
    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return StasisCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    @DisplayName("an unknown option is invalid input: exit 2, a usage hint, no stack trace")
    void unknownOption_exitsTwo() {
        assertEquals(ExitCode.INVALID_INPUT, run("assess", "--no-such-option", "x.json"));
        assertTrue(err.toString().contains("--no-such-option"), err.toString());
        assertFalse(err.toString().contains("\tat "), "no stack trace: " + err);
    }

    @Test
    @DisplayName("help is in our own words under one program name; --version names the shipped rule set and its hash")
    void ownWordsAndVersion() {
        java.io.StringWriter out = new java.io.StringWriter();
        for (String[] args : new String[][] {{"--help"}, {"assess", "--help"}, {"rules", "check", "--help"}}) {
            out.getBuffer().setLength(0);
            assertEquals(0, StasisCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true)));
            String help = out.toString();
            assertTrue(help.startsWith("Run as: stasis-sheet"), help);
            assertFalse(help.contains("Show this help message and exit"), help);
            assertFalse(help.contains("Usage:"), help);
            assertFalse(help.contains("[-hV]"), help);
        }
        out.getBuffer().setLength(0);
        assertEquals(0, StasisCommand.run(new String[] {"--version"}, new PrintWriter(out, true),
                new PrintWriter(err, true)));
        org.stasissheet.rules.RuleSet shipped = ((org.stasissheet.rules.LoadResult.Loaded)
                org.stasissheet.files.RuleSources.shipped()).ruleSet();
        assertTrue(out.toString().startsWith("stasis-sheet "), out.toString());
        assertTrue(out.toString().contains(shipped.provenance().name() + " " + shipped.provenance().version()
                + ", SHA-256 " + shipped.provenance().sha256()), out.toString());
    }

    @Test
    @DisplayName("an internal error prints one short line and exits 1")
    void internalError_isOneLine() {
        int code = StasisCommand.report(new IllegalStateException("boom"), new PrintWriter(err, true));
        assertEquals(ExitCode.INTERNAL_ERROR, code);
        assertTrue(err.toString().startsWith("stasis-sheet: internal error (IllegalStateException): boom"),
                err.toString());
        assertFalse(err.toString().contains("\tat "));
    }

    @Test
    @DisplayName("an implausible case is invalid input: every problem listed with its path, exit 2")
    void implausibleCase_listsEveryProblem(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws java.io.IOException {
        java.nio.file.Path file = dir.resolve("bad.json");
        java.nio.file.Files.writeString(file, "{\"format\":\"stasis-case/1\",\"labs\":{"
                + "\"wbc\":{\"value\":150000,\"unit\":\"10*9/L\"},\"igmm\":{\"value\":1,\"unit\":\"g/L\"}}}");
        assertEquals(ExitCode.INVALID_INPUT, run("assess", file.toString()));
        String e = err.toString();
        assertTrue(e.contains("labs.wbc: 150000 10*9/L is not plausible; did you mean /uL (= 150 10*9/L)?"), e);
        assertTrue(e.contains("labs.igmm: unknown key"), e);
        assertFalse(e.contains("\tat "), "no stack trace: " + e);
        assertEquals("", out.toString(), "nothing printed as a worksheet");
    }

    @Test
    @DisplayName("help names the standing caution")
    void help_carriesTheCaution() {
        assertEquals(ExitCode.DONE, run("--help"));
        assertTrue(out.toString().contains("never replaces"), out.toString());
    }
}
