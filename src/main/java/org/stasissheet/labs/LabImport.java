package org.stasissheet.labs;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Labs;
import org.stasissheet.intake.Measurement;
import org.stasissheet.intake.Patient;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;

/**
 * The outcome of reading one lab report: every line, in order, as taken, asked or left. Values land in a case
 * only through {@link #applyTo}, and only once every question is answered.
 */
public record LabImport(Source source, List<LabLine> lines) {
    /** Where the report came from; the code is written to the case's {@code extra.labImport.from}. */
    public enum Source {
        PASTED_TEXT("pasted-text", "pasted report text"),
        FHIR_R4("fhir-r4-bundle", "FHIR R4 Bundle"),
        HL7_V2("hl7v2-oru-r01", "HL7 v2 ORU^R01 message");

        private final String code;
        private final String label;

        Source(String code, String label) {
            this.code = code;
            this.label = label;
        }

        public String code() {
            return code;
        }

        public String label() {
            return label;
        }
    }

    /** The key under {@code extra} that records where each imported value came from. */
    public static final String EXTRA_KEY = "labImport";

    public LabImport {
        Objects.requireNonNull(source, "source");
        lines = List.copyOf(lines);
    }

    public List<LabLine.Taken> taken() {
        return lines.stream().filter(LabLine.Taken.class::isInstance).map(LabLine.Taken.class::cast).toList();
    }

    public List<LabLine.Asked> questions() {
        return lines.stream().filter(LabLine.Asked.class::isInstance).map(LabLine.Asked.class::cast).toList();
    }

    public List<LabLine.Left> left() {
        return lines.stream().filter(LabLine.Left.class::isInstance).map(LabLine.Left.class::cast).toList();
    }

    /** True while a question is open or a line names an analyte whose value could not be read. */
    public boolean needsAttention() {
        return !questions().isEmpty() || left().stream().anyMatch(l -> l.named().isPresent());
    }

    /** The located problems that stop a non-interactive import, one line each. */
    public List<String> problems() {
        List<String> out = new ArrayList<>();
        for (LabLine line : lines) {
            if (line instanceof LabLine.Asked a) {
                out.add(a.where() + ": " + a.analyte().key() + ": " + a.question() + " "
                        + String.join(" | ", a.options().stream().map(LabLine.Option::label).toList())
                        + " (correct the report and import again)");
            } else if (line instanceof LabLine.Left l && l.named().isPresent()) {
                out.add(l.where() + ": " + l.named().get().key() + ": " + l.reason());
            }
        }
        return out;
    }

    /**
     * Answers the question at {@code index} of {@link #lines}: the chosen option is taken, or the line is left out
     * when {@code choice} is empty.
     */
    public LabImport answer(int index, Optional<LabLine.Option> choice) {
        if (!(lines.get(index) instanceof LabLine.Asked asked)) {
            throw new IllegalArgumentException("line " + index + " asks nothing");
        }
        choice.ifPresent(c -> {
            if (!asked.options().contains(c)) {
                throw new IllegalArgumentException("not one of the options of " + asked.where());
            }
        });
        List<LabLine> copy = new ArrayList<>(lines);
        copy.set(index, choice.<LabLine>map(LabLine.Option::reading)
                .orElseGet(() -> new LabLine.Left(asked.where(), asked.text(), Optional.empty(),
                        "left out by the clinician (" + asked.question() + ")")));
        return new LabImport(source, copy);
    }

    /**
     * The case with every taken value in place (replacing a value of the same analyte) and, under
     * {@code extra.labImport}, where each came from. Refused while {@link #questions()} is not empty.
     */
    public Case applyTo(Case base) {
        Objects.requireNonNull(base, "base");
        if (!questions().isEmpty()) {
            throw new IllegalStateException("unanswered questions: " + questions().size());
        }
        Labs labs = base.labs();
        Patient patient = base.patient();
        Set<Analyte> seen = EnumSet.noneOf(Analyte.class);
        for (LabLine.Taken t : taken()) {
            if (!seen.add(t.analyte())) {
                throw new IllegalStateException("two values taken for " + t.analyte().key());
            }
            Measurement m = t.value();
            if (t.analyte() == Analyte.HEIGHT) {
                patient = new Patient(patient.label(), patient.sex(), patient.ageYears(), Optional.of(m),
                        patient.weight());
            } else if (t.analyte() == Analyte.WEIGHT) {
                patient = new Patient(patient.label(), patient.sex(), patient.ageYears(), patient.height(),
                        Optional.of(m));
            } else {
                labs = labs.with(m);
            }
        }
        return new Case(patient, base.condition(), labs, base.baseline(), base.findings(), base.plan(),
                base.assessedAt(), base.assessor(), recordOrigins(base.extraJson()));
    }

    /**
     * The {@code extra} object with, under {@code labImport.values}, where each taken value came from (source,
     * line or resource, time, flag, range, how it was read); other keys and earlier origins are kept.
     */
    public String recordOrigins(String extraJson) {
        ObjectNode extra = extraObject(extraJson);
        ObjectNode values = extra.get(EXTRA_KEY) instanceof ObjectNode earlier
                && earlier.get("values") instanceof ObjectNode v ? v.deepCopy() : MAPPER.createObjectNode();
        for (LabLine.Taken t : taken()) {
            ObjectNode origin = values.putObject(t.analyte().key());
            origin.put("from", source.code());
            origin.put("where", t.where());
            t.time().ifPresent(time -> origin.put("time", time));
            putIfNotEmpty(origin, "flag", t.flag());
            putIfNotEmpty(origin, "range", t.range());
            putIfNotEmpty(origin, "note", t.note());
        }
        ObjectNode record = MAPPER.createObjectNode();
        record.set("values", values);
        extra.set(EXTRA_KEY, record);
        return extra.toString();
    }

    /** "labs.wbc: 150 10*9/L → 182.4 10*9/L" for every value {@link #applyTo} would overwrite. */
    public List<String> replacements(Case base) {
        List<String> out = new ArrayList<>();
        for (LabLine.Taken t : taken()) {
            base.labs().get(t.analyte()).filter(old -> !old.equals(t.value())).ifPresent(old -> out.add(
                    "labs." + t.analyte().key() + ": " + describe(old) + " replaced by " + describe(t.value())));
        }
        return out;
    }

    private static String describe(Measurement m) {
        return Numbers.plain(m.entered().value()) + " " + m.entered().unit();
    }

    private static void putIfNotEmpty(ObjectNode node, String key, String value) {
        if (!value.isEmpty()) {
            node.put(key, value);
        }
    }

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private static ObjectNode extraObject(String extraJson) {
        try {
            JsonNode node = MAPPER.readTree(extraJson);
            return node instanceof ObjectNode o ? o.deepCopy() : MAPPER.createObjectNode();
        } catch (JsonProcessingException e) {
            // a Case's extra is always an object the reader accepted; an unreadable one is a programming error
            throw new IllegalArgumentException("extra is not a JSON object", e);
        }
    }
}
