package org.stasissheet.intake;

import com.fasterxml.jackson.databind.JsonNode;
import java.math.BigDecimal;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.stasissheet.measure.Analyte;

/**
 * Step 2 of reading: the {@code stasis-case/1} file as plain transfer data. It knows the keys and the JSON type
 * of each value, nothing about units, ranges or vocabularies (that is {@link CaseConversion}). A version change
 * of the format gets its own transfer type and a migration into this one.
 *
 * <p>Every field that is absent, {@code null}, or of the wrong JSON type is empty; wrong types and unknown keys
 * are reported here. A JSON {@code null} means "no value", exactly like leaving the key out.
 */
record CaseDocument(Optional<String> format, Optional<PatientPart> patient, Optional<ConditionPart> condition,
                    Map<Analyte, QuantityPart> labs, Map<Analyte, QuantityPart> baseline,
                    Optional<FindingsPart> findings, Optional<PlanPart> plan, Optional<String> assessedAt,
                    Optional<String> assessor, String extraJson) {

    record PatientPart(Optional<String> label, Optional<String> sex, Optional<BigDecimal> ageYears,
                       Optional<QuantityPart> height, Optional<QuantityPart> weight) {
    }

    record ConditionPart(Optional<String> paraprotein, Optional<String> leukemia, Optional<Boolean> monocytic,
                         Optional<String> cryoglobulin, Optional<String> therapyStarted) {
    }

    /** {@code {value, unit}} with its path, for messages; temperature only under serum viscosity. */
    record QuantityPart(String path, Optional<BigDecimal> value, Optional<String> unit,
                        Optional<QuantityPart> temperature) {
    }

    record FindingsPart(Optional<BigDecimal> pulmonaryGrade, Optional<BigDecimal> neurologicalGrade,
                        Optional<BigDecimal> otherOrganGrade, Optional<Boolean> mucosalBleeding,
                        Optional<Boolean> visualDisturbance, Optional<String> retinopathy,
                        Optional<Boolean> heartFailure, Optional<Boolean> arrhythmia, Optional<Boolean> seizure) {
    }

    record PlanPart(Optional<Boolean> rituximabPlanned, Optional<Boolean> transfusionPlanned) {
    }

    static final List<String> TOP_KEYS = List.of("format", "patient", "condition", "labs", "baseline", "findings",
            "plan", "assessedAt", "assessor", "extra");
    static final List<String> PATIENT_KEYS = List.of("label", "sex", "ageYears", "height", "weight");
    static final List<String> CONDITION_KEYS =
            List.of("paraprotein", "leukemia", "monocytic", "cryoglobulin", "therapyStarted");
    static final List<String> FINDINGS_KEYS = List.of("pulmonaryGrade", "neurologicalGrade", "otherOrganGrade",
            "mucosalBleeding", "visualDisturbance", "retinopathy", "heartFailure", "arrhythmia", "seizure");
    static final List<String> PLAN_KEYS = List.of("rituximabPlanned", "transfusionPlanned");
    private static final List<String> QUANTITY_KEYS = List.of("value", "unit");
    private static final List<String> VISCOSITY_KEYS = List.of("value", "unit", "temperature");


    static CaseDocument from(JsonNode root, Problems problems) {
        Shape s = new Shape(problems);
        Map<String, JsonNode> top = s.fields(root, "", TOP_KEYS);
        return new CaseDocument(
                s.text(top, "format", ""),
                s.object(top, "patient", "").map(n -> s.patient(n)),
                s.object(top, "condition", "").map(n -> s.condition(n)),
                s.labs(top, "labs"),
                s.labs(top, "baseline"),
                s.object(top, "findings", "").map(n -> s.findings(n)),
                s.object(top, "plan", "").map(n -> s.plan(n)),
                s.text(top, "assessedAt", ""),
                s.text(top, "assessor", ""),
                s.extra(top));
    }

    /** The type-checking walk; one instance per read. */
    private static final class Shape {
        private final Problems problems;

        Shape(Problems problems) {
            this.problems = problems;
        }

        PatientPart patient(JsonNode node) {
            Map<String, JsonNode> f = fields(node, "patient", PATIENT_KEYS);
            return new PatientPart(text(f, "label", "patient"), text(f, "sex", "patient"),
                    number(f, "ageYears", "patient"),
                    quantity(f, "height", "patient", QUANTITY_KEYS),
                    quantity(f, "weight", "patient", QUANTITY_KEYS));
        }

        ConditionPart condition(JsonNode node) {
            Map<String, JsonNode> f = fields(node, "condition", CONDITION_KEYS);
            return new ConditionPart(text(f, "paraprotein", "condition"), text(f, "leukemia", "condition"),
                    bool(f, "monocytic", "condition"), text(f, "cryoglobulin", "condition"),
                    text(f, "therapyStarted", "condition"));
        }

        FindingsPart findings(JsonNode node) {
            String p = "findings";
            Map<String, JsonNode> f = fields(node, p, FINDINGS_KEYS);
            return new FindingsPart(number(f, "pulmonaryGrade", p), number(f, "neurologicalGrade", p),
                    number(f, "otherOrganGrade", p), bool(f, "mucosalBleeding", p),
                    bool(f, "visualDisturbance", p), text(f, "retinopathy", p), bool(f, "heartFailure", p),
                    bool(f, "arrhythmia", p), bool(f, "seizure", p));
        }

        PlanPart plan(JsonNode node) {
            Map<String, JsonNode> f = fields(node, "plan", PLAN_KEYS);
            return new PlanPart(bool(f, "rituximabPlanned", "plan"), bool(f, "transfusionPlanned", "plan"));
        }

        Map<Analyte, QuantityPart> labs(Map<String, JsonNode> top, String section) {
            Map<Analyte, QuantityPart> result = new LinkedHashMap<>();
            Optional<JsonNode> node = object(top, section, "");
            if (node.isEmpty()) {
                return result;
            }
            List<String> known = Analyte.labs().stream().map(Analyte::key).toList();
            Map<String, JsonNode> f = fields(node.get(), section, known);
            for (Analyte analyte : Analyte.labs()) {
                List<String> keys = analyte == Analyte.SERUM_VISCOSITY ? VISCOSITY_KEYS : QUANTITY_KEYS;
                quantity(f, analyte.key(), section, keys).ifPresent(q -> result.put(analyte, q));
            }
            return result;
        }

        String extra(Map<String, JsonNode> top) {
            JsonNode node = top.get("extra");
            if (node == null || node.isNull()) {
                return "{}";
            }
            if (!node.isObject()) {
                wrongType("extra", "an object { ... } (kept as written)", node);
                return "{}";
            }
            return JsonText.compact(node);
        }

        /**
         * The members of an object, in file order, after reporting every key not in {@code known}.
         * Null members are dropped: null means absent.
         */
        Map<String, JsonNode> fields(JsonNode node, String path, List<String> known) {
            Map<String, JsonNode> result = new LinkedHashMap<>();
            Iterator<Map.Entry<String, JsonNode>> it = node.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                if (!known.contains(e.getKey())) {
                    problems.add(Problems.child(path, e.getKey()), unknownKey(e.getKey(), path, known));
                } else if (!e.getValue().isNull()) {
                    result.put(e.getKey(), e.getValue());
                }
            }
            return result;
        }

        Optional<JsonNode> object(Map<String, JsonNode> f, String key, String parent) {
            JsonNode n = f.get(key);
            if (n == null) {
                return Optional.empty();
            }
            if (!n.isObject()) {
                wrongType(Problems.child(parent, key), "an object { ... }", n);
                return Optional.empty();
            }
            return Optional.of(n);
        }

        Optional<String> text(Map<String, JsonNode> f, String key, String parent) {
            JsonNode n = f.get(key);
            if (n == null) {
                return Optional.empty();
            }
            if (!n.isTextual()) {
                wrongType(Problems.child(parent, key), "a text in double quotes", n);
                return Optional.empty();
            }
            return Optional.of(n.textValue());
        }

        Optional<Boolean> bool(Map<String, JsonNode> f, String key, String parent) {
            JsonNode n = f.get(key);
            if (n == null) {
                return Optional.empty();
            }
            if (!n.isBoolean()) {
                wrongType(Problems.child(parent, key), "true or false (or leave it out if not assessed)", n);
                return Optional.empty();
            }
            return Optional.of(n.booleanValue());
        }

        Optional<BigDecimal> number(Map<String, JsonNode> f, String key, String parent) {
            JsonNode n = f.get(key);
            if (n == null) {
                return Optional.empty();
            }
            if (n.isDouble()) {
                // NaN or Infinity, already reported with this path while parsing
                return Optional.empty();
            }
            if (!n.isNumber()) {
                wrongType(Problems.child(parent, key), "a number", n);
                return Optional.empty();
            }
            return Optional.of(n.decimalValue());
        }

        /** A {@code {value, unit}} object; empty when absent or when its shape is wrong (reported). */
        Optional<QuantityPart> quantity(Map<String, JsonNode> f, String key, String parent, List<String> keys) {
            JsonNode n = f.get(key);
            if (n == null) {
                return Optional.empty();
            }
            String path = Problems.child(parent, key);
            if (!n.isObject()) {
                wrongType(path, "{\"value\": number, \"unit\": \"UCUM code\"}", n);
                return Optional.empty();
            }
            boolean hadNaN = n.path("value").isDouble();
            int before = problems.count();
            Map<String, JsonNode> q = fields(n, path, keys);
            Optional<BigDecimal> value = number(q, "value", path);
            Optional<String> unit = text(q, "unit", path);
            Optional<QuantityPart> temperature = keys.contains("temperature")
                    ? quantity(q, "temperature", path, QUANTITY_KEYS)
                    : Optional.empty();
            if (hadNaN || problems.count() > before) {
                return Optional.empty();
            }
            return Optional.of(new QuantityPart(path, value, unit, temperature));
        }

        private void wrongType(String path, String expected, JsonNode found) {
            if (found.isDouble()) {
                // only NaN/Infinity become double nodes, and they were reported with this path while parsing
                return;
            }
            problems.add(path, "expected " + expected + ", found " + describe(found));
        }

        private static String describe(JsonNode n) {
            if (n.isTextual()) {
                String t = n.textValue();
                return "the text \"" + (t.length() > 40 ? t.substring(0, 40) + "…" : t) + "\"";
            }
            if (n.isBoolean()) {
                return n.asText();
            }
            if (n.isNumber()) {
                return "the number " + n.decimalValue().toString();
            }
            if (n.isArray()) {
                return "an array [ ... ]";
            }
            if (n.isObject()) {
                return "an object { ... }";
            }
            return n.getNodeType().toString().toLowerCase(java.util.Locale.ROOT);
        }

        private static String unknownKey(String key, String parent, List<String> known) {
            StringBuilder sb = new StringBuilder("unknown key \"").append(key).append('"');
            Optional<Analyte> body = Analyte.byKey(key).filter(Analyte::isBodyMeasure);
            if (body.isPresent() && !parent.equals("patient")) {
                return sb.append(" here; ").append(key).append(" belongs under patient").toString();
            }
            closest(key, known).ifPresent(c -> sb.append("; did you mean \"").append(c).append("\"?"));
            String where = parent.isEmpty() ? "at the top level" : "in " + parent;
            sb.append(" Keys allowed ").append(where).append(": ").append(String.join(", ", known));
            if (parent.isEmpty()) {
                sb.append(" (free-form data goes under \"extra\")");
            }
            return sb.toString();
        }

        /** The known key nearest in spelling (case-insensitive edit distance ≤ 2), if any. */
        private static Optional<String> closest(String key, List<String> known) {
            String best = null;
            int bestDistance = 3;
            for (String k : known) {
                int d = editDistance(key.toLowerCase(java.util.Locale.ROOT), k.toLowerCase(java.util.Locale.ROOT));
                if (d < bestDistance) {
                    bestDistance = d;
                    best = k;
                }
            }
            return Optional.ofNullable(best);
        }

        private static int editDistance(String a, String b) {
            int[] previous = new int[b.length() + 1];
            int[] current = new int[b.length() + 1];
            for (int j = 0; j <= b.length(); j++) {
                previous[j] = j;
            }
            for (int i = 1; i <= a.length(); i++) {
                current[0] = i;
                for (int j = 1; j <= b.length(); j++) {
                    int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                    current[j] = Math.min(Math.min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
                }
                int[] swap = previous;
                previous = current;
                current = swap;
            }
            return previous[b.length()];
        }
    }
}
