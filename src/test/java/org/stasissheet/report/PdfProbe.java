package org.stasissheet.report;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentNameDictionary;
import org.apache.pdfbox.pdmodel.PDEmbeddedFilesNameTreeNode;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.text.PDFTextStripper;

/** Reads a generated PDF with PDFBox, an independent implementation, so the tests do not trust OpenPDF. */
final class PdfProbe implements AutoCloseable {
    private final PDDocument doc;

    PdfProbe(byte[] pdf) throws IOException {
        this.doc = Loader.loadPDF(pdf);
    }

    int pages() {
        return doc.getNumberOfPages();
    }

    /** The text of page n (1-based) in reading order. */
    String page(int n) throws IOException {
        PDFTextStripper s = new PDFTextStripper();
        s.setSortByPosition(true);
        s.setStartPage(n);
        s.setEndPage(n);
        return s.getText(doc);
    }

    String allText() throws IOException {
        PDFTextStripper s = new PDFTextStripper();
        s.setSortByPosition(true);
        return s.getText(doc);
    }

    String title() {
        return doc.getDocumentInformation().getTitle();
    }

    java.time.Instant creationDate() {
        return doc.getDocumentInformation().getCreationDate().toInstant();
    }

    /** Every metadata value of the information dictionary, joined. */
    String allMetadata() {
        StringBuilder sb = new StringBuilder();
        for (COSName key : doc.getDocumentInformation().getCOSObject().keySet()) {
            sb.append(key.getName()).append('=')
                    .append(doc.getDocumentInformation().getCOSObject().getString(key)).append('\n');
        }
        return sb.toString();
    }

    /** The embedded files by name, as PDFBox reads them. */
    Map<String, byte[]> attachments() throws IOException {
        PDDocumentNameDictionary names = doc.getDocumentCatalog().getNames();
        Map<String, byte[]> out = new java.util.LinkedHashMap<>();
        if (names == null || names.getEmbeddedFiles() == null) {
            return out;
        }
        PDEmbeddedFilesNameTreeNode tree = names.getEmbeddedFiles();
        Map<String, PDComplexFileSpecification> files = tree.getNames();
        if (files != null) {
            for (Map.Entry<String, PDComplexFileSpecification> e : files.entrySet()) {
                out.put(e.getValue().getFilename(), e.getValue().getEmbeddedFile().toByteArray());
            }
        }
        return out;
    }

    /** Every font used on any page, with whether it is embedded. */
    List<PDFont> fonts() throws IOException {
        List<PDFont> fonts = new ArrayList<>();
        for (PDPage page : doc.getPages()) {
            for (COSName name : page.getResources().getFontNames()) {
                fonts.add(page.getResources().getFont(name));
            }
        }
        return fonts;
    }

    /** How many raster images the pages use (directly or inside forms). */
    int rasterImages() throws IOException {
        int n = 0;
        for (PDPage page : doc.getPages()) {
            n += rasterImages(page.getResources());
        }
        return n;
    }

    private static int rasterImages(org.apache.pdfbox.pdmodel.PDResources res) throws IOException {
        if (res == null) {
            return 0;
        }
        int n = 0;
        for (COSName name : res.getXObjectNames()) {
            var x = res.getXObject(name);
            if (x instanceof org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject) {
                n++;
            } else if (x instanceof org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject form) {
                n += rasterImages(form.getResources());
            }
        }
        return n;
    }

    @Override
    public void close() throws IOException {
        doc.close();
    }
}
