package org.stasissheet.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.files.WorksheetPdfs;
import org.stasissheet.intake.Case;
import org.stasissheet.rules.RuleSet;

/**
 * Where the commands get their case and rule set from: the one place that turns files into core objects or
 * into an {@link InvalidInputException} naming every problem.
 */
final class Inputs {
    private Inputs() {
    }

    /**
     * A case with the JSON it was read from: the bytes go into the PDF as the record, so they must be the case
     * file itself (or, for a worksheet PDF, the case file embedded in it).
     */
    record LoadedCase(byte[] json, Case value) {
        LoadedCase {
            Objects.requireNonNull(json, "json");
            Objects.requireNonNull(value, "value");
            json = json.clone();
        }

        @Override
        public byte[] json() {
            return json.clone();
        }
    }

    static Case readCase(Path file) {
        return loadCase(file).value();
    }

    static LoadedCase loadCase(Path file) {
        byte[] json = caseBytes(file);
        return new LoadedCase(json, parseCase(file, json));
    }

    /** The case JSON: the file's bytes, or the case embedded in a worksheet PDF (by extension or by %PDF). */
    static byte[] caseBytes(Path file) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new InvalidInputException(file + ": no such file");
        } catch (IOException e) {
            throw new InvalidInputException(file + ": cannot be read (" + e.getClass().getSimpleName() + ")");
        }
        if (!WorksheetPdfs.looksLikePdf(file, bytes)) {
            return bytes;
        }
        try {
            return WorksheetPdfs.extractCase(bytes);
        } catch (IOException e) {
            throw new InvalidInputException(file + ": " + e.getMessage());
        }
    }

    static Case parseCase(Path file, byte[] json) {
        throw new InvalidInputException("reading case files lands with the intake work: " + file);
    }

    static RuleSet ruleSet(Optional<Path> dir) {
        throw new InvalidInputException("loading rule sets lands with the rules work");
    }
}
