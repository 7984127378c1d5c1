package org.stasissheet.course;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.time.format.DateTimeFormatter;
import java.util.Objects;
import org.stasissheet.intake.CaseWriter;
import org.stasissheet.measure.Numbers;

/**
 * Writes a {@link Course} as a pretty-printed {@code stasis-course/1} file, entries in time order. Each assessment is
 * written by the case writer (one way to write a case) and stripped of what the course holds once; numbers keep
 * their shortest decimal form. {@link CourseReader#read} of the output gives back an equal course.
 */
public final class CourseWriter {
    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .enable(SerializationFeature.INDENT_OUTPUT);

    private CourseWriter() {
    }

    public static String write(Course course) {
        Objects.requireNonNull(course, "course");
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", Course.FORMAT);
        ObjectNode first = caseTree(course.assessments().get(0));
        root.set("patient", first.get("patient"));
        root.set("condition", first.get("condition"));
        ArrayNode entries = root.putArray("entries");
        for (CourseEntry e : course.entries()) {
            ObjectNode entry = entries.addObject();
            if (e instanceof CourseEntry.Assessment a) {
                entry.set("assessment", assessment(a));
            } else {
                entry.set("procedure", procedure((Procedure) e));
            }
        }
        root.set("extra", parse(course.extraJson()));
        try {
            return MAPPER.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("course could not be written as JSON", e);
        }
    }

    private static ObjectNode assessment(CourseEntry.Assessment a) {
        ObjectNode whole = caseTree(a);
        ObjectNode out = MAPPER.createObjectNode();
        // the time first, as a reader scans a course by time
        out.set("assessedAt", whole.get("assessedAt"));
        for (String key : new String[] {"assessor", "labs", "baseline", "findings", "plan"}) {
            if (whole.has(key)) {
                out.set(key, whole.get(key));
            }
        }
        JsonNode extra = whole.get("extra");
        if (extra != null && !extra.isEmpty()) {
            out.set("extra", extra);
        }
        return out;
    }

    private static ObjectNode procedure(Procedure p) {
        ObjectNode out = MAPPER.createObjectNode();
        out.put("at", DateTimeFormatter.ISO_OFFSET_DATE_TIME.format(p.at()));
        out.put("kind", p.kind());
        if (p instanceof Procedure.PlasmaExchange x) {
            x.plasmaVolumes().ifPresent(v -> out.put("plasmaVolumes", decimal(v)));
            x.volume().ifPresent(q -> {
                ObjectNode v = out.putObject("volume");
                v.put("value", decimal(q.value()));
                v.put("unit", q.unit());
            });
            out.put("replacement", x.replacement().code());
        } else if (p instanceof Procedure.Leukapheresis l) {
            out.put("bloodVolumesProcessed", decimal(l.bloodVolumesProcessed()));
        } else if (p instanceof Procedure.Transfusion t) {
            out.put("redCellUnits", t.redCellUnits());
        } else if (p instanceof Procedure.Cytoreduction c) {
            out.put("agent", c.agent());
        }
        // rituximab has no further keys
        return out;
    }

    /** The shortest decimal that reads back as the same double (as the case writer writes numbers). */
    private static BigDecimal decimal(double v) {
        return new BigDecimal(Numbers.plain(v));
    }

    private static ObjectNode caseTree(CourseEntry.Assessment a) {
        return (ObjectNode) parse(CaseWriter.write(a.moment()));
    }

    private static JsonNode parse(String json) {
        try {
            return MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the case writer wrote JSON that does not read back", e);
        }
    }
}
