package org.stasissheet.register;

import java.util.Optional;
import org.stasissheet.intake.Enums;

/** The procedure the referrer asked for; {@link #NOT_STATED} when the referral did not say. */
public enum Procedure implements Enums.Coded {
    PLASMA_EXCHANGE("plasma-exchange", "plasma exchange"),
    LEUKAPHERESIS("leukapheresis", "leukapheresis"),
    NOT_STATED("not-stated", "not stated");

    private final String code;
    private final String words;

    Procedure(String code, String words) {
        this.code = code;
        this.words = words;
    }

    @Override
    public String code() {
        return code;
    }

    public String words() {
        return words;
    }

    public static Optional<Procedure> fromCode(String code) {
        return Enums.parse(Procedure.class, code);
    }

    public static String codes() {
        return Enums.allowed(Procedure.class);
    }
}
