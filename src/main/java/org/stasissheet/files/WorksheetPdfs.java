package org.stasissheet.files;

import com.lowagie.text.pdf.PRStream;
import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfNameTree;
import com.lowagie.text.pdf.PdfObject;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.PdfString;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;

/**
 * Reads the case file back out of a worksheet PDF: the PDF embeds the case as the attachment
 * {@value #ATTACHMENT_NAME}, so a printed-and-filed worksheet can be assessed again.
 */
public final class WorksheetPdfs {
    /** Must equal {@code report.WorksheetPdf.ATTACHMENT_NAME}; a test holds the two together. */
    public static final String ATTACHMENT_NAME = "stasis-case.json";

    private WorksheetPdfs() {
    }

    /** True when the path names a PDF by its extension or its first bytes ({@code %PDF}). */
    public static boolean looksLikePdf(Path file, byte[] firstBytes) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString();
        return name.toLowerCase(java.util.Locale.ROOT).endsWith(".pdf") || startsWithPdfMagic(firstBytes);
    }

    public static boolean startsWithPdfMagic(byte[] bytes) {
        return bytes.length >= 4 && bytes[0] == '%' && bytes[1] == 'P' && bytes[2] == 'D' && bytes[3] == 'F';
    }

    /**
     * The embedded case file's bytes.
     *
     * @throws IOException with a one-line message when the file cannot be read, is not a PDF, or carries no case
     */
    public static byte[] extractCase(Path file) throws IOException {
        return extractCase(Files.readAllBytes(file));
    }

    public static byte[] extractCase(byte[] pdf) throws IOException {
        PdfReader reader;
        try {
            reader = new PdfReader(pdf);
        } catch (IOException | RuntimeException e) {
            throw new IOException("not a readable PDF (" + oneLine(e) + ")", e);
        }
        try {
            return findAttachment(reader).orElseThrow(() -> new IOException(
                    "this PDF carries no embedded case file (" + ATTACHMENT_NAME
                            + "); only worksheets written by Stasis Sheet can be read back"));
        } finally {
            reader.close();
        }
    }

    private static Optional<byte[]> findAttachment(PdfReader reader) throws IOException {
        PdfDictionary names = reader.getCatalog().getAsDict(PdfName.NAMES);
        if (names == null) {
            return Optional.empty();
        }
        PdfDictionary embedded = names.getAsDict(PdfName.EMBEDDEDFILES);
        if (embedded == null) {
            return Optional.empty();
        }
        Map<String, PdfObject> tree = PdfNameTree.readTree(embedded);
        for (PdfObject value : tree.values()) {
            PdfObject resolved = PdfReader.getPdfObject(value);
            if (!(resolved instanceof PdfDictionary spec)) {
                continue;
            }
            if (!ATTACHMENT_NAME.equals(fileName(spec))) {
                continue;
            }
            PdfDictionary ef = spec.getAsDict(PdfName.EF);
            if (ef == null) {
                continue;
            }
            PdfObject stream = PdfReader.getPdfObject(ef.get(PdfName.F));
            if (stream instanceof PRStream prs) {
                return Optional.of(PdfReader.getStreamBytes(prs));
            }
        }
        return Optional.empty();
    }

    private static String fileName(PdfDictionary spec) {
        for (PdfName key : new PdfName[] {PdfName.UF, PdfName.F}) {
            PdfObject o = PdfReader.getPdfObject(spec.get(key));
            if (o instanceof PdfString s) {
                return s.toUnicodeString();
            }
        }
        return "";
    }

    private static String oneLine(Exception e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return m.lines().findFirst().orElse(m);
    }

}
