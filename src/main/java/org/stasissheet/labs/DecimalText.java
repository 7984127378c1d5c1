package org.stasissheet.labs;

import java.math.BigDecimal;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Numbers as laboratories print them: decimal point or decimal comma, with or without thousands grouping.
 * A number that reads two ways ("1,234" is 1.234 in Lyon and 1234 in Leeds) gives both readings, so the caller
 * asks; nothing is guessed. The form reads a typed number through it too, so both read numbers one way.
 */
public final class DecimalText {
    private DecimalText() {
    }

    private static final Pattern PLAIN = Pattern.compile("\\d+");
    private static final Pattern DIGITS = Pattern.compile("\\d+(?:\\.\\d+)?");
    private static final Pattern ONE_SEPARATOR = Pattern.compile("(\\d+)([.,])(\\d+)");
    private static final Pattern GROUPED = Pattern.compile("\\d{1,3}(?:([.,])\\d{3})+(?:([.,])(\\d+))?");

    /** The readings of a number token: none (not a number), one, or two when the separator is ambiguous. */
    public static List<BigDecimal> readings(String token) {
        if (PLAIN.matcher(token).matches()) {
            return List.of(new BigDecimal(token));
        }
        var one = ONE_SEPARATOR.matcher(token);
        if (one.matches()) {
            BigDecimal decimal = new BigDecimal(one.group(1) + "." + one.group(3));
            boolean couldBeGrouping = one.group(3).length() == 3 && one.group(1).length() <= 3
                    && !one.group(1).startsWith("0");
            if (couldBeGrouping) {
                return List.of(decimal, new BigDecimal(one.group(1) + one.group(3)));
            }
            return List.of(decimal);
        }
        var grouped = GROUPED.matcher(token);
        if (grouped.matches()) {
            String group = grouped.group(1);
            String decimalSeparator = grouped.group(2);
            if (decimalSeparator != null && decimalSeparator.equals(group)) {
                return List.of();
            }
            String digits = token.replace(group, "");
            if (decimalSeparator != null) {
                digits = digits.replace(decimalSeparator, ".");
            }
            if (decimalSeparator == null && token.indexOf(group) == token.lastIndexOf(group)) {
                return List.of();
            }
            // mixed grouping marks ("1.234,567.8") leave more than one decimal point: not a number we read
            if (!DIGITS.matcher(digits).matches()) {
                return List.of();
            }
            return List.of(new BigDecimal(digits));
        }
        return List.of();
    }

    /** The one reading of a token, when it has exactly one. */
    static Optional<BigDecimal> single(String token) {
        List<BigDecimal> r = readings(token);
        return r.size() == 1 ? Optional.of(r.get(0)) : Optional.empty();
    }
}
