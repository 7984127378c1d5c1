package org.stasissheet.measure;

import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;

/**
 * A computed value, or the reason it could not be computed. The core never returns null for a missing estimate:
 * it returns {@link Unknown} with a sentence a clinician can read ("hematocrit not measured: …").
 *
 * @param <T> the estimated value's type
 */
public sealed interface Estimate<T> permits Estimate.Known, Estimate.Unknown {

    /** An estimate that could be made. */
    record Known<T>(T value) implements Estimate<T> {
        public Known {
            Objects.requireNonNull(value, "value");
        }
    }

    /** No estimate; {@code reason} says why in words (never blank). */
    record Unknown<T>(String reason) implements Estimate<T> {
        public Unknown {
            Objects.requireNonNull(reason, "reason");
            if (reason.isBlank()) {
                throw new IllegalArgumentException("an unknown estimate needs a reason");
            }
        }
    }

    static <T> Estimate<T> known(T value) {
        return new Known<>(value);
    }

    static <T> Estimate<T> unknown(String reason) {
        return new Unknown<>(reason);
    }

    /** The value when known. */
    default Optional<T> known() {
        return this instanceof Known<T> k ? Optional.of(k.value()) : Optional.empty();
    }

    /** The reason when unknown. */
    default Optional<String> whyUnknown() {
        return this instanceof Unknown<T> u ? Optional.of(u.reason()) : Optional.empty();
    }

    default boolean isKnown() {
        return this instanceof Known<T>;
    }

    default <U> Estimate<U> map(Function<? super T, ? extends U> f) {
        if (this instanceof Known<T> k) {
            return new Known<>(f.apply(k.value()));
        }
        return new Unknown<>(((Unknown<T>) this).reason());
    }

    default <U> Estimate<U> flatMap(Function<? super T, Estimate<U>> f) {
        if (this instanceof Known<T> k) {
            return f.apply(k.value());
        }
        return new Unknown<>(((Unknown<T>) this).reason());
    }
}
