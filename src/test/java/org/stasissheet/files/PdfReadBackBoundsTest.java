package org.stasissheet.files;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.fuzz.TinyPdf;

/**
 * Each bound of the PDF read-back, at its limit (accepted) and one step beyond (refused with a one-line reason).
 * The PDFs are built by hand with {@link TinyPdf} after the file structure of ISO 32000-1:2008, section 7.5.
 */
class PdfReadBackBoundsTest {
    private static final byte[] CASE = "{\"format\": \"stasis-case/1\"}".getBytes(StandardCharsets.UTF_8);

    private static byte[] streamOf(byte[] data) {
        return new TinyPdf().object("<</Type/Catalog>>").stream("/Filter/FlateDecode", TinyPdf.deflate(data)).build();
    }

    private static String refusal(byte[] pdf) {
        return assertThrows(PdfScan.Refused.class, () -> PdfScan.check(pdf)).getMessage();
    }

    @Test
    @DisplayName("inflated size: exactly 16 MiB of stream data passes the scan, one byte more is refused")
    void inflatedSize() {
        byte[] atLimit = new byte[(int) PdfScan.MAX_INFLATED_BYTES];
        assertDoesNotThrow(() -> PdfScan.check(streamOf(atLimit)));
        byte[] beyond = new byte[(int) PdfScan.MAX_INFLATED_BYTES + 1];
        byte[] bomb = streamOf(beyond);
        assertTrue(bomb.length < 40_000, "a small file: " + bomb.length + " bytes");
        assertTrue(refusal(bomb).contains("more than 16 MiB"));
    }

    @Test
    @DisplayName("Flate layers: three nested layers pass, a fourth is refused (a nested bomb is counted in full)")
    void layers() {
        byte[] data = "q 1 0 0 1 0 0 cm Q".getBytes(StandardCharsets.US_ASCII);
        byte[] three = TinyPdf.deflate(TinyPdf.deflate(data));
        assertDoesNotThrow(() -> PdfScan.check(streamOf(three)));
        byte[] four = TinyPdf.deflate(three);
        assertTrue(refusal(streamOf(four)).contains("more than 3 times"));
    }

    @Test
    @DisplayName("nesting: 32 arrays deep pass, 33 are refused")
    void nesting() {
        String ok = "[".repeat(PdfScan.MAX_NESTING) + "]".repeat(PdfScan.MAX_NESTING);
        assertDoesNotThrow(() -> PdfScan.check(new TinyPdf().object(ok).build()));
        String deep = "[".repeat(PdfScan.MAX_NESTING + 1) + "]".repeat(PdfScan.MAX_NESTING + 1);
        assertTrue(refusal(new TinyPdf().object(deep).build()).contains("nested more than 32"));
    }

    @Test
    @DisplayName("counts the reader allocates for: /Size 100000 passes, 100001 is refused; so is a huge object number")
    void counts() {
        assertDoesNotThrow(() -> PdfScan.check(new TinyPdf().object("<</Size 100000>>").build()));
        assertTrue(refusal(new TinyPdf().object("<</Size 100001>>").build()).contains("/Size 100001"));
        assertTrue(refusal(new TinyPdf().object("<</N 2147483647>>").build()).contains("/N"));
        byte[] bigNumber = "%PDF-1.4\n2000000000 0 obj\n<<>>\nendobj\n".getBytes(StandardCharsets.ISO_8859_1);
        assertTrue(refusal(bigNumber).contains("object number 2000000000"));
        byte[] bigSection = ("%PDF-1.4\nxref\n0 2000000000\n0000000000 65535 f \ntrailer\n<<>>\n")
                .getBytes(StandardCharsets.ISO_8859_1);
        assertTrue(refusal(bigSection).contains("cross-reference section"));
    }

