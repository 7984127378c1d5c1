package org.stasissheet.course;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Condition;
import org.stasissheet.intake.Labs;
import org.stasissheet.intake.Patient;

/**
 * One patient's treatment over time: the domain form of a {@code stasis-course/1} file.
 *
 * <p>Guarantees: at least one assessment; entries in time order by instant (so offsets may differ), entries at the
 * same instant in the order they were written (the sort is stable); every assessment's case carries the course's
 * patient and condition.
 *
 * @param extraJson the course's {@code extra} object, kept verbatim as compact JSON ({@code {}} when none)
 */
public record Course(Patient patient, Condition condition, List<CourseEntry> entries, String extraJson) {
    public static final String FORMAT = "stasis-course/1";

    public Course {
        Objects.requireNonNull(patient, "patient");
        Objects.requireNonNull(condition, "condition");
        Objects.requireNonNull(extraJson, "extraJson");
        List<CourseEntry> sorted = new ArrayList<>(entries);
        sorted.sort(Comparator.comparing(e -> e.at().toInstant()));
        entries = List.copyOf(sorted);
        if (entries.stream().noneMatch(CourseEntry.Assessment.class::isInstance)) {
            throw new IllegalArgumentException("a course holds at least one assessment");
        }
        for (CourseEntry e : entries) {
            if (e instanceof CourseEntry.Assessment a
                    && (!a.moment().patient().equals(patient) || !a.moment().condition().equals(condition))) {
                throw new IllegalArgumentException("every assessment carries the course's patient and condition");
            }
        }
    }

    /** The assessments, in time order. */
    public List<CourseEntry.Assessment> assessments() {
        return entries.stream().filter(CourseEntry.Assessment.class::isInstance)
                .map(CourseEntry.Assessment.class::cast).toList();
    }

    /** The procedures, in time order. */
    public List<Procedure> procedures() {
        return entries.stream().filter(Procedure.class::isInstance).map(Procedure.class::cast).toList();
    }

    /**
     * The case that is assessed for assessment {@code n} (0-based, time order): the entry's own case, except that an
     * entry without a baseline takes, for tumor lysis, the baseline written earliest in the course or else the labs
     * of the course's first assessment (COURSE-FORMAT.md: the earliest assessment is the baseline when the entry
     * has none). The first assessment is never its own baseline.
     */
    public Case caseAt(int n) {
        List<CourseEntry.Assessment> all = assessments();
        Case own = all.get(n).moment();
        if (!own.baseline().values().isEmpty() || n == 0) {
            return own;
        }
        Optional<Labs> written = all.subList(0, n).stream().map(a -> a.moment().baseline())
                .filter(b -> !b.values().isEmpty()).findFirst();
        Labs baseline = written.orElse(all.get(0).moment().labs());
        return new Case(own.patient(), own.condition(), own.labs(), baseline, own.findings(), own.plan(),
                own.assessedAt(), own.assessor(), own.extraJson());
    }

    /** The index of the last assessment at or before {@code time}, empty when the course starts later. */
    public Optional<Integer> assessmentAtOrBefore(java.time.OffsetDateTime time) {
        List<CourseEntry.Assessment> all = assessments();
        Optional<Integer> found = Optional.empty();
        for (int i = 0; i < all.size(); i++) {
            if (!all.get(i).at().toInstant().isAfter(time.toInstant())) {
                found = Optional.of(i);
            }
        }
        return found;
    }
}
