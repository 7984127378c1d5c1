package org.stasissheet.course;

import java.time.OffsetDateTime;
import java.util.Objects;
import org.stasissheet.intake.Case;

/** One entry of a course: an assessment or a procedure, each at a time. */
public sealed interface CourseEntry permits CourseEntry.Assessment, Procedure {
    OffsetDateTime at();

    /**
     * One assessment, held as the case of that moment exactly as the entry wrote it (the course's patient and
     * condition plus the entry), so it always carries its time.
     */
    record Assessment(Case moment) implements CourseEntry {
        public Assessment {
            Objects.requireNonNull(moment, "moment");
            if (moment.assessedAt().isEmpty()) {
                throw new IllegalArgumentException("an assessment in a course needs its time");
            }
        }

        @Override
        public OffsetDateTime at() {
            return moment.assessedAt().orElseThrow();
        }
    }
}
