package org.stasissheet.course;

import java.time.OffsetDateTime;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.intake.Enums;
import org.stasissheet.measure.Quantity;

/**
 * One procedure of a course, as written in a {@code stasis-course/1} file. A switch over it must handle every kind.
 * The ranges checked here are the ones COURSE-FORMAT.md fixes; the reader reports them by path before these
 * constructors ever see a bad value.
 */
public sealed interface Procedure extends CourseEntry
        permits Procedure.PlasmaExchange, Procedure.Leukapheresis, Procedure.Transfusion, Procedure.Cytoreduction,
        Procedure.Rituximab {

    /** When it was done (the start, ISO-8601 with offset). */
    OffsetDateTime at();

    /** The file word for the kind, e.g. {@code plasma-exchange}. */
    String kind();

    /** The replacement fluid of a plasma exchange. */
    enum Replacement implements Enums.Coded {
        ALBUMIN("albumin", "albumin"), PLASMA("plasma", "plasma"),
        ALBUMIN_AND_PLASMA("albumin-and-plasma", "albumin and plasma");

        private final String code;
        private final String words;

        Replacement(String code, String words) {
            this.code = code;
            this.words = words;
        }

        @Override
        public String code() {
            return code;
        }

        public String words() {
            return words;
        }
    }

    /**
     * A plasma exchange given either in plasma volumes (0.5–2.0) or as a volume removed (L or mL); exactly one.
     */
    record PlasmaExchange(OffsetDateTime at, Optional<Double> plasmaVolumes, Optional<Quantity> volume,
                          Replacement replacement) implements Procedure {
        public static final double MIN_PLASMA_VOLUMES = 0.5;
        public static final double MAX_PLASMA_VOLUMES = 2.0;

        public PlasmaExchange {
            Objects.requireNonNull(at, "at");
            Objects.requireNonNull(plasmaVolumes, "plasmaVolumes");
            Objects.requireNonNull(volume, "volume");
            Objects.requireNonNull(replacement, "replacement");
            if (plasmaVolumes.isPresent() == volume.isPresent()) {
                throw new IllegalArgumentException("a plasma exchange needs plasmaVolumes or volume, exactly one");
            }
            plasmaVolumes.ifPresent(v -> {
                if (!(v >= MIN_PLASMA_VOLUMES && v <= MAX_PLASMA_VOLUMES)) {
                    throw new IllegalArgumentException("plasma volumes must be 0.5–2.0, was " + v);
                }
            });
            volume.ifPresent(q -> {
                if (!(q.unit().equals("L") || q.unit().equals("mL")) || !(q.value() > 0)) {
                    throw new IllegalArgumentException("volume must be above 0 in L or mL, was " + q);
                }
            });
        }

        @Override
        public String kind() {
            return "plasma-exchange";
        }

        /** The volume removed in litres, when it was written as a volume. */
        public Optional<Double> volumeLitres() {
            return volume.map(q -> q.unit().equals("mL") ? q.value() / 1000 : q.value());
        }
    }

    /** A leukapheresis processing 1–4 total blood volumes. */
    record Leukapheresis(OffsetDateTime at, double bloodVolumesProcessed) implements Procedure {
        public static final double MIN_BLOOD_VOLUMES = 1;
        public static final double MAX_BLOOD_VOLUMES = 4;

        public Leukapheresis {
            Objects.requireNonNull(at, "at");
            if (!(bloodVolumesProcessed >= MIN_BLOOD_VOLUMES && bloodVolumesProcessed <= MAX_BLOOD_VOLUMES)) {
                throw new IllegalArgumentException("blood volumes processed must be 1–4, was " + bloodVolumesProcessed);
            }
        }

        @Override
        public String kind() {
            return "leukapheresis";
        }
    }

    /** A red-cell transfusion of at least one unit. */
    record Transfusion(OffsetDateTime at, int redCellUnits) implements Procedure {
        public Transfusion {
            Objects.requireNonNull(at, "at");
            if (redCellUnits < 1) {
                throw new IllegalArgumentException("red cell units must be at least 1, was " + redCellUnits);
            }
        }

        @Override
        public String kind() {
            return "transfusion";
        }
    }

    /** The start of cytoreduction with a named agent (free text, e.g. hydroxyurea). */
    record Cytoreduction(OffsetDateTime at, String agent) implements Procedure {
        public Cytoreduction {
            Objects.requireNonNull(at, "at");
            Objects.requireNonNull(agent, "agent");
            if (agent.isBlank()) {
                throw new IllegalArgumentException("cytoreduction needs the agent");
            }
        }

        @Override
        public String kind() {
            return "cytoreduction";
        }
    }

    /** The first dose of rituximab. */
    record Rituximab(OffsetDateTime at) implements Procedure {
        public Rituximab {
            Objects.requireNonNull(at, "at");
        }

        @Override
        public String kind() {
            return "rituximab";
        }
    }
}
