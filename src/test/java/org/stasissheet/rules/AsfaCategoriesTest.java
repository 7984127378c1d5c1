package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The ASFA 2023 categories of the shipped rules against a secondary transcription of the 2023 table (DOMAIN.md §6:
 * hyperviscosity in hypergammaglobulinemia, symptomatic I/1B, before rituximab I/1C; hyperleukocytosis one row,
 * III/2B). Each says its basis and asks the reader to check the current fact sheet.
 */
@DisplayName("ASFA categories: secondary transcription of the 2023 table")
class AsfaCategoriesTest {
    private static final Map<String, Rule> RULES = TestCases.SHIPPED.rules().stream()
            .collect(Collectors.toMap(Rule::id, r -> r));

    @ParameterizedTest(name = "{0}: {1}")
    @CsvSource({
        "apheresis.hyperviscosity-symptomatic, 'ASFA I, grade 1B'",
        "apheresis.rituximab-prophylaxis, 'ASFA I, grade 1C'",
        "apheresis.leukostasis, 'ASFA III, grade 2B'",
        "apheresis.hyperleukocytosis-prophylaxis, 'ASFA III, grade 2B'"})
    void categoryWithBasisAndAdvice(String id, String category) {
        Rule r = RULES.get(id);
        assertTrue(r.title().contains(category), r.title());
        assertTrue(r.title().contains("(secondary transcription)"), r.title());
        assertTrue(r.explanation().contains("check the current ASFA fact sheet"), r.explanation());
        assertTrue(r.source().contains("secondary transcription"), r.source());
        assertEquals(Basis.PUBLISHED_SECONDARY, r.basis());
    }
}
