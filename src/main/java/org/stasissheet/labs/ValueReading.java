package org.stasissheet.labs;

import java.util.List;
import java.util.Objects;

/** What one value-with-unit text reads as, for a known analyte. */
public sealed interface ValueReading permits ValueReading.Understood, ValueReading.Choice, ValueReading.NotUnderstood {

    /** One reading; {@code reading.where()} is empty. */
    record Understood(LabLine.Taken reading) implements ValueReading {
        public Understood {
            Objects.requireNonNull(reading, "reading");
        }
    }

    /** Several readings (a missing unit, a separator that reads two ways, an implausible value): ask. */
    record Choice(String question, List<LabLine.Option> options) implements ValueReading {
        public Choice {
            Objects.requireNonNull(question, "question");
            options = List.copyOf(options);
        }
    }

    /** Nothing usable, and why, naming the value and unit. */
    record NotUnderstood(String reason) implements ValueReading {
        public NotUnderstood {
            Objects.requireNonNull(reason, "reason");
        }
    }
}
