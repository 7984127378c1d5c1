package org.stasissheet.course;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.CaseReader.Problem;
import org.stasissheet.intake.Enums;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.Quantity;

/**
 * Reads a {@code stasis-course/1} file from its bytes. Pure: no file access, no clock.
 *
 * <p>Every assessment is read by the case reader, as the case built from the course's {@code patient} and
 * {@code condition} plus that entry, so its problems carry the entry's path ({@code entries[2].assessment.labs.wbc});
 * a problem of the shared patient or condition is reported once, at its own path. Nothing is guessed: an unknown
 * key is refused (except under {@code extra}), and so is a plasma exchange with neither plasma volumes nor a volume.
 */
public final class CourseReader {
    private static final Set<String> TOP_KEYS = Set.of("format", "patient", "condition", "entries", "extra");
    private static final Set<String> ASSESSMENT_KEYS = Set.of("assessedAt", "assessor", "labs", "findings", "plan",
            "baseline", "extra");

    private CourseReader() {
    }

    /** The outcome of reading: the course, or every problem found (never empty), in file order. */
    public sealed interface Result permits Accepted, Rejected {
    }

    public record Accepted(Course course) implements Result {
        public Accepted {
            Objects.requireNonNull(course, "course");
        }
    }

    public record Rejected(List<Problem> problems) implements Result {
        public Rejected {
            problems = List.copyOf(problems);
            if (problems.isEmpty()) {
                throw new IllegalArgumentException("a rejection needs at least one problem");
            }
        }
    }

    public static Result read(byte[] bytes) {
        CaseReader.Parsed parsed = CaseReader.parse(bytes);
        if (parsed.tree().isEmpty()) {
            return new Rejected(parsed.problems());
        }
        return new Reading(parsed.tree().get()).run();
    }

    /** Whether these bytes claim to be a course (by their {@code format}), so callers can tell a course from a case. */
    public static boolean claimsToBeCourse(byte[] bytes) {
        return claimsToBeCourse(CaseReader.parse(bytes));
    }

    /** As {@link #claimsToBeCourse(byte[])}, on a file already read once (a cold run reads it once, not twice). */
    public static boolean claimsToBeCourse(CaseReader.Parsed parsed) {
        return parsed.tree().map(t -> Course.FORMAT.equals(t.path("format").asText(""))).orElse(false);
    }

    /** One read; collects problems in file order, deduplicating those of the shared patient and condition. */
    private static final class Reading {
        private final ObjectNode root;
        private final Set<Problem> problems = new LinkedHashSet<>();

        Reading(ObjectNode root) {
            this.root = root;
        }

        Result run() {
            root.fieldNames().forEachRemaining(key -> {
                if (!TOP_KEYS.contains(key)) {
                    add(key, "unknown key; a course has format, patient, condition, entries and extra");
                }
            });
            JsonNode format = root.get("format");
            if (format == null) {
                add("format", "missing; a course file starts with \"format\": \"" + Course.FORMAT + "\"");
            } else if (!Course.FORMAT.equals(format.asText(null)) || !format.isTextual()) {
                add("format", format + " is not \"" + Course.FORMAT + "\"");
            }
            JsonNode extra = root.get("extra");
            if (extra != null && !extra.isObject()) {
                add("extra", "must be an object");
            }
            JsonNode entries = root.get("entries");
            List<CourseEntry> read = new ArrayList<>();
            Case shared = null;
            if (entries == null || !entries.isArray()) {
                add("entries", entries == null ? "missing; a course needs at least one assessment"
                        : "must be a list of entries");
            } else {
                for (int i = 0; i < entries.size(); i++) {
                    Optional<CourseEntry> entry = entry(entries.get(i), "entries[" + i + "]");
                    entry.ifPresent(read::add);
                    if (shared == null && entry.orElse(null) instanceof CourseEntry.Assessment a) {
                        shared = a.moment();
                    }
                }
                boolean anyAssessment = false;
                for (JsonNode e : entries) {
                    anyAssessment |= e.isObject() && e.has("assessment");
                }
                if (!anyAssessment) {
                    add("entries", "holds no assessment; a course needs at least one");
                }
            }
            if (!problems.isEmpty() || shared == null) {
                if (problems.isEmpty()) {
                    add("entries", "holds no assessment; a course needs at least one");
                }
                return new Rejected(List.copyOf(problems));
            }
            String extraJson = extra == null ? "{}" : extra.toString();
            return new Accepted(new Course(shared.patient(), shared.condition(), read, extraJson));
        }

        private Optional<CourseEntry> entry(JsonNode node, String path) {
            if (!node.isObject() || node.size() != 1) {
                add(path, "each entry is an object with exactly one key, assessment or procedure");
                return Optional.empty();
            }
            String key = node.fieldNames().next();
            JsonNode body = node.get(key);
            String at = path + "." + key;
            if (!body.isObject()) {
                add(at, "must be an object");
                return Optional.empty();
            }
            return switch (key) {
                case "assessment" -> assessment((ObjectNode) body, at);
                case "procedure" -> procedure((ObjectNode) body, at);
                default -> {
                    add(path + "." + key, "unknown key; an entry is an assessment or a procedure");
                    yield Optional.empty();
                }
            };
        }

