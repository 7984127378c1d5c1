package org.stasissheet.report;

import java.util.Objects;

/**
 * How a worksheet PDF is laid out and what it may contain.
 *
 * @param includeIdentifiers false for teaching or audit copies: the patient label is left out of every page and
 *                           of the embedded case file
 * @param toolVersion        the tool's version, printed in the provenance block
 */
public record PdfOptions(Paper paper, boolean includeIdentifiers, String toolVersion) {
    public PdfOptions {
        Objects.requireNonNull(paper, "paper");
        Objects.requireNonNull(toolVersion, "toolVersion");
    }

    public static PdfOptions defaults(String toolVersion) {
        return new PdfOptions(Paper.A4, true, toolVersion);
    }
}
