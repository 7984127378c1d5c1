package org.stasissheet.intake;

import com.fasterxml.jackson.core.io.JsonStringEncoder;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.Quantity;

/**
 * Writes a {@link Case} as a pretty-printed {@code stasis-case/1} file, in the key order of CASE-FORMAT.md.
 * Numbers and units are written exactly as entered (the shortest decimal that reads back as the same double),
 * absent values are left out, and {@code extra} is copied verbatim. {@link CaseReader#read} of the output gives
 * back an equal case.
 *
 * <p>Sections and condition words are always written, even when they hold only defaults, so a reader sees
 * explicitly that nothing was known; "not assessed" signs and grades are left out, as the format says.
 */
public final class CaseWriter {
    private CaseWriter() {
    }

    public static String write(Case c) {
        Objects.requireNonNull(c, "c");
        Json root = new Json();
        root.put("format", text(Case.FORMAT));
        root.put("patient", patient(c.patient()));
        root.put("condition", condition(c.condition()));
        root.put("labs", labs(c.labs()));
        root.put("baseline", labs(c.baseline()));
        root.put("findings", findings(c.findings()));
        Json plan = new Json();
        plan.put("rituximabPlanned", String.valueOf(c.plan().rituximabPlanned()));
        plan.put("transfusionPlanned", String.valueOf(c.plan().transfusionPlanned()));
        root.put("plan", plan);
        c.assessedAt().ifPresent(t -> root.put("assessedAt", text(DateTimeFormatter.ISO_OFFSET_DATE_TIME.format(t))));
        if (!c.assessor().isEmpty()) {
            root.put("assessor", text(c.assessor()));
        }
        root.put("extra", c.extraJson());
        StringBuilder out = new StringBuilder();
        root.render(out, "");
        return out.append('\n').toString();
    }

    private static Json patient(Patient p) {
        Json j = new Json();
        if (!p.label().isEmpty()) {
            j.put("label", text(p.label()));
        }
        p.sex().ifPresent(s -> j.put("sex", text(s.code())));
        p.ageYears().ifPresent(a -> j.put("ageYears", Integer.toString(a)));
        p.height().ifPresent(h -> j.put("height", measurement(h)));
        p.weight().ifPresent(w -> j.put("weight", measurement(w)));
        return j;
    }

    private static Json condition(Condition c) {
        Json j = new Json();
        j.put("paraprotein", text(c.paraprotein().code()));
        j.put("leukemia", text(c.leukemia().code()));
        j.put("monocytic", String.valueOf(c.monocytic()));
        j.put("cryoglobulin", text(c.cryoglobulin().code()));
        c.therapyStarted().ifPresent(d -> j.put("therapyStarted", text(d.toString())));
        return j;
    }

    private static Json labs(Labs labs) {
        Json j = new Json();
        // Labs keeps catalogue order, which is the order of the table in CASE-FORMAT.md
        for (Map.Entry<org.stasissheet.measure.Analyte, Measurement> e : labs.values().entrySet()) {
            j.put(e.getKey().key(), measurement(e.getValue()));
        }
        return j;
    }

    private static Json findings(Findings f) {
        Json j = new Json();
        grade(j, "pulmonaryGrade", f.pulmonaryGrade());
        grade(j, "neurologicalGrade", f.neurologicalGrade());
        grade(j, "otherOrganGrade", f.otherOrganGrade());
        observation(j, "mucosalBleeding", f.mucosalBleeding());
        observation(j, "visualDisturbance", f.visualDisturbance());
        j.put("retinopathy", text(f.retinopathy().code()));
        observation(j, "heartFailure", f.heartFailure());
        observation(j, "arrhythmia", f.arrhythmia());
        observation(j, "seizure", f.seizure());
        return j;
    }

    private static void grade(Json j, String key, Optional<Integer> grade) {
        grade.ifPresent(g -> j.put(key, Integer.toString(g)));
    }

    private static void observation(Json j, String key, Observation o) {
        if (o != Observation.NOT_ASSESSED) {
            j.put(key, String.valueOf(o == Observation.YES));
        }
    }

    /** One line: {@code {"value": 5.6, "unit": "cP"}}, with the temperature when there is one. */
    private static String measurement(Measurement m) {
        StringBuilder sb = new StringBuilder(quantity(m.entered()));
        m.temperature().ifPresent(t -> {
            sb.setLength(sb.length() - 1);
            sb.append(", \"temperature\": ").append(quantity(t)).append('}');
        });
        return sb.toString();
    }

    private static String quantity(Quantity q) {
        return "{\"value\": " + Numbers.plain(q.value()) + ", \"unit\": " + text(q.unit()) + "}";
    }

    private static String text(String s) {
        return "\"" + new String(JsonStringEncoder.getInstance().quoteAsString(s)) + "\"";
    }

    /** A JSON object under construction: keys in insertion order, values as finished JSON or nested objects. */
    private static final class Json {
        private final List<String> keys = new ArrayList<>();
        private final List<Object> values = new ArrayList<>();

        void put(String key, Object rawJsonOrObject) {
            keys.add(key);
            values.add(rawJsonOrObject);
        }

        void render(StringBuilder out, String indent) {
            if (keys.isEmpty()) {
                out.append("{}");
                return;
            }
            String inner = indent + "  ";
            out.append("{\n");
            for (int i = 0; i < keys.size(); i++) {
                out.append(inner).append(text(keys.get(i))).append(": ");
                Object v = values.get(i);
                if (v instanceof Json) {
                    ((Json) v).render(out, inner);
                } else {
                    out.append((String) v);
                }
                out.append(i + 1 < keys.size() ? ",\n" : "\n");
            }
            out.append(indent).append('}');
        }
    }
}
