package org.stasissheet.rules;

import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * A rule's declarative condition over {@link Facts}. A test on a field the case does not have is false (so
 * {@code not} of it is true): write {@code present}/{@code absent} where missing data matters.
 */
public sealed interface Condition {
    boolean holds(Facts facts);

    /** A one-line rendering for listings, in the rule-file vocabulary. */
    String describe();

    record All(List<Condition> parts) implements Condition {
        public All {
            parts = List.copyOf(parts);
        }

        @Override
        public boolean holds(Facts facts) {
            return parts.stream().allMatch(c -> c.holds(facts));
        }

        @Override
        public String describe() {
            return "all(" + parts.stream().map(Condition::describe).collect(Collectors.joining("; ")) + ")";
        }
    }

    record Any(List<Condition> parts) implements Condition {
        public Any {
            parts = List.copyOf(parts);
        }

        @Override
        public boolean holds(Facts facts) {
            return parts.stream().anyMatch(c -> c.holds(facts));
        }

        @Override
        public String describe() {
            return "any(" + parts.stream().map(Condition::describe).collect(Collectors.joining("; ")) + ")";
        }
    }

    record Not(Condition part) implements Condition {
        public Not {
            Objects.requireNonNull(part, "part");
        }

        @Override
        public boolean holds(Facts facts) {
            return !part.holds(facts);
        }

        @Override
        public String describe() {
            return "not(" + part.describe() + ")";
        }
    }

    record Present(String field) implements Condition {
        public Present {
            Objects.requireNonNull(field, "field");
        }

        @Override
        public boolean holds(Facts facts) {
            return facts.get(field).isPresent();
        }

        @Override
        public String describe() {
            return field + " present";
        }
    }

    record Absent(String field) implements Condition {
        public Absent {
            Objects.requireNonNull(field, "field");
        }

        @Override
        public boolean holds(Facts facts) {
            return facts.get(field).isEmpty();
        }

        @Override
        public String describe() {
            return field + " absent";
        }
    }

    /** A lab value or plain number against a threshold. */
    record Compare(String field, Threshold.Comparison op, Threshold threshold) implements Condition {
        public Compare {
            Objects.requireNonNull(field, "field");
            Objects.requireNonNull(op, "op");
            Objects.requireNonNull(threshold, "threshold");
        }

        @Override
        public boolean holds(Facts facts) {
            return facts.get(field).map(f -> {
                if (f instanceof Fact.Amount a) {
                    return threshold.test(a.measurement(), op);
                }
                if (f instanceof Fact.Number n && Fields.kind(field).orElseThrow() instanceof Fields.Number k) {
                    return threshold.test(n.value(), k.dimension(), k.unit(), op);
                }
                return false;
            }).orElse(false);
        }

        @Override
        public String describe() {
            return field + " " + op.symbol() + " " + threshold.describe();
        }
    }

    /** A word field (or a true/false field) equal to one of the words. */
    record Is(String field, Set<String> words) implements Condition {
        public Is {
            Objects.requireNonNull(field, "field");
            words = Set.copyOf(words);
        }

        @Override
        public boolean holds(Facts facts) {
            return facts.get(field).map(f -> {
                if (f instanceof Fact.Word w) {
                    return words.contains(w.value());
                }
                return f instanceof Fact.Bool b && words.contains(Boolean.toString(b.value()));
            }).orElse(false);
        }

        @Override
        public String describe() {
            return field + " is " + String.join("|", words.stream().sorted().toList());
        }
    }
}
