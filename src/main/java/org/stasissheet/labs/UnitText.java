package org.stasissheet.labs;

import java.math.BigDecimal;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.stasissheet.measure.Analyte;

/**
 * Units as they are printed or pasted ("x10^9/L", "10E9/l", "×10⁹/L", "G/l", "mmol/l", "mg%", "K/uL") read as
 * the UCUM code the analyte catalogue accepts, converting only by definition (1 nL = 10⁻⁹ L, 1 mg = 10⁻³ g).
 * "G/L" means giga per litre for a cell count and grams per litre for everything else: counts are looked up in
 * their own table first.
 */
final class UnitText {
    private UnitText() {
    }

    /** A unit read for an analyte: the accepted UCUM code and the factor from the printed unit into it. */
    record Reading(String ucum, BigDecimal factor, String note) {
    }

    /** Cell counts: printed notation → UCUM code. */
    private static final Map<String, String> COUNTS = Map.ofEntries(
            Map.entry("10^9/l", "10*9/L"), Map.entry("g/l", "10*9/L"), Map.entry("gpt/l", "10*9/L"),
            Map.entry("giga/l", "10*9/L"), Map.entry("/nl", "/nL"), Map.entry("10^3/ul", "10*3/uL"),
            Map.entry("k/ul", "10*3/uL"), Map.entry("thou/ul", "10*3/uL"), Map.entry("10^3/mm^3", "10*3/uL"),
            Map.entry("10^3/mm3", "10*3/uL"), Map.entry("k/mm3", "10*3/uL"), Map.entry("/ul", "/uL"),
            Map.entry("cells/ul", "/uL"), Map.entry("/mm3", "/mm3"), Map.entry("/mm^3", "/mm3"),
            Map.entry("/cmm", "/mm3"), Map.entry("cells/mm3", "/mm3"));

    /** Everything else: printed notation → UCUM code. */
    private static final Map<String, String> OTHERS = Map.ofEntries(
            Map.entry("g/l", "g/L"), Map.entry("g/dl", "g/dL"), Map.entry("mg/dl", "mg/dL"),
            Map.entry("mg%", "mg/dL"), Map.entry("mg/l", "mg/L"), Map.entry("mmol/l", "mmol/L"),
            Map.entry("umol/l", "umol/L"), Map.entry("meq/l", "meq/L"), Map.entry("mval/l", "meq/L"),
            Map.entry("%", "%"), Map.entry("l/l", "L/L"), Map.entry("cp", "cP"), Map.entry("cps", "cP"),
            Map.entry("centipoise", "cP"), Map.entry("mpa.s", "mPa.s"), Map.entry("mpas", "mPa.s"),
            Map.entry("mpa^s", "mPa.s"), Map.entry("rel", "{rel}"), Map.entry("{rel}", "{rel}"),
            Map.entry("(rel)", "{rel}"), Map.entry("relative", "{rel}"), Map.entry("kpa", "kPa"),
            Map.entry("mmhg", "mm[Hg]"), Map.entry("mm[hg]", "mm[Hg]"), Map.entry("cel", "Cel"));

    private record Conversion(String to, BigDecimal factor, String source) {
    }

    /** Conversions by definition into an accepted unit, used only when the printed unit is not accepted itself. */
    private static final Map<String, List<Conversion>> CONVERSIONS = Map.of(
            "/nL", List.of(new Conversion("10*9/L", BigDecimal.ONE, "definition: 1 nL = 10⁻⁹ L")),
            "/uL", List.of(new Conversion("10*9/L", new BigDecimal("0.001"), "definition: 1 µL = 10⁻⁶ L")),
            "/mm3", List.of(new Conversion("10*9/L", new BigDecimal("0.001"), "definition: 1 mm³ = 1 µL")),
            "mg/L", List.of(new Conversion("g/L", new BigDecimal("0.001"), "definition: 1 mg = 0.001 g")),
            "mmol/L", List.of(new Conversion("umol/L", new BigDecimal(1000), "definition: 1 mmol = 1000 µmol")),
            "g/dL", List.of(new Conversion("g/L", BigDecimal.TEN, "definition: 1 dL = 0.1 L")));

    private static final Map<Character, Character> SUPERSCRIPTS = new HashMap<>(Map.of(
            '⁰', '0', '¹', '1', '²', '2', '³', '3', '⁴', '4', '⁵', '5', '⁶', '6', '⁷', '7', '⁸', '8', '⁹', '9'));

    /** The unit as the analyte accepts it, or empty when the notation is unknown or not a unit of this analyte. */
    static Optional<Reading> read(Analyte analyte, String printed) {
        if (analyte.unitOption(printed.strip()).isPresent()) {
            return Optional.of(new Reading(printed.strip(), BigDecimal.ONE, ""));
        }
        String n = normalize(printed);
        boolean count = analyte == Analyte.WBC || analyte == Analyte.PLATELETS;
        String ucum = count && COUNTS.containsKey(n) ? COUNTS.get(n) : OTHERS.get(n);
        if (ucum == null) {
            return Optional.empty();
        }
        if (analyte.unitOption(ucum).isPresent()) {
            return Optional.of(new Reading(ucum, BigDecimal.ONE, ""));
        }
        for (Conversion c : CONVERSIONS.getOrDefault(ucum, List.of())) {
            if (analyte.unitOption(c.to()).isPresent()) {
                return Optional.of(new Reading(c.to(), c.factor(), "converted from " + printed.strip() + " ("
                        + c.source() + ")"));
            }
        }
        return Optional.empty();
    }

    /** Lower case, no spaces, µ as u, × as x, superscript and E/* exponents as ^, a leading "x" dropped. */
    static String normalize(String printed) {
        StringBuilder b = new StringBuilder();
        boolean inSuperscript = false;
        for (char c : printed.strip().toCharArray()) {
            Character digit = SUPERSCRIPTS.get(c);
            if (digit != null) {
                if (!inSuperscript) {
                    b.append('^');
                }
                b.append(digit);
                inSuperscript = true;
                continue;
            }
            inSuperscript = false;
            switch (c) {
                case 'µ', 'μ' -> b.append('u');
                case '×' -> b.append('x');
                case '·' -> b.append('.');
                case '³' -> b.append('3');
                default -> {
                    if (!Character.isWhitespace(c)) {
                        b.append(c);
                    }
                }
            }
        }
        String n = b.toString().toLowerCase(Locale.ROOT);
        n = n.replace("**", "^").replace("*", "^");
        n = n.replaceAll("10e\\+?([0-9])", "10^$1");
        // "×10⁹/L" pasted without its superscript arrives as "x109/L"
        n = n.replaceAll("^x10([369])/", "10^$1/");
        n = n.replaceAll("^x(?=10\\^)", "");
        return n;
    }
}
