package org.stasissheet.register;

import java.util.Arrays;
import java.util.Optional;
import java.util.stream.Collectors;

/** The procedure the referrer asked for; {@link #NOT_STATED} when the referral did not say. */
public enum Procedure {
    PLASMA_EXCHANGE("plasma-exchange", "plasma exchange"),
    LEUKAPHERESIS("leukapheresis", "leukapheresis"),
    NOT_STATED("not-stated", "not stated");

    private final String code;
    private final String words;

    Procedure(String code, String words) {
        this.code = code;
        this.words = words;
    }

    public String code() {
        return code;
    }

    public String words() {
        return words;
    }

    public static Optional<Procedure> fromCode(String code) {
        return Arrays.stream(values()).filter(p -> p.code.equals(code)).findFirst();
    }

    public static String codes() {
        return Arrays.stream(values()).map(Procedure::code).collect(Collectors.joining(" | "));
    }
}
