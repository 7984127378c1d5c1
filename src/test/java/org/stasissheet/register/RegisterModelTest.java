package org.stasissheet.register;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.rules.Level;
import org.stasissheet.rules.Provenance;

/** The register's plain values: order, changes, times and the CSV export, without a database. */
class RegisterModelTest {
    static final Instant T0 = Instant.parse("2026-03-05T01:40:00Z");

    static Referral referral(long id, Optional<Level> level, Instant received, Decision decision,
                             Optional<Referral.DecisionRecord> record) {
        Snapshot s = new Snapshot("Invented patient " + id, "{\"format\":\"stasis-case/1\"}",
                new Provenance("shipped", "1.0.0", "ab".repeat(32), false), level, "hv", "ls", "tl", "=top flag");
        return new Referral(id, record.isPresent() ? 2 : 1, received, "Invented registrar", "ward 7",
                Procedure.NOT_STATED, s, decision, record, "Invented coordinator", received);
    }

    @Nested
    class Order {
        @Test
        @DisplayName("fixed-seed shuffles always sort to: act now, review, note, nothing flagged; then received; then id")
        void urgencyThenReceivedThenId_forAnyInputOrder() {
            List<Referral> expected = List.of(
                    referral(4, Optional.of(Level.ACT_NOW), T0, Decision.PENDING, Optional.empty()),
                    referral(2, Optional.of(Level.ACT_NOW), T0.plusSeconds(60), Decision.PENDING, Optional.empty()),
                    referral(3, Optional.of(Level.ACT_NOW), T0.plusSeconds(60), Decision.PENDING, Optional.empty()),
                    referral(1, Optional.of(Level.REVIEW), T0.minusSeconds(3600), Decision.PENDING, Optional.empty()),
                    referral(6, Optional.of(Level.NOTE), T0.minusSeconds(7200), Decision.PENDING, Optional.empty()),
                    referral(5, Optional.empty(), T0.minusSeconds(9000), Decision.PENDING, Optional.empty()));
            Random random = new Random(17);
            for (int i = 0; i < 200; i++) {
                List<Referral> shuffled = new ArrayList<>(expected);
                java.util.Collections.shuffle(shuffled, random);
                shuffled.sort(Urgency.MOST_URGENT_FIRST);
                assertEquals(expected, shuffled);
            }
        }

        @Test
        @DisplayName("stored ranks keep the same order as the levels, nothing flagged last")
        void ranks() {
            assertEquals(List.of(0, 1, 2, 3), List.of(Urgency.rank(Optional.of(Level.ACT_NOW)),
                    Urgency.rank(Optional.of(Level.REVIEW)), Urgency.rank(Optional.of(Level.NOTE)),
                    Urgency.rank(Optional.empty())));
        }
    }

    @Nested
    class Changes {
        @Test
        @DisplayName("a first decision changes the decision and every field it sets; unset fields make no event")
        void firstDecision() {
            Referral before = referral(1, Optional.of(Level.ACT_NOW), T0, Decision.PENDING, Optional.empty());
            DecisionRequest r = new DecisionRequest(1, OptionalInt.of(1), Decision.ACCEPTED,
                    new Referral.DecisionRecord("Dr Invented", T0, Optional.of(T0.plusSeconds(3600)), "femoral", "",
                            ""));
            assertEquals(List.of(new Change("decision", "pending", "accepted"),
                            new Change("slot", "", "2026-03-05T02:40:00.000Z"), new Change("access", "", "femoral")),
                    Change.of(before, r));
        }

        @Test
        @DisplayName("pending is never a decision one records")
        void pendingIsRefused() {
            assertThrows(IllegalArgumentException.class, () -> new DecisionRequest(1, OptionalInt.empty(),
                    Decision.PENDING, new Referral.DecisionRecord("x", T0, Optional.empty(), "", "", "")));
        }
    }

    @Nested
    class Times {
        @ParameterizedTest(name = "{0} is {1}")
        @DisplayName("ISO 8601 times with an offset (examples in the form of ISO 8601-1:2019, 5.4) read as instants")
        @CsvSource({
            "2026-03-05T02:40:00+01:00, 2026-03-05T01:40:00.000Z",
            "2026-03-05T01:40:00Z, 2026-03-05T01:40:00.000Z",
            "2026-03-04T20:40:00-05:00, 2026-03-05T01:40:00.000Z",
            "2026-03-05T01:40:00.5Z, 2026-03-05T01:40:00.500Z"})
        void isoWithOffset(String text, String stored) {
            assertEquals(stored, RegisterTime.format(RegisterTime.parseIso(text).orElseThrow()));
            assertEquals(RegisterTime.parseIso(text).orElseThrow(), RegisterTime.parse(stored));
        }

        @Test
        @DisplayName("a time without an offset is not accepted (its instant would depend on the machine's zone)")
        void noOffset_isRefused() {
            assertEquals(Optional.empty(), RegisterTime.parseIso("2026-03-05T02:40:00"));
            assertEquals(Optional.empty(), RegisterTime.parseIso("05/03/2026 02:40"));
        }

        @Test
        @DisplayName("stored text sorts in time order (fixed width)")
        void storedTextSortsInTimeOrder() {
            Random random = new Random(42);
            for (int i = 0; i < 500; i++) {
                Instant a = T0.plusMillis(random.nextInt(1_000_000_000));
                Instant b = T0.plusMillis(random.nextInt(1_000_000_000));
                assertEquals(Integer.signum(a.compareTo(b)),
                        Integer.signum(RegisterTime.format(a).compareTo(RegisterTime.format(b))));
            }
        }

        @Test
        void shownInTheUsersZone() {
            assertEquals("2026-03-05 02:40 +01:00", RegisterTime.show(T0, ZoneOffset.ofHours(1)));
        }
    }

    @Nested
    class Export {
        @Test
        @DisplayName("CSV: a cell that would start a formula is neutralised; hours to decision to one decimal")
        void csvGuardsAndHours() {
            Referral r = referral(1, Optional.of(Level.ACT_NOW), T0, Decision.ACCEPTED, Optional.of(
                    new Referral.DecisionRecord("Dr Invented", T0.plusSeconds(5400), Optional.empty(), "", "",
                            "note naming the patient")));
            String csv = RegisterReport.csv(List.of(r), false);
            String row = csv.split("\r\n")[1];
            // OWASP's CSV injection guidance: prefix cells starting with = + - @ so a spreadsheet shows them as text
            assertEquals(true, row.contains(",'=top flag,"), row);
            assertEquals(true, row.contains(",1.5,"), "90 minutes = 1.5 hours: " + row);
            assertEquals(false, row.contains("Invented patient"), row);
            assertEquals(false, row.contains("note naming the patient"), row);
        }
    }
}
