package org.stasissheet.labs;

import java.text.Normalizer;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.stasissheet.measure.Analyte;

/**
 * The one alias table: every name a laboratory print-out or result screen uses for an analyte of the worksheet,
 * in English and in common European spellings, and the look-alike names that must never land on one.
 *
 * <p>A label matches only as a whole (after case, accents, a specimen prefix such as {@code P-} or {@code S-} and
 * a specimen word in brackets are set aside), never by its first letters: "Hb A1c" is not hemoglobin, "Protein C"
 * is not total protein. Basis of the names: common practice (report print-outs in these languages).
 */
public final class Labels {
    private Labels() {
    }

    /** The names per analyte, written naturally; matching uses {@link #normalize}. */
    static final Map<Analyte, List<String>> ALIASES = aliases();

    private static Map<Analyte, List<String>> aliases() {
        Map<Analyte, List<String>> m = new EnumMap<>(Analyte.class);
        m.put(Analyte.SERUM_VISCOSITY, List.of("serum viscosity", "viscosity", "viscosity serum", "visc",
                "serum visc", "Viskosität", "Serumviskosität", "viscosité", "viscosité sérique", "viscosidad",
                "viscosidad sérica", "viscosità", "viscositeit", "viskositet"));
        m.put(Analyte.IGM, List.of("IgM", "Ig M", "immunoglobulin M", "immunoglobuline M", "Immunglobulin M",
                "inmunoglobulina M", "immunoglobulina M"));
        m.put(Analyte.IGG, List.of("IgG", "Ig G", "immunoglobulin G", "immunoglobuline G", "Immunglobulin G",
                "inmunoglobulina G", "immunoglobulina G"));
        m.put(Analyte.IGA, List.of("IgA", "Ig A", "immunoglobulin A", "immunoglobuline A", "Immunglobulin A",
                "inmunoglobulina A", "immunoglobulina A"));
        m.put(Analyte.TOTAL_PROTEIN, List.of("total protein", "protein total", "protein, total", "TP", "Gesamteiweiß",
                "Gesamtprotein", "Eiweiß gesamt", "protéines totales", "protides totaux", "proteínas totales",
                "proteine totali", "totaal eiwit", "totalprotein"));
        m.put(Analyte.WBC, List.of("WBC", "WCC", "white cell count", "white blood cells", "white blood cell count",
                "white count", "leukocytes", "leucocytes", "leukocyte count", "leucocyte count", "leuko", "leuco",
                "Leukozyten", "leucocitos", "leucociti", "leukocyten", "leukocyter", "globules blancs", "TLC"));
        m.put(Analyte.BLASTS, List.of("blasts", "blast", "blast cells", "% blasts", "blasts %", "circulating blasts",
                "Blasten", "blastes", "blastos", "blasti", "blastcellen"));
        m.put(Analyte.HEMATOCRIT, List.of("Hct", "hematocrit", "haematocrit", "Hkt", "Hämatokrit", "Haematokrit", "hématocrite",
                "hematocrito", "ematocrito", "hematocriet", "PCV", "packed cell volume", "EVF"));
        m.put(Analyte.HEMOGLOBIN, List.of("Hb", "Hgb", "hemoglobin", "haemoglobin", "Hämoglobin", "hémoglobine",
                "hemoglobina", "emoglobina", "hemoglobine", "Hb total"));
        m.put(Analyte.PLATELETS, List.of("Plt", "Plts", "platelets", "platelet count", "thrombocytes", "Thrombozyten",
                "Thrombo", "Thr", "plaquettes", "plaquetas", "piastrine", "trombocyten", "trombocyter",
                "trombocitos", "PLT count"));
        m.put(Analyte.POTASSIUM, List.of("K", "K+", "potassium", "Kalium", "potasio", "potassio", "kalium (K)"));
        m.put(Analyte.SODIUM, List.of("Na", "Na+", "sodium", "Natrium", "sodio"));
        m.put(Analyte.URIC_ACID, List.of("uric acid", "urate", "Harnsäure", "Harnsaeure", "acide urique", "ácido úrico",
                "acido urico", "urinezuur", "urat", "urinsyra"));
        m.put(Analyte.PHOSPHATE, List.of("phosphate", "phosphorus", "phos", "PO4", "inorganic phosphate",
                "phosphate, inorganic", "Phosphat", "anorganisches Phosphat", "phosphore", "fosfato", "fósforo",
                "fosforo", "fosfaat", "fosfat"));
        m.put(Analyte.CALCIUM, List.of("calcium", "Ca", "total calcium", "calcium, total", "calcium total",
                "Kalzium", "calcio", "kalsium", "Ca total"));
        m.put(Analyte.CREATININE, List.of("creatinine", "creat", "crea", "Cr", "Krea", "Kreatinin", "créatinine",
                "creatinina", "kreatinine"));
        m.put(Analyte.CREATININE_UPPER_LIMIT, List.of("creatinine ULN", "creatinine upper limit",
                "creatinine upper limit of normal"));
        m.put(Analyte.FIBRINOGEN, List.of("fibrinogen", "Fib", "Fbg", "fibrinogène", "fibrinógeno", "fibrinogeno",
                "fibrinogeen"));
        m.put(Analyte.PAO2, List.of("PaO2", "Pa O2", "arterial pO2", "pO2 arterial", "pO2, arterial", "pO2(a)"));
        m.put(Analyte.SPO2, List.of("SpO2", "Sp O2", "pulse oximetry", "pulse ox", "O2 sat (pulse oximetry)"));
        return m;
    }