        private Optional<CourseEntry> assessment(ObjectNode body, String path) {
            boolean ok = true;
            for (Iterator<String> it = body.fieldNames(); it.hasNext(); ) {
                String key = it.next();
                if (!ASSESSMENT_KEYS.contains(key)) {
                    add(path + "." + key, "unknown key; an assessment has assessedAt, assessor, labs, findings, "
                            + "plan, baseline and extra (patient and condition belong to the whole course)");
                    ok = false;
                }
            }
            if (!body.has("assessedAt")) {
                add(path + ".assessedAt", "missing; every assessment in a course needs its time, ISO-8601 with "
                        + "offset, e.g. 2026-06-11T03:15:00+02:00");
                ok = false;
            }
            if (!ok) {
                return Optional.empty();
            }
            ObjectNode asCase = JsonNodeFactory.instance.objectNode();
            asCase.put("format", Case.FORMAT);
            copy("patient", asCase);
            copy("condition", asCase);
            asCase.setAll(body);
            CaseReader.Result result = CaseReader.read(asCase);
            if (result instanceof CaseReader.Accepted accepted) {
                return Optional.of(new CourseEntry.Assessment(accepted.c()));
            }
            for (Problem p : ((CaseReader.Rejected) result).problems()) {
                boolean sharedPart = p.path().startsWith("patient") || p.path().startsWith("condition");
                if (sharedPart) {
                    problems.add(p);
                } else if (p.path().equals(Problem.WHOLE_FILE)) {
                    add(path, p.message());
                } else {
                    add(path + "." + p.path(), p.message());
                }
            }
            return Optional.empty();
        }

        private void copy(String key, ObjectNode into) {
            JsonNode part = root.get(key);
            if (part != null) {
                into.set(key, part);
            }
        }

        private Optional<CourseEntry> procedure(ObjectNode body, String path) {
            int before = problems.size();
            Optional<OffsetDateTime> at = time(body.get("at"), path + ".at");
            JsonNode kindNode = body.get("kind");
            String kind = kindNode == null ? "" : kindNode.asText("");
            Set<String> allowed = switch (kind) {
                case "plasma-exchange" -> Set.of("at", "kind", "plasmaVolumes", "volume", "replacement");
                case "leukapheresis" -> Set.of("at", "kind", "bloodVolumesProcessed");
                case "transfusion" -> Set.of("at", "kind", "redCellUnits");
                case "cytoreduction" -> Set.of("at", "kind", "agent");
                case "rituximab" -> Set.of("at", "kind");
                default -> {
                    add(path + ".kind", (kindNode == null ? "missing" : kindNode + " is not a procedure kind")
                            + "; write plasma-exchange, leukapheresis, transfusion, cytoreduction or rituximab");
                    yield Set.of("at", "kind");
                }
            };
            for (Map.Entry<String, JsonNode> f : (Iterable<Map.Entry<String, JsonNode>>) body::fields) {
                if (isKnownKind(kind) && !allowed.contains(f.getKey())) {
                    add(path + "." + f.getKey(), "unknown key for a " + kind + " procedure; it takes "
                            + String.join(", ", sortedKeys(allowed)));
                }
            }
            Optional<Procedure> made = switch (kind) {
                case "plasma-exchange" -> exchange(body, path, at);
                case "leukapheresis" -> number(body, "bloodVolumesProcessed", path,
                        Procedure.Leukapheresis.MIN_BLOOD_VOLUMES, Procedure.Leukapheresis.MAX_BLOOD_VOLUMES,
                        "blood volumes processed").flatMap(v -> at.map(t -> new Procedure.Leukapheresis(t, v)));
                case "transfusion" -> units(body, path).flatMap(u -> at.map(t -> new Procedure.Transfusion(t, u)));
                case "cytoreduction" -> agent(body, path).flatMap(a -> at.map(t -> new Procedure.Cytoreduction(t, a)));
                case "rituximab" -> at.map(Procedure.Rituximab::new);
                default -> Optional.empty();
            };
            return problems.size() == before ? made.map(p -> p) : Optional.empty();
        }

        private static boolean isKnownKind(String kind) {
            return Set.of("plasma-exchange", "leukapheresis", "transfusion", "cytoreduction", "rituximab")
                    .contains(kind);
        }

        private static List<String> sortedKeys(Set<String> keys) {
            return keys.stream().sorted().toList();
        }

