package org.stasissheet.load;

import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.Optional;
import org.stasissheet.course.Course;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;

/** Picks one moment of a course for the commands that take a case ({@code assess --at}). */
public final class CourseInputs {
    private CourseInputs() {
    }

    /**
     * The case in a case file, or for a course the case of the assessment at or before {@code at} (the latest when
     * no time is given), with the course's tumor-lysis baseline. {@code --at} on a case file is refused, not ignored.
     */
    public static Case caseOf(Path file, Optional<OffsetDateTime> at, java.io.PrintWriter err) {
        byte[] json = Inputs.caseBytes(file, err);
        CaseReader.Parsed parsed = CaseReader.parse(json);
        if (!Inputs.isCourse(parsed)) {
            if (at.isPresent()) {
                throw new InvalidInputException("--at " + at.get() + ": " + file + " is a single case, not a course; "
                        + "leave out --at");
            }
            return Inputs.parseCase(file, parsed);
        }
        Course course = Inputs.parseCourse(file, json);
        int last = course.assessments().size() - 1;
        if (at.isEmpty()) {
            return course.caseAt(last);
        }
        Optional<Integer> n = course.assessmentAtOrBefore(at.get());
        if (n.isEmpty()) {
            throw new InvalidInputException("--at " + at.get() + ": the course's first assessment is later ("
                    + course.assessments().get(0).at() + "); nothing was assessed");
        }
        return course.caseAt(n.get());
    }

}
