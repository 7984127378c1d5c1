package org.stasissheet.rules;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.stasissheet.intake.Enums;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.YamlTree.Mapping;
import org.stasissheet.rules.YamlTree.Node;
import org.stasissheet.rules.YamlTree.Scalar;
import org.stasissheet.rules.YamlTree.Sequence;
import org.stasissheet.rules.YamlTree.Where;

/**
 * Validates and loads a rule set from its files, all or nothing. Pure: it is handed the bytes of every file by
 * relative path (the {@code files} adapter reads a folder or the shipped copy) and the shipped set's SHA-256.
 *
 * <p>The schema and the condition vocabulary are documented at the top of the shipped {@code manifest.yaml}.
 */
public final class RuleSetLoader {
    public static final String MANIFEST = "manifest.yaml";
    public static final String FORMAT = "stasis-rules/1";
    /** Most rules in one set; the shipped set has under a hundred. Beyond it the set is refused. */
    public static final int MAX_RULES = 2_000;
    /** Most parameters in one set; the shipped set has under a hundred. Beyond it the set is refused. */
    public static final int MAX_PARAMETERS = 2_000;
    /** Most files in one rule folder, the manifest included. */
    public static final int MAX_FILES = 50;
    /** Most problems listed for one set; the rest are counted in a last line ("... and N more"). */
    public static final int MAX_PROBLEMS = 100;
    /** Largest rule file, in bytes (1 MiB); the folder reader stops reading one byte past it. */
    public static final int MAX_FILE_BYTES = YamlTree.MAX_BYTES;

    private static final Set<String> MANIFEST_KEYS = Set.of("format", "name", "version", "description", "files");
    private static final Set<String> FILE_KEYS = Set.of("parameters", "rules");
    private static final Set<String> PARAMETER_KEYS =
            Set.of("id", "value", "unit", "what", "source", "basis", "note", "equivalents");
    private static final Set<String> EQUIVALENT_KEYS = Set.of("value", "unit");
    private static final Set<String> RULE_KEYS =
            Set.of("id", "topic", "level", "when", "title", "explanation", "source", "basis", "note");
    private static final Pattern LITERAL =
            Pattern.compile("(-?[0-9]+(?:\\.[0-9]+)?(?:[eE][-+]?[0-9]+)?)(?:\\s+(\\S+))?");
    /** A published figure in another unit may differ from the main one by rounding, not by more than this. */
    private static final double EQUIVALENT_TOLERANCE = 0.02;

    private RuleSetLoader() {
    }

    /**
     * @param files          every file of the set by relative path with '/' separators, including the manifest
     * @param shippedSha256  the shipped set's hash, to decide {@link Provenance#local()}; empty when unknown
     *                       (then the set counts as local)
     */
    public static LoadResult load(Map<String, byte[]> files, Optional<String> shippedSha256) {
        Objects.requireNonNull(files, "files");
        Objects.requireNonNull(shippedSha256, "shippedSha256");
        return new Run(new YamlSource(files)).load(shippedSha256);
    }

    /**
     * SHA-256 over the set: for each file in order of its relative path, the path in UTF-8, a zero byte, the
     * length as 8 bytes big-endian, then the bytes. Lower-case hex.
     */
    public static String sha256(Map<String, byte[]> files) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            for (Map.Entry<String, byte[]> e : new TreeMap<>(files).entrySet()) {
                md.update(e.getKey().getBytes(StandardCharsets.UTF_8));
                md.update((byte) 0);
                long n = e.getValue().length;
                for (int shift = 56; shift >= 0; shift -= 8) {
                    md.update((byte) (n >>> shift));
                }
                md.update(e.getValue());
            }
            return HexFormat.of().formatHex(md.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }

    /** The format word of the compact form, the first key of every compact file. */
    public static final String COMPACT_FORMAT = "stasis-rules-compact/1";

