package org.stasissheet.labs;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.LoincCode;

/** README's alias table and LOINC list say what the code does: a name or code added in one place only fails here. */
class LabsReadmeTest {

    @Test
    @DisplayName("every LOINC code of the catalogue is in README's list, with its name")
    void loincList_current() throws Exception {
        String readme = Files.readString(Path.of("README.md"), StandardCharsets.UTF_8);
        List<String> missing = new ArrayList<>();
        for (Analyte a : Analyte.values()) {
            for (LoincCode c : a.loincCodes()) {
                String row = "| `" + a.key() + "` | " + c.code() + " | " + c.name() + " |";
                if (!readme.contains(row)) {
                    missing.add(row);
                }
            }
        }
        assertTrue(missing.isEmpty(), "README lacks: " + missing);
    }

    @Test
    @DisplayName("every name of the alias table is in README's table, on its key's row")
    void aliasTable_current() throws Exception {
        List<String> lines = Files.readAllLines(Path.of("README.md"), StandardCharsets.UTF_8);
        List<String> missing = new ArrayList<>();
        Labels.table().forEach((analyte, names) -> {
            String row = lines.stream().filter(l -> l.startsWith("| `" + analyte.key() + "` | `")).findFirst()
                    .orElse("");
            names.stream().filter(n -> !row.contains("`" + n + "`")).forEach(n -> missing.add(analyte.key() + ": " + n));
        });
        assertTrue(missing.isEmpty(), "README lacks: " + missing);
    }
}
