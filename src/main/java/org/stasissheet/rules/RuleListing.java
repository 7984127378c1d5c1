package org.stasissheet.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/** Listings of a rule set for people: counts, the rule table, and README's generated list of from-memory items. */
public final class RuleListing {
    private static final String NL = "\n";

    private RuleListing() {
    }

    /** Rules counted by topic, in name order. */
    public static Map<String, Integer> rulesByTopic(RuleSet set) {
        Map<String, Integer> counts = new TreeMap<>();
        set.rules().forEach(r -> counts.merge(r.topic(), 1, Integer::sum));
        return counts;
    }

    /** Rules and parameters counted by basis, in the order of {@link Basis}; each entry is {rules, parameters}. */
    public static Map<Basis, int[]> byBasis(RuleSet set) {
        Map<Basis, int[]> counts = new TreeMap<>();
        for (Basis b : Basis.values()) {
            counts.put(b, new int[2]);
        }
        set.rules().forEach(r -> counts.get(r.basis())[0]++);
        set.parameters().values().forEach(p -> counts.get(p.basis())[1]++);
        return counts;
    }

    /** One line per rule: id, level, title, source, basis; optionally only one basis. */
    public static List<String> ruleLines(RuleSet set, Optional<Basis> only) {
        List<String> lines = new ArrayList<>();
        for (Rule r : set.rules()) {
            if (only.isEmpty() || only.get() == r.basis()) {
                lines.add(r.id() + "  " + r.level().badge() + "  " + r.title() + "  | source: " + r.source()
                        + "  | basis: " + r.basis().code());
            }
        }
        return lines;
    }

    /** One line per parameter with the given basis (all when empty). */
    public static List<String> parameterLines(RuleSet set, Optional<Basis> only) {
        List<String> lines = new ArrayList<>();
        for (Parameter p : set.parameters().values()) {
            if (only.isEmpty() || only.get() == p.basis()) {
                lines.add(p.id() + " = " + p.value() + "  " + p.what() + "  | source: " + p.source()
                        + "  | basis: " + p.basis().code());
            }
        }
        return lines;
    }

    /**
     * The markdown list for README's limits section: every rule and parameter of the set whose basis is
     * {@code from-memory}, and the built-in from-memory parts of the leukostasis grading. README keeps it between
     * {@code <!-- from-memory:start -->} and {@code <!-- from-memory:end -->}; regenerate it with
     * {@code stasis-sheet rules list --basis from-memory --markdown}.
     */
    public static String fromMemoryMarkdown(RuleSet set) {
        StringBuilder sb = new StringBuilder();
        sb.append("Rules:").append(NL).append(NL);
        for (Rule r : set.rules()) {
            if (r.basis() == Basis.FROM_MEMORY) {
                sb.append("- `").append(r.id()).append("`: ").append(oneLine(r.title()))
                        .append(" (source: ").append(oneLine(r.source())).append(")").append(NL);
            }
        }
        sb.append(NL).append("Parameters:").append(NL).append(NL);
        for (Parameter p : set.parameters().values()) {
            if (p.basis() == Basis.FROM_MEMORY) {
                sb.append("- `").append(p.id()).append("` = ").append(p.value()).append(": ")
                        .append(oneLine(p.what())).append(" (source: ").append(oneLine(p.source())).append(")")
                        .append(NL);
            }
        }
        sb.append(NL).append("Built into the leukostasis grading:").append(NL).append(NL);
        sb.append("- the short descriptor of each organ grade (ours, not checked against Novotny 2005)").append(NL);
        sb.append("- the combination rule: ").append(LeukostasisVerdict.COMBINATION_RULE).append(NL);
        return sb.toString();
    }

    private static String oneLine(String s) {
        return s.replace('\n', ' ').strip();
    }
}
