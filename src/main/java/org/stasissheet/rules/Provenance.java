package org.stasissheet.rules;

import java.util.Objects;

/**
 * Which rule set produced a worksheet. {@code local} is true when the set's SHA-256 differs from the shipped
 * set's, and every output then says that a local protocol was used.
 */
public record Provenance(String name, String version, String sha256, boolean local) {
    public Provenance {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(version, "version");
        Objects.requireNonNull(sha256, "sha256");
    }

    public String shortHash() {
        return sha256.length() > 12 ? sha256.substring(0, 12) : sha256;
    }
}
