package org.stasissheet.cli;

import org.stasissheet.load.InvalidInputException;
import org.stasissheet.load.Inputs;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.stasissheet.intake.Enums;
import org.stasissheet.rules.Basis;
import org.stasissheet.rules.RuleListing;
import org.stasissheet.rules.RuleSet;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code rules check DIR} and {@code rules list [--basis B] [--markdown]}: look at a rule set without a case. */
@Command(name = "rules",
        description = "Validate or list a rule set.",
        subcommands = {RulesCommand.Check.class, RulesCommand.ListRules.class})
final class RulesCommand extends CommandGroup {

    @Command(name = "check",
            description = "Validate the rule set in DIR; print counts by topic and basis (exit 2 if refused).")
    static final class Check implements Callable<Integer> {
        @Parameters(paramLabel = "DIR", description = "the rule folder (with manifest.yaml)")
        Path dir;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            RuleSet set = Inputs.ruleSet(Optional.of(dir));
            PrintWriter out = spec.commandLine().getOut();
            out.println("Rule set " + set.provenance().name() + " " + set.provenance().version() + ": valid");
            out.println("  sha256 " + set.provenance().sha256()
                    + (set.provenance().local() ? "  (LOCAL: differs from the shipped set)" : "  (the shipped set)"));
            out.println("  " + set.rules().size() + " rules, " + set.parameters().size() + " parameters");
            out.println("Rules by topic:");
            RuleListing.rulesByTopic(set).forEach((topic, n) -> out.println("  " + topic + ": " + n));
            out.println("By basis (rules / parameters):");
            for (Map.Entry<Basis, int[]> e : RuleListing.byBasis(set).entrySet()) {
                out.println("  " + e.getKey().code() + ": " + e.getValue()[0] + " / " + e.getValue()[1]);
            }
            out.flush();
            return ExitCode.DONE;
        }
    }

    @Command(name = "list",
            description = "List the rules (id, level, title, source, basis) and parameters.")
    static final class ListRules implements Callable<Integer> {
        @Option(names = "--basis", paramLabel = "B",
                description = "only entries with this basis: published, published-secondary, common-practice, from-memory")
        String basis;

        @Option(names = "--markdown",
                description = "print README's generated list of from-memory rules and parameters (with --basis from-memory)")
        boolean markdown;

        @Mixin
        RulesOption rules;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            Optional<Basis> only = Optional.empty();
            if (basis != null) {
                only = Enums.parse(Basis.class, basis);
                if (only.isEmpty()) {
                    throw new InvalidInputException("--basis: \"" + basis + "\" is not one of "
                            + Enums.allowed(Basis.class));
                }
            }
            RuleSet set = Inputs.ruleSet(rules.dir());
            PrintWriter out = spec.commandLine().getOut();
            if (markdown) {
                if (only.isPresent() && only.get() != Basis.FROM_MEMORY) {
                    throw new InvalidInputException("--markdown lists the from-memory entries; use --basis from-memory");
                }
                out.print(RuleListing.fromMemoryMarkdown(set));
                out.flush();
                return ExitCode.DONE;
            }
            out.println("Rule set " + set.provenance().name() + " " + set.provenance().version()
                    + (set.provenance().local() ? " (LOCAL PROTOCOL)" : ""));
            out.println("RULES");
            RuleListing.ruleLines(set, only).forEach(l -> out.println("  " + l));
            out.println("PARAMETERS");
            RuleListing.parameterLines(set, only).forEach(l -> out.println("  " + l));
            out.flush();
            return ExitCode.DONE;
        }
    }
}
