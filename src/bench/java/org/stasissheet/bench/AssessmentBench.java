package org.stasissheet.bench;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/**
 * The live path: the core assessment of each demo case with the shipped rule set (target: median at most 100 µs),
 * and, for comparison, reading the case from its bytes. Sample-time mode, so JMH reports the median (p0.50).
 * Run with {@code mvn -Pbench verify}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class AssessmentBench {
    @Param({"igm-symptomatic", "aml-breathless", "cll-extreme", "iga-borderline"})
    public String sample;

    private byte[] bytes;
    private Case patientCase;
    private RuleSet rules;

    @Setup
    public void setUp() {
        bytes = Samples.bytes(sample);
        patientCase = Samples.read(bytes);
        LoadResult loaded = RuleSources.shipped();
        if (!(loaded instanceof LoadResult.Loaded ok)) {
            throw new IllegalStateException("the shipped rule set did not load: " + loaded);
        }
        rules = ok.ruleSet();
    }

    @Benchmark
    public Worksheet assess() {
        return Assessor.assess(patientCase, rules);
    }

    @Benchmark
    public CaseReader.Result readCase() {
        return CaseReader.read(bytes);
    }

    /** The demo cases, from the copy packaged with the classes. */
    static final class Samples {
        private Samples() {
        }

        static byte[] bytes(String name) {
            String resource = "org/stasissheet/samples/" + name + ".json";
            try (InputStream in = AssessmentBench.class.getClassLoader().getResourceAsStream(resource)) {
                if (in == null) {
                    throw new IllegalStateException("no demo case " + resource + " on the class path");
                }
                return in.readAllBytes();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        static Case read(byte[] bytes) {
            CaseReader.Result result = CaseReader.read(bytes);
            if (result instanceof CaseReader.Accepted accepted) {
                return accepted.c();
            }
            throw new IllegalStateException("a demo case was rejected: " + result);
        }
    }
}
