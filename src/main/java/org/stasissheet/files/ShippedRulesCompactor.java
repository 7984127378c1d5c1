package org.stasissheet.files;

import java.io.IOException;
import java.nio.file.Path;
import org.stasissheet.rules.RuleSetLoader;

/**
 * Build step (the pom runs it after compiling): validates the top-level {@code rules/} folder and writes its compact
 * form beside the shipped YAML copy in the classes folder, where {@link RuleSources#shipped()} reads it. A rule set
 * that does not load whole fails the build here, naming every problem, instead of failing each run.
 *
 * <pre>java org.stasissheet.files.ShippedRulesCompactor RULE_FOLDER OUTPUT_FILE</pre>
 */
public final class ShippedRulesCompactor {
    private ShippedRulesCompactor() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 2) {
            throw new IllegalArgumentException("usage: ShippedRulesCompactor RULE_FOLDER OUTPUT_FILE");
        }
        RuleSources.FolderFiles read = RuleSources.readFolder(Path.of(args[0]));
        if (!read.problems().isEmpty()) {
            throw new IllegalArgumentException("the shipped rule folder " + args[0] + " cannot be read: "
                    + read.problems());
        }
        AtomicFiles.write(Path.of(args[1]), RuleSetLoader.compact(read.files()));
    }
}
