package org.stasissheet.bench;

import java.time.OffsetDateTime;
import java.time.ZoneOffset;
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
import org.stasissheet.report.Paper;
import org.stasissheet.report.PdfOptions;
import org.stasissheet.report.WorksheetPdf;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/**
 * One worksheet PDF rendered in memory (fonts already loaded, as in a triage batch after the first case), for
 * the demo case with the most on its pages and the one with the least. Sample-time mode: JMH reports the median.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class PdfRenderBench {
    @Param({"igm-symptomatic", "aml-breathless"})
    public String sample;

    private Worksheet sheet;
    private byte[] caseJson;
    private final PdfOptions options = new PdfOptions(Paper.A4, true, "bench");
    // a fixed generation time: the figure must not depend on the clock
    private final OffsetDateTime generatedAt = OffsetDateTime.of(2026, 3, 5, 2, 40, 0, 0, ZoneOffset.ofHours(1));

    @Setup
    public void setUp() {
        caseJson = AssessmentBench.Samples.bytes(sample);
        LoadResult loaded = RuleSources.shipped();
        if (!(loaded instanceof LoadResult.Loaded ok)) {
            throw new IllegalStateException("the shipped rule set did not load: " + loaded);
        }
        sheet = Assessor.assess(AssessmentBench.Samples.read(caseJson), ok.ruleSet());
    }

    @Benchmark
    public byte[] render() {
        return WorksheetPdf.render(sheet, options, generatedAt, caseJson);
    }
}
