package org.stasissheet.rules;

import java.util.List;
import java.util.Objects;

/** What loading a rule set gave: the whole set, or the reasons it was refused. Never a part of a set. */
public sealed interface LoadResult {
    record Loaded(RuleSet ruleSet) implements LoadResult {
        public Loaded {
            Objects.requireNonNull(ruleSet, "ruleSet");
        }
    }

    record Refused(List<RuleProblem> problems) implements LoadResult {
        public Refused {
            problems = List.copyOf(problems);
            if (problems.isEmpty()) {
                throw new IllegalArgumentException("a refusal needs at least one problem");
            }
        }
    }
}
