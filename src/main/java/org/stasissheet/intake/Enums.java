package org.stasissheet.intake;

/** Holder for the small closed vocabularies of the case format; each constant knows its file spelling. */
public final class Enums {
    private Enums() {
    }

    /** Implemented by every vocabulary enum: the exact word used in the case file. */
    public interface Coded {
        String code();
    }

    public static <E extends Enum<E> & Coded> java.util.Optional<E> parse(Class<E> type, String code) {
        for (E e : type.getEnumConstants()) {
            if (e.code().equals(code)) {
                return java.util.Optional.of(e);
            }
        }
        return java.util.Optional.empty();
    }

    public static <E extends Enum<E> & Coded> String allowed(Class<E> type) {
        StringBuilder sb = new StringBuilder();
        for (E e : type.getEnumConstants()) {
            if (sb.length() > 0) {
                sb.append(" | ");
            }
            sb.append(e.code());
        }
        return sb.toString();
    }
}
