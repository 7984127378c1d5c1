package org.stasissheet.fuzz;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.Deflater;

/**
 * Builds small, hand-made PDFs for tests: objects 1..n in order, a classic cross-reference table with correct
 * offsets (PDF 32000-1:2008, 7.5.4) and a trailer. Object 1 is the catalog by convention.
 */
public final class TinyPdf {
    private final List<byte[]> objects = new ArrayList<>();
    private String trailerExtra = "";

    /** Adds the next object's body (between "N 0 obj" and "endobj"), as ISO-8859-1 text. */
    public TinyPdf object(String body) {
        objects.add(body.getBytes(StandardCharsets.ISO_8859_1));
        return this;
    }

    /** Adds a stream object: the dictionary entries (without Length) and the raw stream data. */
    public TinyPdf stream(String dictionaryEntries, byte[] data) {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.writeBytes(("<<" + dictionaryEntries + "/Length " + data.length + ">>\nstream\n")
                .getBytes(StandardCharsets.ISO_8859_1));
        b.writeBytes(data);
        b.writeBytes("\nendstream".getBytes(StandardCharsets.ISO_8859_1));
        objects.add(b.toByteArray());
        return this;
    }

    /** Extra trailer entries, e.g. {@code /Info 5 0 R}. */
    public TinyPdf trailer(String entries) {
        trailerExtra = entries;
        return this;
    }

    public byte[] build() {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.writeBytes("%PDF-1.4\n".getBytes(StandardCharsets.ISO_8859_1));
        List<Integer> offsets = new ArrayList<>();
        for (int i = 0; i < objects.size(); i++) {
            offsets.add(out.size());
            out.writeBytes(((i + 1) + " 0 obj\n").getBytes(StandardCharsets.ISO_8859_1));
            out.writeBytes(objects.get(i));
            out.writeBytes("\nendobj\n".getBytes(StandardCharsets.ISO_8859_1));
        }
        int xref = out.size();
        StringBuilder sb = new StringBuilder("xref\n0 " + (objects.size() + 1) + "\n0000000000 65535 f \n");
        for (int offset : offsets) {
            sb.append(String.format("%010d 00000 n \n", offset));
        }
        sb.append("trailer\n<</Size ").append(objects.size() + 1).append("/Root 1 0 R").append(trailerExtra)
                .append(">>\nstartxref\n").append(xref).append("\n%%EOF\n");
        out.writeBytes(sb.toString().getBytes(StandardCharsets.ISO_8859_1));
        return out.toByteArray();
    }

    /** zlib (RFC 1950) compression of the bytes, as a PDF FlateDecode filter expects. */
    public static byte[] deflate(byte[] data) {
        Deflater d = new Deflater(Deflater.BEST_COMPRESSION);
        d.setInput(data);
        d.finish();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        byte[] buf = new byte[64 * 1024];
        while (!d.finished()) {
            out.write(buf, 0, d.deflate(buf));
        }
        d.end();
        return out.toByteArray();
    }

    /** A PDF whose catalog names one embedded file {@code name} holding {@code json} (one Flate layer). */
    public static byte[] withAttachment(String name, byte[] json, String info) {
        TinyPdf pdf = new TinyPdf()
                .object("<</Type/Catalog/Pages 2 0 R/Names<</EmbeddedFiles 3 0 R>>>>")
                .object("<</Type/Pages/Kids[]/Count 0>>")
                .object("<</Names[(" + name + ") 4 0 R]>>")
                .object("<</Type/Filespec/F(" + name + ")/UF(" + name + ")/EF<</F 5 0 R>>>>")
                .stream("/Type/EmbeddedFile/Filter/FlateDecode", deflate(json));
        if (!info.isEmpty()) {
            pdf.object("<<" + info + ">>").trailer("/Info 6 0 R");
        }
        return pdf.build();
    }
}
