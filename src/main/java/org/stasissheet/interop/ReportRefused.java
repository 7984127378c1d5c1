package org.stasissheet.interop;

import java.util.List;

/** A lab report that cannot be read at all, with every located problem (the command line exits 2). */
public final class ReportRefused extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final List<String> problems;

    public ReportRefused(List<String> problems) {
        super(String.join("; ", problems));
        this.problems = List.copyOf(problems);
    }

    public ReportRefused(String problem) {
        this(List.of(problem));
    }

    public List<String> problems() {
        return problems;
    }
}
