package org.stasissheet.labs;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;

/**
 * What became of one line of a report (a pasted line, an HL7 OBX segment, a FHIR Observation): taken as a value,
 * asked about, or left out with the reason. Never null components.
 */
public sealed interface LabLine permits LabLine.Taken, LabLine.Asked, LabLine.Left {
    /** Where it came from, for people: "line 3", "OBX 4", "Observation/k-1". */
    String where();

    /** The text of the line as received (a pasted line, a segment, or a one-line summary of a resource). */
    String text();

    /**
     * A value to put in the case.
     *
     * @param flag  the laboratory's flag as printed (H, L, *, !), empty when none
     * @param range the reference range as printed, empty when none
     * @param note  how it was read, when anything was converted or derived; empty otherwise
     * @param time  when it was measured (ISO-8601), when the source said
     */
    record Taken(String where, String text, Measurement value, String flag, String range, String note,
                 Optional<String> time) implements LabLine {
        public Taken {
            Objects.requireNonNull(where, "where");
            Objects.requireNonNull(text, "text");
            Objects.requireNonNull(value, "value");
            Objects.requireNonNull(flag, "flag");
            Objects.requireNonNull(range, "range");
            Objects.requireNonNull(note, "note");
            Objects.requireNonNull(time, "time");
        }

        public Analyte analyte() {
            return value.analyte();
        }
    }

    /** A line that reads more than one way: the clinician picks one option or leaves the line out. */
    record Asked(String where, String text, Analyte analyte, String question, List<Option> options)
            implements LabLine {
        public Asked {
            Objects.requireNonNull(where, "where");
            Objects.requireNonNull(text, "text");
            Objects.requireNonNull(analyte, "analyte");
            Objects.requireNonNull(question, "question");
            options = List.copyOf(options);
            if (options.isEmpty()) {
                throw new IllegalArgumentException("a question needs at least one option");
            }
        }
    }

    /**
     * A line not imported.
     *
     * @param named the analyte the line names when it names one (then the value itself could not be read, which
     *              blocks a command-line import); empty for a line that names nothing the worksheet uses
     */
    record Left(String where, String text, Optional<Analyte> named, String reason) implements LabLine {
        public Left {
            Objects.requireNonNull(where, "where");
            Objects.requireNonNull(text, "text");
            Objects.requireNonNull(named, "named");
            Objects.requireNonNull(reason, "reason");
        }
    }

    /** One way to read an asked line: the value it would give, said in words. */
    record Option(Taken reading) {
        public Option {
            Objects.requireNonNull(reading, "reading");
        }

        /** "182.4 ×10⁹/L (= 182.4 ×10⁹/L)" style: as entered, and canonical when different. */
        public String label() {
            Measurement m = reading.value();
            String entered = Numbers.plain(m.entered().value()) + " " + m.unitOption().display();
            String canonical = Numbers.rounded(m.canonical(), 6) + " " + m.analyte().canonicalOption().display();
            String where = reading.where().isEmpty() ? "" : " (" + reading.where() + ")";
            return (m.unitOption().toCanonical() == 1 ? entered : entered + " = " + canonical) + where;
        }
    }
}