        private Optional<Procedure> exchange(ObjectNode body, String path, Optional<OffsetDateTime> at) {
            boolean hasVolumes = body.has("plasmaVolumes");
            boolean hasVolume = body.has("volume");
            if (hasVolumes == hasVolume) {
                add(path, hasVolumes
                        ? "gives both plasmaVolumes and volume; write one of them, so the amount is not ambiguous"
                        : "a plasma exchange needs plasmaVolumes (0.5–2.0) or volume (in L or mL); neither is "
                                + "given, and no amount is assumed");
                return Optional.empty();
            }
            Optional<Double> volumes = Optional.empty();
            Optional<Quantity> volume = Optional.empty();
            if (hasVolumes) {
                volumes = number(body, "plasmaVolumes", path, Procedure.PlasmaExchange.MIN_PLASMA_VOLUMES,
                        Procedure.PlasmaExchange.MAX_PLASMA_VOLUMES, "plasma volumes");
                if (volumes.isEmpty()) {
                    return Optional.empty();
                }
            } else {
                volume = volume(body.get("volume"), path + ".volume");
                if (volume.isEmpty()) {
                    return Optional.empty();
                }
            }
            JsonNode fluid = body.get("replacement");
            Optional<Procedure.Replacement> replacement = fluid == null || !fluid.isTextual() ? Optional.empty()
                    : Enums.parse(Procedure.Replacement.class, fluid.asText());
            if (replacement.isEmpty()) {
                add(path + ".replacement", (fluid == null ? "missing" : fluid + " is not a replacement fluid")
                        + "; write " + Enums.allowed(Procedure.Replacement.class));
                return Optional.empty();
            }
            Optional<Double> v = volumes;
            Optional<Quantity> q = volume;
            return at.map(t -> new Procedure.PlasmaExchange(t, v, q, replacement.get()));
        }

        private Optional<Quantity> volume(JsonNode node, String path) {
            if (node == null || !node.isObject()) {
                add(path, "must be {\"value\": number, \"unit\": \"L\" or \"mL\"}");
                return Optional.empty();
            }
            for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
                String key = it.next();
                if (!key.equals("value") && !key.equals("unit")) {
                    add(path + "." + key, "unknown key; a volume has value and unit");
                }
            }
            JsonNode value = node.get("value");
            JsonNode unit = node.get("unit");
            String unitText = unit == null ? "" : unit.asText("");
            if (!unitText.equals("L") && !unitText.equals("mL")) {
                add(path + ".unit", (unit == null ? "missing" : unit + " is not accepted") + "; write L or mL");
                return Optional.empty();
            }
            if (value == null || !value.isNumber() || !(value.asDouble() > 0)) {
                add(path + ".value", (value == null ? "missing" : value + " " + unitText + " is not above 0")
                        + "; the volume of plasma removed is a number above 0");
                return Optional.empty();
            }
            double litres = unitText.equals("mL") ? value.asDouble() / 1000 : value.asDouble();
            // common practice: one exchange removes about 2–5 L; above 10 L a slip of unit is more likely
            if (litres > 10) {
                add(path + ".value", Numbers.plain(value.asDouble()) + " " + unitText + " (" + Numbers.plain(litres)
                        + " L) is not plausible for one exchange" + (unitText.equals("L")
                        ? "; did you mean mL (= " + Numbers.plain(litres / 1000) + " L)?" : ""));
                return Optional.empty();
            }
            return Optional.of(new Quantity(value.asDouble(), unitText));
        }

        private Optional<Double> number(ObjectNode body, String key, String path, double min, double max,
                                        String words) {
            JsonNode n = body.get(key);
            if (n == null || !n.isNumber()) {
                add(path + "." + key, (n == null ? "missing" : n + " is not a number") + "; " + words + " is a "
                        + "number from " + Numbers.plain(min) + " to " + Numbers.plain(max));
                return Optional.empty();
            }
            double v = n.asDouble();
            if (!(v >= min && v <= max)) {
                add(path + "." + key, Numbers.plain(v) + " " + words + " is outside " + Numbers.plain(min) + "–"
                        + Numbers.plain(max));
                return Optional.empty();
            }
            return Optional.of(v);
        }

        private Optional<Integer> units(ObjectNode body, String path) {
            JsonNode n = body.get("redCellUnits");
            if (n == null || !n.canConvertToExactIntegral() || !n.isNumber() || n.asInt() < 1) {
                add(path + ".redCellUnits", (n == null ? "missing" : n + " is not a whole number of 1 or more")
                        + "; red cell units are counted, 1 or more");
                return Optional.empty();
            }
            return Optional.of(n.asInt());
        }

        private Optional<String> agent(ObjectNode body, String path) {
            JsonNode n = body.get("agent");
            if (n == null || !n.isTextual() || n.asText().isBlank()) {
                add(path + ".agent", (n == null ? "missing" : n + " is not a name")
                        + "; name the agent, e.g. \"hydroxyurea\"");
                return Optional.empty();
            }
            return Optional.of(n.asText());
        }

        private Optional<OffsetDateTime> time(JsonNode node, String path) {
            if (node == null || !node.isTextual()) {
                add(path, (node == null ? "missing" : node + " is not a time")
                        + "; write ISO-8601 with offset, e.g. 2026-06-11T09:00:00+02:00");
                return Optional.empty();
            }
            try {
                return Optional.of(OffsetDateTime.parse(node.asText()));
            } catch (DateTimeParseException e) {
                add(path, "\"" + node.asText() + "\" is not an ISO-8601 time with offset; write it e.g. "
                        + "2026-06-11T09:00:00+02:00");
                return Optional.empty();
            }
        }

        private void add(String path, String message) {
            problems.add(new Problem(path, message));
        }
    }
}