    /** Names that look like an analyte of the worksheet but are another measurement: never imported. */
    static final Map<String, String> LOOK_ALIKES = lookAlikes();

    private static Map<String, String> lookAlikes() {
        Map<String, String> m = new HashMap<>();
        String po2 = "pO2 without 'arterial' may be venous or capillary; enter an arterial value by hand";
        for (String s : List.of("pO2", "p O2", "O2 partial pressure")) {
            m.put(normalize(s), po2);
        }
        String sat = "a measured or unspecified oxygen saturation is not pulse oximetry (SpO2); enter SpO2 by hand";
        for (String s : List.of("SO2", "SaO2", "O2 sat", "O2 saturation", "oxygen saturation", "sat")) {
            m.put(normalize(s), sat);
        }
        String ionised = "ionised or corrected calcium is not total calcium; the worksheet's limits are for total "
                + "calcium";
        for (String s : List.of("iCa", "Ca++", "Ca2+", "ionised calcium", "ionized calcium", "calcium ionised",
                "calcium ionized", "Ca ion", "ionisiertes Calcium", "ionisiertes Kalzium", "corrected calcium",
                "calcium corrected", "adjusted calcium", "calcium adjusted", "korrigiertes Calcium")) {
            m.put(normalize(s), ionised);
        }
        String plasmaVisc = "plasma or whole-blood viscosity is not serum viscosity (another scale); enter by hand "
                + "only a serum viscosity";
        for (String s : List.of("plasma viscosity", "PV", "Plasmaviskosität", "viscosité plasmatique",
                "whole blood viscosity", "blood viscosity")) {
            m.put(normalize(s), plasmaVisc);
        }
        String subclass = "an IgG subclass is not total IgG; enter an IgG3 paraprotein under IgG by hand";
        for (String s : List.of("IgG1", "IgG2", "IgG3", "IgG4", "IgG subclass 3")) {
            m.put(normalize(s), subclass);
        }
        String band = "an M-protein band from electrophoresis is not the immunoglobulin total; enter it by hand "
                + "if your protocol compares it";
        for (String s : List.of("M-protein", "M protein", "M-spike", "M spike", "paraprotein", "M-Gradient",
                "monoclonal protein")) {
            m.put(normalize(s), band);
        }
        m.put(normalize("absolute blasts"), "an absolute blast count; the case takes blasts in % of leukocytes");
        m.put(normalize("blasts absolute"), "an absolute blast count; the case takes blasts in % of leukocytes");
        return Map.copyOf(m);
    }

    /** Words in brackets that only name the specimen or method: they do not change the analyte. */
    private static final Set<String> SPECIMEN_WORDS = Set.of("serum", "plasma", "blood", "whole blood", "s", "p",
            "b", "sp", "auto", "automated", "analyser", "analyzer", "count", "total", "abs", "absolute", "clauss",
            "enzymatic", "jaffe", "ise", "arterial", "a", "vollblut", "sang", "sangre", "sangue", "bloed");

    /** Words that make it another measurement (ionised calcium, urine sodium): a label holding one is refused. */
    private static final Set<String> OTHER_MEASUREMENT = Set.of("ionised", "ionized", "ionisiert",
            "ionisiertes", "ionise", "corrected", "adjusted", "korrigiert", "korrigiertes", "corrige", "free",
            "frei", "freies", "urine", "urin", "24h", "csf", "liquor", "fluid", "pleural", "ascites", "synovial",
            "dialysate", "cord", "subclass", "kappa", "lambda", "light", "electrophoresis", "band");

    /** Only for the oxygen values: the specimen decides what the number means. */
    private static final Set<String> NOT_ARTERIAL = Set.of("venous", "ven", "v", "capillary", "cap", "kap",
            "kapillar", "mixed", "central");

    private static final Map<String, Analyte> BY_NAME = byName();

