package org.stasissheet.report;

import java.time.format.DateTimeFormatter;
import java.util.Locale;

/**
 * How every renderer writes a moment: {@code 2026-03-05 02:40 +01:00}, locale-free. Kept apart from the PDF
 * renderer so that the text renderers can use it without loading any PDF class.
 */
public final class ReportTime {
    public static final DateTimeFormatter FORMAT = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm xxx", Locale.ROOT);

    private ReportTime() {
    }
}
