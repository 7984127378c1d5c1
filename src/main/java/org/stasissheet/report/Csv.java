package org.stasissheet.report;

import java.util.List;

/**
 * RFC 4180 CSV as every CSV of the tool writes it (CRLF line ends; a field with a comma, quote or line break
 * quoted, quotes doubled), safe to open in a spreadsheet: a cell starting with =, +, -, @, tab or CR gets a
 * leading apostrophe so it is never run as a formula (common practice against CSV formula injection).
 */
public final class Csv {
    private Csv() {
    }

    /** Appends one record and its CRLF. */
    public static void line(StringBuilder sb, List<String> cells) {
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(cell(cells.get(i)));
        }
        sb.append("\r\n");
    }

    /** One CSV field: formula-guarded, then quoted when RFC 4180 requires it. */
    public static String cell(String value) {
        String v = value;
        if (!v.isEmpty() && "=+-@\t\r".indexOf(v.charAt(0)) >= 0) {
            v = "'" + v;
        }
        if (v.indexOf(',') >= 0 || v.indexOf('"') >= 0 || v.indexOf('\n') >= 0 || v.indexOf('\r') >= 0) {
            return '"' + v.replace("\"", "\"\"") + '"';
        }
        return v;
    }
}
