package org.stasissheet.course;

import java.util.List;
import java.util.Objects;
import org.stasissheet.worksheet.Worksheet;

/**
 * The course assessed: each assessment's worksheet in time order and each procedure with its projections beside
 * what was measured next. Immutable; renderers only present it.
 */
public record CourseReport(Course course, List<Worksheet> worksheets, List<ProcedureReview> procedures) {
    public static final String FORMAT = "stasis-course-report/1";

    public CourseReport {
        Objects.requireNonNull(course, "course");
        worksheets = List.copyOf(worksheets);
        procedures = List.copyOf(procedures);
        if (worksheets.size() != course.assessments().size()) {
            throw new IllegalArgumentException("one worksheet per assessment");
        }
    }

    /** The worksheet of the latest assessment. */
    public Worksheet latest() {
        return worksheets.get(worksheets.size() - 1);
    }
}
