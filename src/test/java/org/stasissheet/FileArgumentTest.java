package org.stasissheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A lone file argument goes to the form; commands and options keep going to the command line. */
class FileArgumentTest {
    @Test
    @DisplayName("one argument that looks like a file is a file; commands, options and several arguments are not")
    void tellsFilesFromCommands() {
        assertEquals(Optional.of("CASE.json"), FileArgument.of(new String[] {"CASE.json"}));
        assertEquals(Optional.of("samples/aml-breathless.json"),
                FileArgument.of(new String[] {"samples/aml-breathless.json"}));
        assertEquals(Optional.of("worksheet.PDF"), FileArgument.of(new String[] {"worksheet.PDF"}));
        assertEquals(Optional.empty(), FileArgument.of(new String[] {"rules"}));
        assertEquals(Optional.empty(), FileArgument.of(new String[] {"--version"}));
        assertEquals(Optional.empty(), FileArgument.of(new String[] {"assess", "CASE.json"}));
        assertEquals(Optional.empty(), FileArgument.of(new String[] {}));
    }

    @Test
    @DisplayName("a bare word stays a command even where a folder of that name exists (./rules)")
    void bareWordStaysACommand() {
        assertTrue(Files.isDirectory(Path.of("rules")));
        assertEquals(Optional.empty(), FileArgument.of(new String[] {"rules"}));
    }

    @Test
    @DisplayName("a missing file, a folder or a control character: one clear line naming the argument")
    void problems(@TempDir Path dir) {
        String missing = FileArgument.problem(dir.resolve("nosuch.json").toString()).orElseThrow();
        assertTrue(missing.contains("nosuch.json\": no such file"), missing);
        assertTrue(missing.contains("case file (.json)"), missing);
        String folder = FileArgument.problem(dir.toString()).orElseThrow();
        assertTrue(folder.contains("is a folder"), folder);
        String control = FileArgument.problem("bad\u001b[2Jname.json").orElseThrow();
        assertTrue(control.contains("\\u001b"), "escaped for the terminal: " + control);
        assertEquals(Optional.empty(), FileArgument.problem("samples/aml-breathless.json"));
    }
}
