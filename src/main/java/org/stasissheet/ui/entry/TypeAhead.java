package org.stasissheet.ui.entry;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.OptionalInt;
import java.util.function.Function;
import java.util.function.LongSupplier;
import javafx.scene.control.ComboBox;
import javafx.scene.input.KeyEvent;

/**
 * Letters typed on a focused picker choose the first choice whose words start with them: "m" picks male, "ma"
 * typed quickly the first choice starting with "ma". A pause longer than {@link #PAUSE_MILLIS} starts a new
 * prefix. A choice whose words are exactly the prefix wins over a longer one ("no" picks "no", not "not
 * assessed"). Letters that no choice starts with start a new prefix with the last letter ("m" then "f" quickly picks
 * female). Typing only chooses; it never opens the list or moves focus (Enter does that).
 */
public final class TypeAhead {
    /** How long a pause between letters starts a new prefix. Basis: common practice for list type-ahead. */
    public static final long PAUSE_MILLIS = 1000;

    private final LongSupplier millis;
    private String prefix = "";
    private long last = Long.MIN_VALUE;

    /** @param millis a monotonic clock in milliseconds (tests hand in their own) */
    public TypeAhead(LongSupplier millis) {
        this.millis = Objects.requireNonNull(millis, "millis");
    }

    /** Starts a new prefix with {@code typed} (the longer one matched nothing). */
    String restart(String typed) {
        prefix = typed.toLowerCase(Locale.ROOT);
        return prefix;
    }

    /** The prefix typed so far, after {@code typed}; a pause first starts a new one. */
    String extend(String typed) {
        long now = millis.getAsLong();
        if (last == Long.MIN_VALUE || now - last > PAUSE_MILLIS) {
            prefix = "";
        }
        last = now;
        prefix = prefix + typed.toLowerCase(Locale.ROOT);
        return prefix;
    }

    /** The index of the choice {@code prefix} picks among {@code words}, if any. */
    static OptionalInt pick(List<String> words, String prefix) {
        if (prefix.isEmpty()) {
            return OptionalInt.empty();
        }
        for (int i = 0; i < words.size(); i++) {
            if (words.get(i).strip().toLowerCase(Locale.ROOT).equals(prefix)) {
                return OptionalInt.of(i);
            }
        }
        for (int i = 0; i < words.size(); i++) {
            if (words.get(i).strip().toLowerCase(Locale.ROOT).startsWith(prefix)) {
                return OptionalInt.of(i);
            }
        }
        return OptionalInt.empty();
    }

    /** Lets {@code box} take typed letters and digits, reading each item's words through {@code words}. */
    public static <T> void install(ComboBox<T> box, Function<T, String> words, LongSupplier millis) {
        TypeAhead typing = new TypeAhead(millis);
        box.addEventHandler(KeyEvent.KEY_TYPED, e -> {
            String c = e.getCharacter();
            if (c == null || c.length() != 1 || e.isControlDown() || e.isMetaDown() || e.isAltDown()
                    || Character.isISOControl(c.charAt(0)) || Character.isWhitespace(c.charAt(0))) {
                return;
            }
            String prefix = typing.extend(c);
            List<String> shown = box.getItems().stream().map(words).toList();
            OptionalInt picked = pick(shown, prefix);
            if (picked.isEmpty() && prefix.length() > 1) {
                picked = pick(shown, typing.restart(c));
            }
            picked.ifPresent(i -> box.getSelectionModel().select(i));
            e.consume();
        });
    }
}
