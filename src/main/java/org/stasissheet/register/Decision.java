package org.stasissheet.register;

import java.util.Arrays;
import java.util.Optional;
import java.util.stream.Collectors;
import org.stasissheet.intake.Enums;

/**
 * Where a referral stands with the apheresis team. A referral starts {@link #PENDING}; accepted and declined close
 * it; deferred and more-information keep it open, because someone still has to come back to it.
 */
public enum Decision implements Enums.Coded {
    PENDING("pending", true),
    ACCEPTED("accepted", false),
    DECLINED("declined", false),
    DEFERRED("deferred", true),
    MORE_INFORMATION("more-information", true);

    private final String code;
    private final boolean open;

    Decision(String code, boolean open) {
        this.code = code;
        this.open = open;
    }

    @Override
    public String code() {
        return code;
    }

    /** Still needs the team: pending, deferred or waiting for more information. */
    public boolean isOpen() {
        return open;
    }

    public static Optional<Decision> fromCode(String code) {
        return Enums.parse(Decision.class, code);
    }

    /** The words a person can record ({@code pending} is where a referral starts, never a decision). */
    public static String recordable() {
        return Arrays.stream(values()).filter(d -> d != PENDING).map(Decision::code)
                .collect(Collectors.joining(" | "));
    }
}
