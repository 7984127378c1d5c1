package org.stasissheet.labs;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.Quantity;
import org.stasissheet.measure.UnitOption;

/**
 * One value with its unit, as typed or printed ("180 x10^9/L", "6,8 mmol/l H", "48 g/L * [0.4-2.3]"), read for a
 * known analyte. The pasted-report reader uses it for the part of each line after the name; a form field can use
 * it for what was typed into it.
 */
public final class ValueText {
    private ValueText() {
    }

    /** Laboratory flags, as printed after a value. Basis: common practice. */
    private static final Set<String> FLAGS = Set.of("h", "l", "hh", "ll", "*", "**", "***", "!", "!!", "↑", "↓",
            "↑↑", "↓↓", "(h)", "(l)", "high", "low", "crit", "hoch", "niedrig");

    private static final String NUMBER = "\\d+(?:[.,]\\d+)*";
    private static final Pattern BRACKETED_RANGE = Pattern.compile(
            "[\\[(]\\s*(?:ref\\.?:?\\s*)?((?:[<>≤≥]\\s*" + NUMBER + ")|(?:" + NUMBER + "\\s*[-–—]\\s*" + NUMBER
                    + "))\\s*[^\\])]*[\\])]");
    private static final Pattern BARE_RANGE = Pattern.compile(
            "(?<![\\d.,^*/])(" + NUMBER + "\\s*[-–—]\\s*" + NUMBER + ")(?![\\d.,])");
    private static final Pattern VALUE_START = Pattern.compile("^(" + NUMBER + ")(.*)$");

    /** Reads {@code text} as a value of {@code analyte}; the result never names a line. */
    public static ValueReading read(Analyte analyte, String text) {
        return read(analyte, text, "", text);
    }

    static ValueReading read(Analyte analyte, String rest, String where, String lineText) {
        String s = rest.strip();
        if (s.isEmpty()) {
            return new ValueReading.NotUnderstood("no value given for " + analyte.label());
        }
        if (s.matches("^[<>≤≥].*")) {
            return new ValueReading.NotUnderstood("'" + s.split("\\s+")[0] + "' is a limit, not a measured value, for "
                    + analyte.label() + "; enter a value by hand if appropriate");
        }
        Matcher start = VALUE_START.matcher(s);
        if (!start.matches()) {
            return new ValueReading.NotUnderstood("'" + s + "' does not start with a number (" + analyte.label() + ")");
        }
        String numberText = start.group(1);
        String after = start.group(2);

        String range = "";
        Matcher bracketed = BRACKETED_RANGE.matcher(after);
        if (bracketed.find()) {
            range = bracketed.group().strip();
            after = after.substring(0, bracketed.start()) + " " + after.substring(bracketed.end());
        } else {
            Matcher bare = BARE_RANGE.matcher(after);
            if (bare.find()) {
                range = bare.group(1).strip();
                after = after.substring(0, bare.start()) + " " + after.substring(bare.end());
            }
        }

        // a flag glued to the number ("6.8H", "48*") or standing alone; the rest is the unit
        List<String> flags = new ArrayList<>();
        List<String> unitParts = new ArrayList<>();
        String glued = after.isEmpty() || Character.isWhitespace(after.charAt(0)) ? "" : after.split("\\s+", 2)[0];
        if (!glued.isEmpty() && FLAGS.contains(glued.toLowerCase(java.util.Locale.ROOT))) {
            flags.add(glued);
            after = after.substring(glued.length());
        }
        for (String token : after.strip().split("\\s+")) {
            if (token.isEmpty()) {
                continue;
            }
            boolean continuesUnit = !unitParts.isEmpty() && unitParts.get(unitParts.size() - 1).endsWith("/");
            if (FLAGS.contains(token.toLowerCase(java.util.Locale.ROOT)) && !continuesUnit) {
                flags.add(token);
            } else if (token.matches("^[<>≤≥]?" + NUMBER + "$")) {
                return new ValueReading.NotUnderstood("a second number '" + token + "' after " + numberText
                        + " for " + analyte.label() + ": which is the value?");
            } else {
                unitParts.add(token);
            }
        }
        String unitText = String.join(" ", unitParts);
        String flag = String.join(" ", flags);

        List<BigDecimal> numbers = DecimalText.readings(numberText);
        if (numbers.isEmpty()) {
            return new ValueReading.NotUnderstood("'" + numberText + "' is not a number this reader understands ("
                    + analyte.label() + ")");
        }
        return judge(analyte, numberText, numbers, unitText, flag, range, where, lineText);
    }

    /**
     * A value already read as a number (FHIR valueQuantity, HL7 NM): only its unit is interpreted. The UCUM code
     * is tried first, then the printed unit.
     */
    static ValueReading readCoded(Analyte analyte, BigDecimal value, String unitCode, String unitText, String flag,
                                  String range, String where, String text) {
        String unit = !unitCode.isBlank() && UnitText.read(analyte, unitCode).isPresent() ? unitCode
                : !unitText.isBlank() ? unitText : unitCode;
        return judge(analyte, value.toPlainString(), List.of(value), unit.strip(), flag, range, where, text);
    }

