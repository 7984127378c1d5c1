package org.stasissheet.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Quantity;
import org.stasissheet.measure.UnitOption;

/** read → write → read loses nothing: on every sample, and on valid cases from a fixed-seed generator. */
class RoundTripTest {

    static Case accepted(String json) {
        CaseReader.Result r = CaseReader.read(json.getBytes(StandardCharsets.UTF_8));
        if (r instanceof CaseReader.Rejected rejected) {
            fail("rejected: " + rejected.problems() + "\n" + json);
        }
        return ((CaseReader.Accepted) r).c();
    }

    static Stream<Path> samples() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(Path.of("samples"))) {
            files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        if (files.size() < 4) {
            throw new IllegalStateException("expected at least four samples, found " + files);
        }
        return files.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    @DisplayName("every sample is accepted and survives read → write → read")
    void sampleRoundTrip(Path sample) throws IOException {
        Case first = accepted(Files.readString(sample, StandardCharsets.UTF_8));
        String written = CaseWriter.write(first);
        assertEquals(first, accepted(written));
        assertEquals(written, CaseWriter.write(accepted(written)), "writing is stable");
    }

    static LongStream seeds() {
        return LongStream.range(0, 200);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    @DisplayName("random valid cases survive write → read → write (fixed seeds)")
    void randomRoundTrip(long seed) {
        Case c = new CaseGenerator(new SplittableRandom(seed)).next();
        String written = CaseWriter.write(c);
        Case back = accepted(written);
        assertEquals(c, back);
        assertEquals(written, CaseWriter.write(back));
    }

    /** Generates valid cases: every value plausible in a randomly chosen accepted unit. Test-only. */
    static final class CaseGenerator {
        private static final String CHARACTERS = "abcXYZ 079-,.\"\\/\n\t\u0001éµ°Ω🙂";
        private final SplittableRandom random;

        CaseGenerator(SplittableRandom random) {
            this.random = random;
        }

        Case next() {
            return new Case(patient(), condition(), labs(), labs(), findings(),
                    new Plan(random.nextBoolean(), random.nextBoolean()),
                    maybe(this::timestamp), random.nextBoolean() ? text() : "", extra());
        }

        private Patient patient() {
            return new Patient(random.nextBoolean() ? text() : "", maybe(() -> pick(Sex.values())),
                    maybe(() -> random.nextInt(131)), maybe(() -> measurement(Analyte.HEIGHT)),
                    maybe(() -> measurement(Analyte.WEIGHT)));
        }

        private Condition condition() {
            return new Condition(pick(Paraprotein.values()), pick(Leukemia.values()), random.nextBoolean(),
                    pick(Cryoglobulin.values()),
                    maybe(() -> LocalDate.of(2020, 1, 1).plusDays(random.nextInt(3000))));
        }

        private Labs labs() {
            Map<Analyte, Measurement> values = new EnumMap<>(Analyte.class);
            for (Analyte a : Analyte.labs()) {
                if (random.nextInt(3) == 0) {
                    values.put(a, measurement(a));
                }
            }
            return new Labs(values);
        }

        private Findings findings() {
            return new Findings(maybe(() -> random.nextInt(4)), maybe(() -> random.nextInt(4)),
                    maybe(() -> random.nextInt(4)), pick(Observation.values()), pick(Observation.values()),
                    pick(Retinopathy.values()), pick(Observation.values()), pick(Observation.values()),
                    pick(Observation.values()));
        }

        private Measurement measurement(Analyte a) {
            UnitOption unit = pick(a.units().toArray(new UnitOption[0]));
            double min = a.plausibleMin() / unit.toCanonical();
            double max = a.plausibleMax() / unit.toCanonical();
            double value;
            do {
                double raw = min + (0.01 + 0.98 * random.nextDouble()) * (max - min);
                value = BigDecimal.valueOf(raw).setScale(random.nextInt(5), RoundingMode.HALF_UP).doubleValue();
            } while (!a.isPlausible(value * unit.toCanonical()));
            Optional<Quantity> temperature = a == Analyte.SERUM_VISCOSITY
                    ? maybe(() -> new Quantity(20 + random.nextInt(200) / 10.0, "Cel"))
                    : Optional.empty();
            return new Measurement(a, new Quantity(value, unit.ucum()), temperature);
        }

        private OffsetDateTime timestamp() {
            ZoneOffset offset = ZoneOffset.ofTotalSeconds((random.nextInt(53) - 24) * 30 * 60);
            return OffsetDateTime.of(2024 + random.nextInt(4), 1 + random.nextInt(12), 1 + random.nextInt(28),
                    random.nextInt(24), random.nextInt(60), random.nextInt(60),
                    random.nextBoolean() ? 0 : random.nextInt(1000) * 1_000_000, offset);
        }

        private String extra() {
            if (random.nextBoolean()) {
                return "{}";
            }
            ObjectNode node = JsonNodeFactory.instance.objectNode();
            node.put("note", text());
            node.put("count", random.nextInt(1000));
            node.put("ratio", new BigDecimal(random.nextInt(10_000)).movePointLeft(3));
            node.putArray("list").add(random.nextBoolean()).addNull().add(text());
            try {
                return new ObjectMapper().writeValueAsString(node);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        private String text() {
            StringBuilder sb = new StringBuilder();
            int length = 1 + random.nextInt(20);
            int[] codePoints = CHARACTERS.codePoints().toArray();
            for (int i = 0; i < length; i++) {
                sb.appendCodePoint(codePoints[random.nextInt(codePoints.length)]);
            }
            return sb.toString();
        }

        private <T> T pick(T[] options) {
            return options[random.nextInt(options.length)];
        }

        private <T> Optional<T> maybe(java.util.function.Supplier<T> value) {
            return random.nextInt(4) == 0 ? Optional.empty() : Optional.of(value.get());
        }
    }
}