    /**
     * The set in compact form: its SHA-256 and every file's tree as plain JSON ({@code files/}), which a cold run
     * reads several times faster than the YAML it came from. Only a set that loads whole is compacted, so the build
     * that makes the shipped compact form refuses a broken shipped set.
     *
     * @throws IllegalArgumentException naming every problem, when the set is refused
     */
    public static byte[] compact(Map<String, byte[]> files) {
        LoadResult result = load(files, Optional.empty());
        if (result instanceof LoadResult.Refused refused) {
            StringBuilder why = new StringBuilder("the rule set is refused, so it is not compacted:");
            refused.problems().forEach(p -> why.append("\n  ").append(p));
            throw new IllegalArgumentException(why.toString());
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (JsonGenerator g = JSON.createGenerator(out, JsonEncoding.UTF8)) {
            g.writeStartObject();
            g.writeStringField("format", COMPACT_FORMAT);
            g.writeStringField("sha256", sha256(files));
            g.writeObjectFieldStart("files");
            for (Map.Entry<String, byte[]> e : new TreeMap<>(files).entrySet()) {
                g.writeFieldName(e.getKey());
                YamlTree.writeJson(YamlTree.parse(e.getValue()), g);
            }
            g.writeEndObject();
            g.writeEndObject();
        } catch (IOException | YamlTree.Malformed e) {
            throw new IllegalStateException("a set that loaded could not be written again: " + e.getMessage(), e);
        }
        out.write('\n');
        return out.toByteArray();
    }

    /**
     * Loads a set from its compact form through the same checks as {@link #load}; it counts as the shipped set
     * (not local), since only the build writes this form. A damaged compact form is refused, never half read.
     */
    public static LoadResult loadCompact(byte[] compact) {
        Objects.requireNonNull(compact, "compact");
        CompactSource source;
        try {
            source = CompactSource.read(compact);
        } catch (IOException | YamlTree.Malformed | IllegalArgumentException e) {
            return new LoadResult.Refused(List.of(new RuleProblem(COMPACT_FORMAT, 0, 0,
                    "the compact form of the shipped rule set cannot be read (" + e.getMessage()
                            + "); rebuild the program")));
        }
        return new Run(source).load(Optional.of(source.sha256()));
    }

    /** The SHA-256 a compact form records for the YAML files it was made from, read without loading the set. */
    public static String compactSha256(byte[] compact) {
        try (JsonParser p = JSON.createParser(compact)) {
            return CompactSource.header(p);
        } catch (IOException e) {
            throw new IllegalArgumentException("the compact rule set cannot be read: " + e.getMessage(), e);
        }
    }

    private static final JsonFactory JSON = new JsonFactory();

    /** The files of a set as a load sees them: their names, each one's tree, and the set's hash. */
    private interface Source {
        Set<String> names();

        Node tree(String path) throws YamlTree.Malformed;

        String sha256();
    }

    /** YAML files as written, parsed when the load asks for them. */
    private record YamlSource(Map<String, byte[]> files) implements Source {
        YamlSource {
            files = new TreeMap<>(files);
        }

        @Override
        public Set<String> names() {
            return files.keySet();
        }

        @Override
        public Node tree(String path) throws YamlTree.Malformed {
            return YamlTree.parse(files.get(path));
        }

        @Override
        public String sha256() {
            return RuleSetLoader.sha256(files);
        }
    }

    /** The trees of a compact form, already read, with the hash of the YAML they came from. */
    private record CompactSource(Map<String, Node> trees, String sha256) implements Source {
        static CompactSource read(byte[] compact) throws IOException, YamlTree.Malformed {
            try (JsonParser p = JSON.createParser(compact)) {
                String sha = header(p);
                if (p.nextToken() != JsonToken.FIELD_NAME || !"files".equals(p.currentName())
                        || p.nextToken() != JsonToken.START_OBJECT) {
                    throw new IllegalArgumentException("no \"files\" after the hash");
                }
                Map<String, Node> trees = new TreeMap<>();
                for (JsonToken t = p.nextToken(); t == JsonToken.FIELD_NAME; t = p.nextToken()) {
                    String name = p.currentName();
                    p.nextToken();
                    trees.put(name, YamlTree.readJson(p));
                }
                if (trees.isEmpty()) {
                    throw new IllegalArgumentException("no files");
                }
                return new CompactSource(trees, sha);
            }
        }

        /** Reads {@code {"format": ..., "sha256": ...}} from the start; returns the hash. */
        static String header(JsonParser p) throws IOException {
            if (p.nextToken() != JsonToken.START_OBJECT
                    || !"format".equals(p.nextFieldName()) || !COMPACT_FORMAT.equals(p.nextTextValue())
                    || !"sha256".equals(p.nextFieldName())) {
                throw new IllegalArgumentException("not " + COMPACT_FORMAT);
            }
            String sha = p.nextTextValue();
            if (sha == null || !sha.matches("[0-9a-f]{64}")) {
                throw new IllegalArgumentException("no SHA-256");
            }
            return sha;
        }

        @Override
        public Set<String> names() {
            return trees.keySet();
        }

        @Override
        public Node tree(String path) {
            return trees.get(path);
        }
    }

    /** One load: collects every problem, then builds the set only if there are none. */
    private static final class Run {
        private final Source files;
        private final List<RuleProblem> problems = new ArrayList<>();
        private final Map<String, Parameter> parameters = new LinkedHashMap<>();
        private final Map<String, String> parameterFile = new HashMap<>();
        private final Map<String, Where> parameterWhere = new HashMap<>();
        private final Map<String, String> firstSeen = new HashMap<>();
        private final Set<String> declaredParameters = new java.util.HashSet<>();
        private int invalidReferences;
        private int unlisted;
        private final List<Rule> rules = new ArrayList<>();
        private final List<PendingRule> pending = new ArrayList<>();
        private String file = MANIFEST;

        Run(Source files) {
            this.files = files;
        }

        private record PendingRule(String file, Mapping node) {
        }

        LoadResult load(Optional<String> shippedSha256) {
            if (files.names().size() > MAX_FILES) {
                problem(0, 0, "the rule folder holds " + files.names().size() + " YAML files; a rule set may have at most "
                        + MAX_FILES);
                return refused();
            }
            if (!files.names().contains(MANIFEST)) {
                problem(0, 0, "the rule set has no " + MANIFEST);
                return refused();
            }
            Optional<Mapping> manifest = parse(MANIFEST);
            if (manifest.isEmpty()) {
                return refused();
            }
            Mapping m = manifest.get();
            file = MANIFEST;
            keys(m, MANIFEST_KEYS);
            String format = text(m, "format", true);
            if (!format.isEmpty() && !format.equals(FORMAT)) {
                problem(m.keyWhere().get("format"), "format must be " + FORMAT + ", was \"" + format + "\"");
            }
            String name = text(m, "name", true);
            String version = text(m, "version", true);
            String description = text(m, "description", false);
            List<String> listed = listedFiles(m);

            for (String path : files.names()) {
                if (!path.equals(MANIFEST) && !listed.contains(path)) {
                    file = path;
                    problem(0, 0, "this file is not listed under \"files\" in " + MANIFEST
                            + ": list it, or remove it from the folder");
                }
            }
            Map<String, Mapping> parsed = new LinkedHashMap<>();
            for (String path : listed) {
                parse(path).ifPresent(node -> parsed.put(path, node));
            }
            if (parsed.size() < listed.size()) {
                // a file that cannot be parsed hides its parameters: checking the rest would only echo that
                return refused();
            }
            parsed.forEach(this::readRuleFile);
            if (pending.size() > MAX_RULES || declaredParameters.size() > MAX_PARAMETERS) {
                file = MANIFEST;
                problem(0, 0, "the set has " + pending.size() + " rules and " + declaredParameters.size()
                        + " parameters; at most " + MAX_RULES + " rules and " + MAX_PARAMETERS + " parameters are read");
                return refused();
            }
            file = MANIFEST;
            checkRequired(m);
            for (PendingRule p : pending) {
                file = p.file();
                readRule(p.node());
            }
            if (!problems.isEmpty()) {
                return refused();
            }
            String sha = files.sha256();
            boolean local = shippedSha256.map(s -> !s.equalsIgnoreCase(sha)).orElse(true);
            return new LoadResult.Loaded(new RuleSet(new Provenance(name, version, sha, local), description,
                    parameters, rules));
        }

        private List<String> listedFiles(Mapping m) {
            List<String> listed = new ArrayList<>();
            Node node = m.entries().get("files");
            if (node == null) {
                problem(m.where(), "missing key \"files\" (the list of rule files in this set)");
                return listed;
            }
            if (!(node instanceof Sequence seq)) {
                problem(node.where(), "\"files\" must be a list of relative paths");
                return listed;
            }
            for (Node item : seq.items()) {
                if (!(item instanceof Scalar s) || s.isNull() || s.text().isBlank()) {
                    problem(item.where(), "each entry of \"files\" must be a relative path");
                    continue;
                }
                String path = s.text().trim();
                if (path.startsWith("/") || path.contains("..") || path.contains("\\")) {
                    problem(item.where(), "\"" + path + "\" must be a relative path inside the rule folder, with /");
                } else if (path.equals(MANIFEST)) {
                    problem(item.where(), "the manifest does not list itself");
                } else if (listed.contains(path)) {
                    problem(item.where(), "\"" + path + "\" is listed twice");
                } else if (!files.names().contains(path)) {
                    problem(item.where(), "listed file \"" + path + "\" does not exist in the rule folder");
                } else {
                    listed.add(path);
                }
            }
            return listed;
        }

        private Optional<Mapping> parse(String path) {
            file = path;
            try {
                Node node = files.tree(path);
                if (node instanceof Mapping mapping) {
                    return Optional.of(mapping);
                }
                problem(node.where(), "the file must be a mapping of keys to values");
            } catch (YamlTree.Malformed e) {
                problem(e.where, e.getMessage());
            }
            return Optional.empty();
        }

        private void readRuleFile(String path, Mapping m) {
            file = path;
            keys(m, FILE_KEYS);
            for (Mapping entry : entries(m, "parameters")) {
                readParameter(entry);
            }
            for (Mapping entry : entries(m, "rules")) {
                pending.add(new PendingRule(path, entry));
            }
        }

        private List<Mapping> entries(Mapping m, String key) {
            Node node = m.entries().get(key);
            List<Mapping> out = new ArrayList<>();
            if (node == null || (node instanceof Scalar s && s.isNull())) {
                return out;
            }
            if (!(node instanceof Sequence seq)) {
                problem(node.where(), "\"" + key + "\" must be a list");
                return out;
            }
            for (Node item : seq.items()) {
                if (item instanceof Mapping entry) {
                    out.add(entry);
                } else {
                    problem(item.where(), "each entry of \"" + key + "\" must be a mapping");
                }
            }
            return out;
        }

        private void readParameter(Mapping m) {
            keys(m, PARAMETER_KEYS);
            String id = text(m, "id", true);
            Optional<Quantity> value = quantity(m);
            String source = text(m, "source", true);
            Optional<Basis> basis = basis(m);
            String note = text(m, "note", false);
            String what = text(m, "what", false);
            List<Quantity> equivalents = new ArrayList<>();
            Node eq = m.entries().get("equivalents");
            if (eq != null) {
                if (eq instanceof Sequence seq) {
                    for (Node item : seq.items()) {
                        if (item instanceof Mapping em) {
                            keys(em, EQUIVALENT_KEYS);
                            quantity(em).ifPresent(equivalents::add);
                        } else {
                            problem(item.where(), "each equivalent must be a mapping with value and unit");
                        }
                    }
                } else {
                    problem(eq.where(), "\"equivalents\" must be a list");
                }
            }
            if (id.isEmpty() || !unique(id, m)) {
                return;
            }
            declaredParameters.add(id);
            if (value.isPresent() && !source.isEmpty() && basis.isPresent()) {
                parameters.put(id, new Parameter(id, value.get(), source, basis.get(), note, what, equivalents));
                parameterFile.put(id, file);
                parameterWhere.put(id, m.keyWhere().getOrDefault("unit", m.where()));
            }
        }

        private Optional<Quantity> quantity(Mapping m) {
            String valueText = text(m, "value", true);
            String unit = text(m, "unit", true);
            if (valueText.isEmpty() || unit.isEmpty()) {
                return Optional.empty();
            }
            double value;
            try {
                value = Double.parseDouble(valueText);
            } catch (NumberFormatException e) {
                problem(m.entries().get("value").where(), "value \"" + valueText + "\" is not a number");
                return Optional.empty();
            }
            if (!Double.isFinite(value)) {
                problem(m.entries().get("value").where(), "value must be a finite number");
                return Optional.empty();
            }
            if (!knownUnit(unit)) {
                problem(m.entries().get("unit").where(), "unknown unit \"" + unit + "\" (UCUM codes such as "
                        + "g/L, g/dL, 10*9/L, mmol/L, umol/L, mg/dL, cP, mm[Hg], %, 1, fL, L, d, a)");
                return Optional.empty();
            }
            return Optional.of(new Quantity(value, unit));
        }

        private static boolean knownUnit(String unit) {
            return Dimension.of(unit).isPresent()
                    || Analyte.labs().stream().anyMatch(a -> a.unitOption(unit).isPresent());
        }

        private void checkRequired(Mapping manifest) {
            Where at = manifest.keyWhere().getOrDefault("files", manifest.where());
            for (RequiredParameters.Required req : RequiredParameters.ALL) {
                Parameter p = parameters.get(req.id());
                if (p == null) {
                    if (!firstSeen.containsKey(req.id())) {
                        file = MANIFEST;
                        problem(at, "required parameter \"" + req.id() + "\" is missing from every listed file");
                    }
                    continue;
                }
                file = parameterFile.get(req.id());
                Where where = parameterWhere.get(req.id());
                for (Quantity q : allFigures(p)) {
                    if (!req.accepts(q.unit())) {
                        problem(where, "parameter \"" + req.id() + "\" is in " + q.unit()
                                + ", which is the wrong kind of unit: expected " + req.expected());
                    }
                }
                req.analyte().ifPresent(a -> checkEquivalents(p, a, where));
                if (allFigures(p).stream().allMatch(q -> req.accepts(q.unit()))) {
                    checkAllowed(req, p, where);
                }
            }
            checkOrder();
        }

        /** A value the estimates cannot use (a hematocrit of 0 or 1, a zero volume) is refused here, not at use. */
        private void checkAllowed(RequiredParameters.Required req, Parameter p, Where where) {
            double v = req.valueIn(p);
            if (!req.allowed().contains(v)) {
                problem(where, "parameter \"" + req.id() + "\" is " + p.value() + "; it must be "
                        + req.allowed().describe());
            }
        }

        private void checkOrder() {
            Map<String, RequiredParameters.Required> byId = new HashMap<>();
            RequiredParameters.ALL.forEach(r -> byId.put(r.id(), r));
            for (RequiredParameters.Ordered o : RequiredParameters.ORDERED) {
                Parameter lower = parameters.get(o.lower());
                Parameter upper = parameters.get(o.upper());
                RequiredParameters.Required lowerReq = byId.get(o.lower());
                RequiredParameters.Required upperReq = byId.get(o.upper());
                if (lower == null || upper == null || !lowerReq.accepts(lower.value().unit())
                        || !upperReq.accepts(upper.value().unit())) {
                    continue;
                }
                if (lowerReq.valueIn(lower) > upperReq.valueIn(upper)) {
                    file = parameterFile.get(o.lower());
                    problem(parameterWhere.get(o.lower()), "parameter \"" + o.lower() + "\" (" + lower.value()
                            + ") must not be larger than \"" + o.upper() + "\" (" + upper.value() + ")");
                }
            }
        }

        private static List<Quantity> allFigures(Parameter p) {
            List<Quantity> all = new ArrayList<>();
            all.add(p.value());
            all.addAll(p.equivalents());
            return all;
        }

        private void checkEquivalents(Parameter p, Analyte a, Where where) {
            if (allFigures(p).stream().anyMatch(q -> a.unitOption(q.unit()).isEmpty())) {
                return;
            }
            double main = Threshold.of(p).canonical(a);
            for (Quantity q : p.equivalents()) {
                double other = q.value() * a.unitOption(q.unit()).orElseThrow().toCanonical();
                if (Math.abs(other - main) > EQUIVALENT_TOLERANCE * Math.abs(main)) {
                    problem(where, "parameter \"" + p.id() + "\": equivalent " + q + " is not the same amount as "
                            + p.value() + " (differs by more than rounding)");
                }
            }
        }

        private void readRule(Mapping m) {
            int before = problems.size() + unlisted;
            int referencesBefore = invalidReferences;
            if (!buildRule(m) && problems.size() + unlisted == before && invalidReferences == referencesBefore) {
                // never drop a rule silently: a set without it would be a partial set
                problem(m.where(), "this rule could not be read");
            }
        }

        private boolean buildRule(Mapping m) {
            keys(m, RULE_KEYS);
            String id = text(m, "id", true);
            String topic = text(m, "topic", true);
            Optional<Level> level = Optional.empty();
            String levelText = text(m, "level", true);
            if (!levelText.isEmpty()) {
                level = Enums.parse(Level.class, levelText);
                if (level.isEmpty()) {
                    problem(m.entries().get("level").where(), "level \"" + levelText + "\" is not one of "
                            + Enums.allowed(Level.class));
                }
            }
            String title = text(m, "title", true);
            String explanation = text(m, "explanation", true);
            String source = text(m, "source", true);
            Optional<Basis> basis = basis(m);
            String note = text(m, "note", false);
            Optional<Condition> when = Optional.empty();
            Node whenNode = m.entries().get("when");
            if (whenNode == null) {
                problem(m.where(), "missing key \"when\" (the rule's condition)");
            } else {
                when = condition(whenNode);
            }
            if (id.isEmpty() || !unique(id, m)) {
                return false;
            }
            if (level.isPresent() && when.isPresent() && !topic.isEmpty() && !title.isEmpty()
                    && !explanation.isEmpty() && !source.isEmpty() && basis.isPresent()) {
                rules.add(new Rule(id, topic, level.get(), when.get(), title, explanation, source, basis.get(), note));
                return true;
            }
            return false;
        }

        private boolean unique(String id, Mapping m) {
            String here = file + ":" + m.keyWhere().get("id").line();
            String before = firstSeen.putIfAbsent(id, here);
            if (before != null) {
                problem(m.keyWhere().get("id"), "duplicate id \"" + id + "\" (first defined at " + before + ")");
                return false;
            }
            return true;
        }

        private Optional<Condition> condition(Node node) {
            if (!(node instanceof Mapping m)) {
                problem(node.where(), "a condition must be a mapping (all, any, not, present, absent, or field"
                        + " with atLeast/above/atMost/below/is)");
                return Optional.empty();
            }
            Set<String> k = m.entries().keySet();
            if (k.size() == 1 && (k.contains("all") || k.contains("any"))) {
                String key = k.iterator().next();
                Node list = m.entries().get(key);
                if (!(list instanceof Sequence seq) || seq.items().isEmpty()) {
                    problem(list.where(), "\"" + key + "\" needs a non-empty list of conditions");
                    return Optional.empty();
                }
                List<Condition> parts = new ArrayList<>();
                boolean ok = true;
                for (Node item : seq.items()) {
                    Optional<Condition> c = condition(item);
                    ok &= c.isPresent();
                    c.ifPresent(parts::add);
                }
                if (!ok) {
                    return Optional.empty();
                }
                return Optional.of(key.equals("all") ? new Condition.All(parts) : new Condition.Any(parts));
            }
            if (k.size() == 1 && k.contains("not")) {
                return condition(m.entries().get("not")).map(Condition.Not::new);
            }
            if (k.size() == 1 && (k.contains("present") || k.contains("absent"))) {
                String key = k.iterator().next();
                Node f = m.entries().get(key);
                return field(f).map(name -> key.equals("present")
                        ? new Condition.Present(name) : new Condition.Absent(name));
            }
            if (k.contains("field")) {
                Set<String> ops = new LinkedHashSet<>(k);
                ops.remove("field");
                if (ops.size() != 1) {
                    problem(m.where(), "a field test needs exactly one of atLeast, above, atMost, below, is;"
                            + " found " + (ops.isEmpty() ? "none" : String.join(", ", ops)));
                    return Optional.empty();
                }
                String op = ops.iterator().next();
                Optional<String> name = field(m.entries().get("field"));
                if (name.isEmpty()) {
                    return Optional.empty();
                }
                Fields.Kind kind = Fields.kind(name.get()).orElseThrow();
                Node arg = m.entries().get(op);
                if (op.equals("is")) {
                    return is(name.get(), kind, arg);
                }
                Optional<Threshold.Comparison> cmp = Threshold.Comparison.byKey(op);
                if (cmp.isEmpty()) {
                    problem(m.keyWhere().get(op), "unknown key \"" + op + "\" in a field test (allowed: field,"
                            + " atLeast, above, atMost, below, is)");
                    return Optional.empty();
                }
                return threshold(name.get(), kind, arg).map(t -> new Condition.Compare(name.get(), cmp.get(), t));
            }
            String first = k.isEmpty() ? "" : k.iterator().next();
            Where at = k.isEmpty() ? m.where() : m.keyWhere().get(first);
            problem(at, "unknown condition " + (k.isEmpty() ? "{}" : "\"" + String.join(", ", k) + "\"")
                    + " (allowed: all, any, not, present, absent, or field with atLeast/above/atMost/below/is)");
            return Optional.empty();
        }

        private Optional<String> field(Node node) {
            if (!(node instanceof Scalar s) || s.isNull()) {
                problem(node.where(), "a field name is needed here");
                return Optional.empty();
            }
            String name = s.text().trim();
            if (Fields.kind(name).isEmpty()) {
                problem(s.where(), "unknown field \"" + name + "\" (see the field list in " + MANIFEST + ")");
                return Optional.empty();
            }
            return Optional.of(name);
        }

        private Optional<Condition> is(String field, Fields.Kind kind, Node arg) {
            List<Scalar> words = new ArrayList<>();
            if (arg instanceof Scalar s && !s.isNull()) {
                words.add(s);
            } else if (arg instanceof Sequence seq && !seq.items().isEmpty()) {
                for (Node item : seq.items()) {
                    if (item instanceof Scalar s && !s.isNull()) {
                        words.add(s);
                    } else {
                        problem(item.where(), "\"is\" takes a word or a list of words");
                        return Optional.empty();
                    }
                }
            } else {
                problem(arg.where(), "\"is\" takes a word or a list of words");
                return Optional.empty();
            }
            List<String> allowed;
            if (kind instanceof Fields.Word w) {
                allowed = w.words();
            } else if (kind instanceof Fields.Bool) {
                allowed = List.of("true", "false");
            } else {
                problem(arg.where(), "field \"" + field + "\" is " + kind.describe()
                        + "; \"is\" applies to word and true/false fields only");
                return Optional.empty();
            }
            Set<String> set = new LinkedHashSet<>();
            boolean ok = true;
            for (Scalar s : words) {
                if (!allowed.contains(s.text())) {
                    problem(s.where(), "\"" + s.text() + "\" is not a value of " + field + " (allowed: "
                            + String.join(" | ", allowed) + ")");
                    ok = false;
                }
                set.add(s.text());
            }
            return ok ? Optional.of(new Condition.Is(field, set)) : Optional.empty();
        }

        private Optional<Threshold> threshold(String field, Fields.Kind kind, Node arg) {
            if (!(arg instanceof Scalar s) || s.isNull()) {
                problem(arg.where(), "a comparison takes a number with its unit (\"100 10*9/L\") or a parameter id");
                return Optional.empty();
            }
            String text = s.text().trim();
            Matcher lit = LITERAL.matcher(text);
            Threshold t;
            if (lit.matches()) {
                String unit = lit.group(2);
                if (unit == null) {
                    if (kind instanceof Fields.Number n) {
                        unit = n.unit();
                    } else {
                        problem(s.where(), "\"" + text + "\" needs a unit for field " + field);
                        return Optional.empty();
                    }
                }
                double number = Double.parseDouble(lit.group(1));
                if (!Double.isFinite(number)) {
                    // 1e999 matches the number pattern but no double holds it
                    problem(s.where(), "\"" + text + "\" is too large a number for a comparison");
                    return Optional.empty();
                }
                t = Threshold.literal(new Quantity(number, unit));
            } else {
                Parameter p = parameters.get(text);
                if (p == null) {
                    if (!declaredParameters.contains(text)) {
                        problem(s.where(), "unknown parameter \"" + text + "\"");
                    } else {
                        invalidReferences++; // declared but itself invalid: already reported at its entry
                    }
                    return Optional.empty();
                }
                t = Threshold.of(p);
            }
            if (kind instanceof Fields.Amount a) {
                for (Quantity q : t.figures()) {
                    if (a.analyte().unitOption(q.unit()).isEmpty()) {
                        problem(s.where(), "unit " + q.unit() + (t.parameterId().map(id -> " of parameter \"" + id
                                + "\"").orElse("")) + " has the wrong dimension for " + field + ": expected one of "
                                + String.join(", ", a.analyte().units().stream().map(u -> u.ucum()).toList()));
                        return Optional.empty();
                    }
                }
            } else if (kind instanceof Fields.Number n) {
                for (Quantity q : t.figures()) {
                    if (!n.dimension().accepts(q.unit())) {
                        problem(s.where(), "unit " + q.unit() + " has the wrong dimension for " + field
                                + ": expected " + n.dimension().allowed());
                        return Optional.empty();
                    }
                }
            } else {
                problem(s.where(), "field \"" + field + "\" is " + kind.describe() + "; it cannot be compared"
                        + " with a number (use \"is\", \"present\" or \"absent\")");
                return Optional.empty();
            }
            return Optional.of(t);
        }

        private Optional<Basis> basis(Mapping m) {
            String text = text(m, "basis", true);
            if (text.isEmpty()) {
                return Optional.empty();
            }
            Optional<Basis> b = Enums.parse(Basis.class, text);
            if (b.isEmpty()) {
                problem(m.entries().get("basis").where(), "basis \"" + text + "\" is not one of "
                        + Enums.allowed(Basis.class));
            }
            return b;
        }

        /** A scalar's text; a required key that is missing, empty or not a scalar is a problem (and gives ""). */
        private String text(Mapping m, String key, boolean required) {
            Node node = m.entries().get(key);
            if (node == null) {
                if (required) {
                    problem(m.where(), "missing key \"" + key + "\"");
                }
                return "";
            }
            if (!(node instanceof Scalar s)) {
                problem(node.where(), "\"" + key + "\" must be a single value");
                return "";
            }
            String text = s.isNull() ? "" : s.text().trim();
            if (required && text.isEmpty()) {
                problem(node.where(), "\"" + key + "\" must not be empty");
            }
            return text;
        }

        private void keys(Mapping m, Set<String> allowed) {
            m.keyWhere().forEach((key, where) -> {
                if (!allowed.contains(key)) {
                    problem(where, "unknown key \"" + key + "\" (allowed: "
                            + String.join(", ", allowed.stream().sorted().toList()) + ")");
                }
            });
        }

        private void problem(Where where, String message) {
            problem(where.line(), where.column(), message);
        }

        private void problem(int line, int column, String message) {
            if (problems.size() < MAX_PROBLEMS) {
                problems.add(new RuleProblem(file, line, column, abbreviated(message)));
            } else {
                unlisted++;
            }
        }

        private LoadResult refused() {
            List<RuleProblem> all = new ArrayList<>(problems);
            if (unlisted > 0) {
                all.add(new RuleProblem("(rule set)", 0, 0, "… and " + unlisted + " more problems not listed"));
            }
            return new LoadResult.Refused(all);
        }
    }

    /** Longest piece of a file quoted whole in a message; a value may be thousands of characters long. */
    private static final int QUOTE_CHARS = 60;
    private static final Pattern LONG_QUOTED = Pattern.compile("\"([^\"]{" + (QUOTE_CHARS + 1) + ",})\"");
    private static final Pattern LONG_WORD = Pattern.compile("[^\\s\"]{" + (QUOTE_CHARS + 1) + ",}");

    /** A message quotes what the file says, but never pages of it: long pieces keep their start and length. */
    static String abbreviated(String message) {
        String shorter = replaceAll(LONG_QUOTED, message, m -> "\"" + shorten(m.group(1)) + "\"");
        return replaceAll(LONG_WORD, shorter, m -> shorten(m.group()));
    }

    private static String shorten(String piece) {
        return piece.substring(0, 40) + "… (" + piece.length() + " characters)";
    }

    private static String replaceAll(Pattern p, String text, java.util.function.Function<Matcher, String> with) {
        Matcher m = p.matcher(text);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            m.appendReplacement(out, Matcher.quoteReplacement(with.apply(m)));
        }
        m.appendTail(out);
        return out.toString();
    }
}
