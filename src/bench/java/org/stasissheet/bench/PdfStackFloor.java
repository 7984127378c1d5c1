package org.stasissheet.bench;

import com.lowagie.text.Document;
import com.lowagie.text.Font;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfWriter;
import java.io.FileOutputStream;
import java.io.OutputStream;

/**
 * The stack floor of a cold {@code pdf}: what the same JVM, with the same options and class-data archive, needs to
 * write a one-page PDF through OpenPDF with the fonts the worksheet embeds (Liberation Sans regular, bold and
 * italic from openpdf-fonts-extra, Identity-H, embedded) and nothing else: no command line, no case, no rules,
 * no assessment. A cold {@code pdf} cannot be faster than this; {@code src/bench/cold-ratios.sh} sets the one
 * against the other (target: {@code pdf} <= 1.5 x this floor).
 *
 * <p>Usage: {@code PdfStackFloor OUT.pdf}.
 */
public final class PdfStackFloor {
    /** The worksheet's three faces, by the same resource paths as report.PdfFonts. */
    static final String[] FACES = {"liberation/LiberationSans-Regular.ttf", "liberation/LiberationSans-Bold.ttf",
            "liberation/LiberationSans-Italic.ttf"};

    private PdfStackFloor() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length != 1) {
            System.err.println("usage: PdfStackFloor OUT.pdf");
            System.exit(2);
        }
        Document document = new Document(PageSize.A4);
        try (OutputStream out = new FileOutputStream(args[0])) {
            PdfWriter.getInstance(document, out);
            document.open();
            for (String face : FACES) {
                BaseFont font = BaseFont.createFont(face, BaseFont.IDENTITY_H, BaseFont.EMBEDDED);
                document.add(new Paragraph("Stack floor probe: one page, this face embedded. WBC 182 ×10⁹/L, "
                        + "viscosity 4.2 cP, ≥ ≤ µ.", new Font(font, 10)));
            }
            document.close();
        }
    }
}
