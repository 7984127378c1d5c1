package org.stasissheet.rules;

import java.util.Objects;
import org.stasissheet.intake.Measurement;

/** One known value a rule condition can test. A value the case does not have is simply absent from {@link Facts}. */
public sealed interface Fact {
    /** A lab value, kept as entered so comparisons can use the source's own figure for that unit. */
    record Amount(Measurement measurement) implements Fact {
        public Amount {
            Objects.requireNonNull(measurement, "measurement");
        }
    }

    /** A plain number in the field's fixed unit (an organ grade, an age in years). */
    record Number(double value) implements Fact {
        public Number {
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("value must be finite");
            }
        }
    }

    record Bool(boolean value) implements Fact {
    }

    /** One word of the field's closed vocabulary. */
    record Word(String value) implements Fact {
        public Word {
            Objects.requireNonNull(value, "value");
        }
    }
}