    private static Map<String, Analyte> byName() {
        Map<String, Analyte> m = new HashMap<>();
        ALIASES.forEach((analyte, names) -> names.forEach(n -> {
            Analyte before = m.put(normalize(n), analyte);
            if (before != null && before != analyte) {
                throw new IllegalStateException("alias " + n + " names both " + before + " and " + analyte);
            }
        }));
        return Map.copyOf(m);
    }

    private static final Pattern SPECIMEN_PREFIX = Pattern.compile("^(?:s|p|b|fs|fp|ps|se|pl|vb|ab|sr|b\\(a\\))-\\s*");
    private static final Pattern BRACKETED = Pattern.compile("\\(([^()]*)\\)");

    /** What a label names: an analyte, a look-alike refused with its reason, or nothing the worksheet knows. */
    sealed interface Naming {
    }

    record Names(Analyte analyte) implements Naming {
    }

    record Refused(String reason) implements Naming {
    }

    record Unknown() implements Naming {
    }

    /** Lower case, accents dropped, specimen-free spacing: the form in which labels are compared. */
    static String normalize(String label) {
        String s = Normalizer.normalize(label.replace("ß", "ss"), Normalizer.Form.NFD)
                .replaceAll("\\p{M}+", "").toLowerCase(Locale.ROOT);
        s = s.replace('\t', ' ').replaceAll("[:=;|]+", " ").replaceAll("\\s+", " ").strip();
        s = s.replaceAll("[.,]+$", "").strip();
        return s;
    }

    /** Which analyte a label names, if exactly one and nothing in it says it is another measurement. */
    static Naming resolve(String label) {
        String whole = normalize(label);
        if (whole.isEmpty()) {
            return new Unknown();
        }
        Naming direct = lookUp(whole);
        if (!(direct instanceof Unknown)) {
            return direct;
        }
        // Split "Leukocytes (WBC)" or "Calcium (ionised)" into the name outside brackets and each bracketed part.
        List<String> parts = new ArrayList<>();
        Matcher m = BRACKETED.matcher(whole);
        while (m.find()) {
            parts.add(m.group(1).strip());
        }
        String outside = BRACKETED.matcher(whole).replaceAll(" ").replaceAll("\\s+", " ").strip();
        for (String word : (whole.replaceAll("[()\\[\\],/]", " ")).split(" ")) {
            if (OTHER_MEASUREMENT.contains(word)) {
                return new Refused("'" + word + "' marks another measurement than the worksheet's; not imported");
            }
        }
        Naming main = lookUp(outside);
        if (main instanceof Refused) {
            return main;
        }
        Analyte found = main instanceof Names n ? n.analyte() : null;
        for (String part : parts) {
            if (part.isEmpty() || SPECIMEN_WORDS.contains(part)) {
                continue;
            }
            Naming inner = lookUp(part);
            if (inner instanceof Refused) {
                return inner;
            }
            if (!(inner instanceof Names n)) {
                return new Unknown();
            }
            if (found != null && found != n.analyte()) {
                return new Refused("the name holds two analytes (" + found.label() + ", " + n.analyte().label()
                        + "); not imported");
            }
            found = n.analyte();
        }
        if (found == null) {
            return new Unknown();
        }
        if ((found == Analyte.PAO2 || found == Analyte.SPO2) && parts.stream().anyMatch(NOT_ARTERIAL::contains)) {
            return new Refused("a venous or capillary oxygen value is not " + found.label() + "; not imported");
        }
        return new Names(found);
    }

    private static Naming lookUp(String normalized) {
        String s = normalized;
        for (int i = 0; i < 2; i++) {
            Naming n = exact(s);
            if (!(n instanceof Unknown)) {
                return n;
            }
            String stripped = stripSpecimen(s);
            if (stripped.equals(s)) {
                break;
            }
            s = stripped;
        }
        return new Unknown();
    }

    private static Naming exact(String s) {
        String reason = LOOK_ALIKES.get(s);
        if (reason != null) {
            return new Refused(reason);
        }
        Analyte a = BY_NAME.get(s);
        return a == null ? new Unknown() : new Names(a);
    }

    /** "P-Kalium" → "kalium", "serum IgM" → "igm", "potassium, serum" → "potassium". */
    private static String stripSpecimen(String s) {
        String t = SPECIMEN_PREFIX.matcher(s).replaceFirst("");
        t = t.replaceAll("^(serum|plasma|blood|whole blood|s|p|b) ", "");
        t = t.replaceAll("[, ]+(serum|plasma|blood|whole blood|s|p|b|sp)$", "");
        return t.strip();
    }

    /** Every alias, normalized, for documentation and tests. */
    public static Map<Analyte, List<String>> table() {
        return ALIASES;
    }

    /** The analyte a label names, if any (for results coded only by a local name). */
    public static Optional<Analyte> analyteNamed(String label) {
        return resolve(label) instanceof Names n ? Optional.of(n.analyte()) : Optional.empty();
    }
}
