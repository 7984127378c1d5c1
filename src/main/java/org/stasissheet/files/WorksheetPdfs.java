package org.stasissheet.files;

import com.lowagie.text.pdf.PRStream;
import com.lowagie.text.pdf.PdfArray;
import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfObject;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.PdfString;
import com.lowagie.text.pdf.RandomAccessFileOrArray;
import java.io.IOException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Duration;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.atomic.AtomicReference;
import java.util.zip.DataFormatException;
import java.util.zip.Inflater;
import org.stasissheet.intake.CaseReader;

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

    /** Largest worksheet PDF read back, in bytes (a worksheet is well under 1 MiB; 32 MiB leaves room). */
    public static final int MAX_PDF_BYTES = 32 << 20;
    /** Longest a read-back may take before it is given up as a malformed PDF (a reference loop, say). */
    public static final Duration MAX_READ_TIME = Duration.ofSeconds(20);
    /** Deepest name tree of attachments followed, and most attachments looked at. */
    static final int MAX_TREE_DEPTH = 8;
    static final int MAX_ATTACHMENTS = 64;
    /** Stack of the thread that parses: ample for the nesting {@link PdfScan} lets through, small to overflow. */
    private static final long PARSER_STACK_BYTES = 4L << 20;

    /** The document-information key under which the worksheet writer records the embedded case's SHA-256. */
    public static final String CASE_DIGEST_KEY = "StasisCaseSHA256";

    /**
     * The case read back from a worksheet PDF.
     *
     * @param warnings what the reader of the case should know, e.g. that the PDF carries no digest to check it by
     */
    public record ReadBack(byte[] caseJson, List<String> warnings) {
        public ReadBack {
            caseJson = caseJson.clone();
            warnings = List.copyOf(warnings);
        }

        @Override
        public byte[] caseJson() {
            return caseJson.clone();
        }
    }

    /** The embedded case file's bytes; see {@link #read(byte[])}. Warnings are dropped: prefer {@code read}. */
    public static byte[] extractCase(byte[] pdf) throws IOException {
        return read(pdf).caseJson();
    }

    /**
     * The embedded case, checked against the SHA-256 recorded in the document information when the worksheet
     * was written. Bounded: the bytes are first checked by {@link PdfScan}, then parsed on a thread of its own
     * with a fixed stack and at most {@link #MAX_READ_TIME}.
     *
     * @throws IOException with a one-line reason for any PDF that is malformed, not a worksheet, carries more
     *                     than one embedded case, or whose case does not match its recorded digest
     */
    public static ReadBack read(byte[] pdf) throws IOException {
        if (pdf.length > MAX_PDF_BYTES) {
            throw new IOException("it is larger than " + MAX_PDF_BYTES + " bytes (32 MiB), the most a worksheet PDF"
                    + " may be");
        }
        try {
            PdfScan.check(pdf);
        } catch (PdfScan.Refused e) {
            throw new IOException("not a readable worksheet PDF: " + e.getMessage());
        }
        AtomicReference<Object> outcome = new AtomicReference<>();
        Thread parser = new Thread(null, () -> outcome.set(parse(pdf)), "worksheet-pdf-read", PARSER_STACK_BYTES);
        parser.setDaemon(true);
        parser.start();
        try {
            parser.join(MAX_READ_TIME.toMillis());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("reading the PDF was interrupted");
        }
        Object result = outcome.get();
        if (result == null) {
            throw new IOException("not a readable worksheet PDF: reading it took longer than "
                    + MAX_READ_TIME.toSeconds() + " s (its structure may loop)");
        }
        if (result instanceof IOException e) {
            throw e;
        }
        return (ReadBack) result;
    }

    /** Runs on the parser thread: a ReadBack or the IOException to throw, never anything else. */
    private static Object parse(byte[] pdf) {
        try {
            PdfReader reader = new PdfReader(new RandomAccessFileOrArray(pdf), null);
            try {
                return readCase(reader);
            } finally {
                reader.close();
            }
        } catch (IOException e) {
            return new IOException("not a readable worksheet PDF (" + oneLine(e) + ")", e);
        } catch (StackOverflowError e) {
            return new IOException("not a readable worksheet PDF: its structure is nested too deeply");
        } catch (OutOfMemoryError e) {
            return new IOException("not a readable worksheet PDF: it ran out of memory while reading");
        } catch (NullPointerException | ClassCastException | IndexOutOfBoundsException e) {
            // the library met a missing or wrong-typed object where the format requires one
            return new IOException("not a readable worksheet PDF: its structure is damaged or incomplete");
        } catch (RuntimeException | LinkageError e) {
            // the library's own exceptions, and classes it would need for features worksheets never use
            return new IOException("not a readable worksheet PDF (" + oneLine(e) + ")", e);
        }
    }

    private static ReadBack readCase(PdfReader reader) throws IOException {
        if (reader.isEncrypted()) {
            throw new IOException("it is encrypted; worksheets are never encrypted");
        }
        List<PRStream> cases = attachments(reader);
        if (cases.isEmpty()) {
            throw new IOException("this PDF carries no embedded case file (" + ATTACHMENT_NAME
                    + "); only worksheets written by Stasis Sheet can be read back");
        }
        if (cases.size() > 1) {
            throw new IOException("this PDF carries " + cases.size() + " embedded case files named "
                    + ATTACHMENT_NAME + "; a worksheet carries exactly one, so none of them is trusted");
        }
        byte[] json = decoded(cases.get(0));
        String actual = sha256(json);
        Optional<String> recorded = recordedDigest(reader);
        if (recorded.isEmpty()) {
            return new ReadBack(json, List.of("this worksheet PDF records no SHA-256 of its embedded case (made by an"
                    + " older version, or altered): check the values against the printed worksheet"));
        }
        if (!recorded.get().equalsIgnoreCase(actual)) {
            throw new IOException("the embedded case does not match the SHA-256 recorded when the worksheet was"
                    + " written: it was changed afterwards, so it is not used; assess the original case file");
        }
        return new ReadBack(json, List.of());
    }

    private static Optional<String> recordedDigest(PdfReader reader) {
        PdfDictionary info = reader.getTrailer().getAsDict(PdfName.INFO);
        if (info == null) {
            return Optional.empty();
        }
        PdfObject value = PdfReader.getPdfObject(info.get(new PdfName(CASE_DIGEST_KEY)));
        return value instanceof PdfString s ? Optional.of(s.toUnicodeString().trim()) : Optional.empty();
    }

    /** Every embedded file named {@value #ATTACHMENT_NAME}, walking the name tree with bounded depth and count. */
    private static List<PRStream> attachments(PdfReader reader) throws IOException {
        List<PRStream> found = new ArrayList<>();
        PdfDictionary catalog = reader.getCatalog();
        PdfDictionary names = catalog == null ? null : catalog.getAsDict(PdfName.NAMES);
        PdfDictionary tree = names == null ? null : names.getAsDict(PdfName.EMBEDDEDFILES);
        if (tree == null) {
            return found;
        }
        Deque<PdfDictionary> nodes = new ArrayDeque<>();
        Deque<Integer> depths = new ArrayDeque<>();
        Set<PdfDictionary> seen = java.util.Collections.newSetFromMap(new java.util.IdentityHashMap<>());
        nodes.push(tree);
        depths.push(0);
        int looked = 0;
        while (!nodes.isEmpty()) {
            PdfDictionary node = nodes.pop();
            int depth = depths.pop();
            if (!seen.add(node)) {
                throw new IOException("its list of attachments loops back on itself");
            }
            if (depth > MAX_TREE_DEPTH) {
                throw new IOException("its list of attachments is nested more than " + MAX_TREE_DEPTH + " deep");
            }
            PdfArray kids = node.getAsArray(PdfName.KIDS);
            if (kids != null) {
                for (int i = 0; i < kids.size(); i++) {
                    if (PdfReader.getPdfObject(kids.getPdfObject(i)) instanceof PdfDictionary kid) {
                        nodes.push(kid);
                        depths.push(depth + 1);
                    }
                }
            }
            PdfArray pairs = node.getAsArray(PdfName.NAMES);
            if (pairs == null) {
                continue;
            }
            for (int i = 1; i < pairs.size(); i += 2) {
                if (++looked > MAX_ATTACHMENTS) {
                    throw new IOException("it has more than " + MAX_ATTACHMENTS + " attachments");
                }
                if (!(PdfReader.getPdfObject(pairs.getPdfObject(i)) instanceof PdfDictionary spec)
                        || !ATTACHMENT_NAME.equals(fileName(spec))) {
                    continue;
                }
                PdfDictionary ef = spec.getAsDict(PdfName.EF);
                PdfObject stream = ef == null ? null : PdfReader.getPdfObject(ef.get(PdfName.F));
                if (stream instanceof PRStream prs) {
                    found.add(prs);
                }
            }
        }
        return found;
    }

    /**
     * The attachment's bytes: stored plain or with one Flate filter (as the worksheet writer stores it), inflated
     * to at most the size of a case file. Anything else is refused rather than handed to a general decoder.
     */
    private static byte[] decoded(PRStream stream) throws IOException {
        byte[] raw = PdfReader.getStreamBytesRaw(stream);
        PdfObject filter = PdfReader.getPdfObject(stream.get(PdfName.FILTER));
        if (filter instanceof PdfArray a && a.size() == 1) {
            filter = PdfReader.getPdfObject(a.getPdfObject(0));
        }
        if (filter == null) {
            return bounded(raw, raw.length);
        }
        if (!PdfName.FLATEDECODE.equals(filter) || stream.get(PdfName.DECODEPARMS) != null) {
            throw new IOException("its embedded case is stored in a way worksheets never use");
        }
        Inflater inflater = new Inflater();
        try {
            inflater.setInput(raw);
            byte[] out = new byte[CaseReader.MAX_BYTES + 1];
            int n = 0;
            while (!inflater.finished() && n < out.length) {
                int got = inflater.inflate(out, n, out.length - n);
                if (got == 0 && (inflater.needsInput() || inflater.needsDictionary())) {
                    throw new IOException("its embedded case is cut short");
                }
                n += got;
            }
            return bounded(out, n);
        } catch (DataFormatException e) {
            throw new IOException("its embedded case is damaged (" + oneLine(e) + ")");
        } finally {
            inflater.end();
        }
    }

    private static byte[] bounded(byte[] bytes, int length) throws IOException {
        if (length > CaseReader.MAX_BYTES) {
            throw new IOException("its embedded case is larger than " + CaseReader.MAX_BYTES + " bytes (1 MiB), the"
                    + " most a case file may be");
        }
        return java.util.Arrays.copyOf(bytes, length);
    }

    /** Lower-case hex SHA-256 of the bytes: what the worksheet writer records and read-back compares. */
    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
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

    private static String oneLine(Throwable e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return m.lines().findFirst().orElse(m);
    }

}
