package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.rules.LeukostasisVerdict;
import org.stasissheet.rules.LeukostasisVerdict.Probability;

class VerdictWordsTest {

    // The meaning of the overall score 0-3 (no / possible / probable / highly probable leukostasis):
    // Novotny et al., Eur J Haematol 2005, as quoted by Piccirillo et al., Am J Hematol 2009 (DOMAIN.md §2).
    @ParameterizedTest(name = "score {0} -> {1}")
    @CsvSource({
        "0, leukostasis: no organ sign graded (score 0); re-examine",
        "1, leukostasis possible (score 1)",
        "2, leukostasis probable (score 2)",
        "3, leukostasis highly probable (score 3)",
    })
    @DisplayName("leukostasis verdicts read as the grading's own words with the score")
    void leukostasis(int score, String words) {
        LeukostasisVerdict v = new LeukostasisVerdict(true, LeukostasisVerdict.Gate.GRADED, Optional.of(score),
                Probability.ofScore(score), java.util.List.of(), "test");
        assertEquals(words, VerdictWords.leukostasis(v));
    }

    @Test
    @DisplayName("a leukostasis verdict without a score says it could not be assessed")
    void notAssessable() {
        LeukostasisVerdict v = new LeukostasisVerdict(false, LeukostasisVerdict.Gate.NO_COUNT, Optional.empty(),
                Probability.NOT_ASSESSABLE, java.util.List.of(), "test");
        assertEquals("leukostasis: cannot be decided (no white cell count)", VerdictWords.leukostasis(v));
    }
}
