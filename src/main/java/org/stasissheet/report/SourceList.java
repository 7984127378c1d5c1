package org.stasissheet.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * The numbered list of every source a document cites, numbered in the order they are first cited, so a flag
 * can say "[3]" and the list at the end carries entry 3. Equal texts share one number.
 */
final class SourceList {
    private final Map<String, Integer> numbers = new LinkedHashMap<>();

    /** The number of this source, giving it the next free number on its first citation. */
    int cite(String source) {
        Objects.requireNonNull(source, "source");
        String key = source.strip();
        return numbers.computeIfAbsent(key, k -> numbers.size() + 1);
    }

    /** The sources in number order (entry i has number i + 1). */
    List<String> entries() {
        return new ArrayList<>(numbers.keySet());
    }

    boolean isEmpty() {
        return numbers.isEmpty();
    }
}
