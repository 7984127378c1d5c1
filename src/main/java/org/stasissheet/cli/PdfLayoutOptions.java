package org.stasissheet.cli;

import org.stasissheet.load.ToolVersion;
import org.stasissheet.report.Paper;
import org.stasissheet.report.PdfOptions;
import picocli.CommandLine.Option;

/** The PDF options shared by {@code pdf} and {@code triage}. */
final class PdfLayoutOptions {
    @Option(names = "--paper", paramLabel = "a4|letter", converter = PdfCommand.PaperConverter.class,
            defaultValue = DEFAULT_PAPER, description = "paper size: a4 (default) or letter")
    Paper paper;

    @Option(names = "--no-identifiers",
            description = "leave the patient label out: of the whole PDF, and of summary.csv in triage "
                    + "(teaching or audit copies)")
    boolean noIdentifiers;

    /** The paper when none is asked for; also what a run without layout options uses ({@link QuickPath}). */
    static final String DEFAULT_PAPER = "a4";

    /** The options of a run that gives none: default paper, identifiers included. */
    static PdfOptions defaults() {
        return new PdfOptions(Paper.parse(DEFAULT_PAPER), true, ToolVersion.get());
    }

    PdfOptions options() {
        return new PdfOptions(paper, !noIdentifiers, ToolVersion.get());
    }

    boolean includeIdentifiers() {
        return !noIdentifiers;
    }
}