    @Test
    @DisplayName("an object header hidden in string or stream data still counts: a reader rebuilding a broken file "
            + "would find it (found by the PDF mutation run: 999999999 0 obj after a bomb spliced into a stream)")
    void boundsHoldInsideData() {
        byte[] inString = new TinyPdf().object("<</T(\n999999999 0 obj\n)>>").build();
        assertTrue(refusal(inString).contains("object number 999999999"));
        byte[] inStream = new TinyPdf().object("<<>>")
                .stream("", "\nxref\n0 99999999\n".getBytes(StandardCharsets.ISO_8859_1)).build();
        assertTrue(refusal(inStream).contains("cross-reference section"));
    }

    @Test
    @DisplayName("predictor parameters: /Columns 10000 passes, 10001 is refused")
    void predictor() {
        assertDoesNotThrow(() -> PdfScan.check(new TinyPdf().object("<</DecodeParms<</Columns 10000>>>>").build()));
        assertTrue(refusal(new TinyPdf().object("<</DecodeParms<</Columns 10001>>>>").build()).contains("/Columns"));
    }

    @Test
    @DisplayName("filters a worksheet never uses, and encryption, are refused before parsing")
    void filters() {
        assertTrue(refusal(new TinyPdf().object("<</Filter/LZWDecode>>").build()).contains("/LZWDecode"));
        assertTrue(refusal(new TinyPdf().object("<</Filter/RunLengthDecode>>").build()).contains("/RunLengthDecode"));
        assertTrue(refusal(new TinyPdf().object("<<>>").trailer("/Encrypt<</Filter/Standard>>").build())
                .contains("/Encrypt"));
    }

    @Test
    @DisplayName("the embedded case: a hand-made PDF with a matching digest reads back byte for byte")
    void readsBackWithDigest() throws IOException {
        byte[] pdf = TinyPdf.withAttachment(WorksheetPdfs.ATTACHMENT_NAME, CASE,
                "/" + WorksheetPdfs.CASE_DIGEST_KEY + "(" + WorksheetPdfs.sha256(CASE) + ")");
        WorksheetPdfs.ReadBack back = WorksheetPdfs.read(pdf);
        assertArrayEquals(CASE, back.caseJson());
        assertEquals(0, back.warnings().size(), back.warnings().toString());
    }

    @Test
    @DisplayName("the embedded case: 1 MiB reads back, one byte more is refused (inflated with a bounded buffer)")
    void embeddedCaseSize() throws IOException {
        byte[] atLimit = new byte[org.stasissheet.intake.CaseReader.MAX_BYTES];
        Arrays.fill(atLimit, (byte) ' ');
        byte[] ok = TinyPdf.withAttachment(WorksheetPdfs.ATTACHMENT_NAME, atLimit,
                "/" + WorksheetPdfs.CASE_DIGEST_KEY + "(" + WorksheetPdfs.sha256(atLimit) + ")");
        assertEquals(atLimit.length, WorksheetPdfs.read(ok).caseJson().length);
        byte[] beyond = Arrays.copyOf(atLimit, atLimit.length + 1);
        beyond[atLimit.length] = ' ';
        byte[] big = TinyPdf.withAttachment(WorksheetPdfs.ATTACHMENT_NAME, beyond, "");
        IOException e = assertThrows(IOException.class, () -> WorksheetPdfs.read(big));
        assertTrue(e.getMessage().contains("larger than 1048576 bytes"), e.getMessage());
    }

    @Test
    @DisplayName("a name tree of attachments that loops back on itself is refused, not followed for ever")
    void attachmentTreeLoop() {
        byte[] pdf = new TinyPdf()
                .object("<</Type/Catalog/Pages 3 0 R/Names<</EmbeddedFiles 2 0 R>>>>")
                .object("<</Kids[2 0 R]>>")
                .object("<</Type/Pages/Kids[]/Count 0>>")
                .build();
        IOException e = assertThrows(IOException.class, () -> WorksheetPdfs.read(pdf));
        assertTrue(e.getMessage().contains("loops back"), e.getMessage());
    }
}
