package org.stasissheet.measure;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * How a UCUM unit code is written for people: the one place every human text (screen, PDF, note, command line)
 * takes its unit symbols from. Files and JSON keep the UCUM codes. The analytes' own display symbols come first; the
 * rest are the units of rule parameters and estimates.
 */
public final class UnitSymbols {
    private UnitSymbols() {
    }

    private static final Map<String, String> SYMBOLS = build();

    private static Map<String, String> build() {
        Map<String, String> m = new LinkedHashMap<>();
        for (Analyte a : Analyte.values()) {
            a.units().forEach(u -> m.putIfAbsent(u.ucum(), u.display()));
        }
        m.put("1", "");
        m.putIfAbsent("uL", "µL");
        m.putIfAbsent("fL", "fL");
        m.putIfAbsent("L", "L");
        m.putIfAbsent("mL", "mL");
        m.putIfAbsent("dL", "dL");
        m.putIfAbsent("um", "µm");
        m.putIfAbsent("Cel", "°C");
        m.putIfAbsent("d", "days");
        m.putIfAbsent("h", "h");
        m.putIfAbsent("wk", "weeks");
        m.putIfAbsent("a", "years");
        return Map.copyOf(m);
    }

    /** The symbol for a UCUM code; an unknown code is shown as it is (never hidden). Empty for a plain ratio. */
    public static String of(String ucum) {
        return SYMBOLS.getOrDefault(ucum, ucum);
    }

    /** A number and its unit for people: "182 ×10⁹/L", "37 °C", "0.76" for a plain ratio. */
    public static String format(String number, String ucum) {
        String symbol = of(ucum);
        return symbol.isEmpty() ? number : number + " " + symbol;
    }
}