    private static ValueReading judge(Analyte analyte, String numberText, List<BigDecimal> numbers, String unitText,
                                      String flag, String range, String where, String lineText) {
        if (unitText.isEmpty()) {
            List<LabLine.Option> options = new ArrayList<>();
            Set<Double> factors = new LinkedHashSet<>();
            for (BigDecimal n : numbers) {
                for (UnitOption u : analyte.units()) {
                    Measurement m = measurement(analyte, n, u.ucum());
                    if (analyte.isPlausible(m.canonical()) && factors.add(n.doubleValue() * u.toCanonical())) {
                        options.add(option(where, lineText, m, flag, range, "no unit was printed"));
                    }
                }
            }
            if (options.isEmpty()) {
                return new ValueReading.NotUnderstood("no unit printed after " + numberText + " for " + analyte.label()
                        + ", and no accepted unit (" + accepted(analyte) + ") makes it plausible");
            }
            return new ValueReading.Choice("no unit printed after " + numberText + " for " + analyte.label()
                    + ": which unit?", options);
        }
        Optional<UnitText.Reading> unit = UnitText.read(analyte, unitText);
        if (unit.isEmpty()) {
            return new ValueReading.NotUnderstood("'" + unitText + "' is not a unit this reader knows for "
                    + analyte.label() + "; accepted (UCUM codes): " + accepted(analyte));
        }
        String ucum = unit.get().ucum();
        if (numbers.size() > 1) {
            List<LabLine.Option> options = new ArrayList<>();
            for (BigDecimal n : numbers) {
                Measurement m = measurement(analyte, n.multiply(unit.get().factor()), ucum);
                if (analyte.isPlausible(m.canonical())) {
                    options.add(option(where, lineText, m, flag, range, unit.get().note()));
                }
            }
            String question = "'" + numberText + "' reads as " + Numbers.plain(numbers.get(0).doubleValue()) + " or "
                    + Numbers.plain(numbers.get(1).doubleValue()) + " (decimal or thousands separator)";
            if (options.isEmpty()) {
                return new ValueReading.NotUnderstood(question + ", and neither is plausible for " + analyte.label());
            }
            return new ValueReading.Choice(question + ": which?", options);
        }
        Measurement m = measurement(analyte, numbers.get(0).multiply(unit.get().factor()), ucum);
        if (analyte.isPlausible(m.canonical())) {
            String note = unit.get().note();
            if (analyte == Analyte.SERUM_VISCOSITY) {
                // a report line carries no measuring temperature; with a cryoglobulin a cooled sample reads low
                note = (note.isEmpty() ? "" : note + "; ") + "no measuring temperature came with it: add it if known";
            }
            return new ValueReading.Understood(new LabLine.Taken(where, lineText, m, flag, range, note,
                    Optional.empty()));
        }
        List<UnitOption> alternatives = analyte.unitsMakingPlausible(m.entered().value(), m.unitOption());
        String implausible = Numbers.plain(m.entered().value()) + " " + m.unitOption().display()
                + " is not plausible for " + analyte.label();
        if (alternatives.isEmpty()) {
            return new ValueReading.NotUnderstood(implausible + "; the plausible range is "
                    + Numbers.plain(analyte.plausibleMin()) + " to " + Numbers.plain(analyte.plausibleMax()) + " "
                    + analyte.canonicalOption().display());
        }
        List<LabLine.Option> options = alternatives.stream()
                .map(u -> option(where, lineText, measurement(analyte, BigDecimal.valueOf(m.entered().value()),
                        u.ucum()), flag, range, "unit changed from " + unitText + " to " + u.display()))
                .toList();
        return new ValueReading.Choice(implausible + ": was another unit meant?", options);
    }

    private static LabLine.Option option(String where, String text, Measurement m, String flag, String range,
                                         String note) {
        return new LabLine.Option(new LabLine.Taken(where, text, m, flag, range, note, Optional.empty()));
    }

    static Measurement measurement(Analyte analyte, BigDecimal value, String ucum) {
        return new Measurement(analyte, new Quantity(value.stripTrailingZeros().doubleValue(), ucum), Optional.empty());
    }

    static String accepted(Analyte analyte) {
        return String.join(", ", analyte.units().stream().map(UnitOption::ucum).toList());
    }

    /** The upper end of a printed reference range ("[3.5-5.1]", "(< 1.2)"), when it reads one way only. */
    static Optional<BigDecimal> upperLimit(String range) {
        if (range.matches(".*[>≥].*")) {
            return Optional.empty();
        }
        List<String> numbers = new ArrayList<>();
        Matcher m = Pattern.compile(NUMBER).matcher(range);
        while (m.find()) {
            numbers.add(m.group());
        }
        boolean upperOnly = range.matches(".*[<≤].*");
        if (upperOnly ? numbers.size() != 1 : numbers.size() != 2) {
            return Optional.empty();
        }
        return DecimalText.single(numbers.get(numbers.size() - 1));
    }
}
