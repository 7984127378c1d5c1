package org.stasissheet.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.apheresis.EstimateFixtures;
import org.stasissheet.flow.FlowCaveats;

@DisplayName("the worksheet carries the flow and apheresis estimates")
class AssessorEstimatesTest {

    @Test
    @DisplayName("the CASE-FORMAT example yields both estimates, with the caveats")
    void both() {
        Worksheet w = Assessor.assess(EstimateFixtures.formatExample(), EstimateFixtures.rules());
        assertTrue(w.flow().byDiameter().isKnown());
        assertEquals(FlowCaveats.ALL, w.flow().caveats());
        // by hand, Nadler 1962 female, 162 cm 58 kg: 3.61591 L
        assertEquals(3.61591, w.apheresis().bloodVolumeL().known().orElseThrow(), 1e-5);
        assertEquals(3, w.apheresis().exchanges().size());
    }

    @Test
    @DisplayName("an empty case yields reasons, not exceptions")
    void emptyCase() {
        Worksheet w = Assessor.assess(org.stasissheet.intake.Case.EMPTY, EstimateFixtures.rules());
        assertTrue(w.flow().byDiameter().whyUnknown().isPresent());
        assertTrue(w.apheresis().bloodVolumeL().whyUnknown().isPresent());
        assertTrue(w.apheresis().plasmaVolumeL().whyUnknown().isPresent());
    }

    @org.junit.jupiter.params.ParameterizedTest(name = "{0}: leukapheresis offered {1}")
    @org.junit.jupiter.params.provider.CsvSource({"AML, true", "ALL, true", "APL, false", "none, false"})
    @DisplayName("no leukapheresis numbers or what-ifs in APL (Blum & Porcu 2007; ELN 2009) or without a leukemia")
    void leukapheresisOnlyWhereItMayHelp(String type, boolean offered) {
        org.stasissheet.intake.Case base = EstimateFixtures.formatExample();
        org.stasissheet.intake.Condition k = base.condition();
        org.stasissheet.intake.Case c = new org.stasissheet.intake.Case(base.patient(),
                new org.stasissheet.intake.Condition(k.paraprotein(), org.stasissheet.intake.Enums.parse(
                        org.stasissheet.intake.Leukemia.class, type).orElseThrow(), false, k.cryoglobulin(),
                        k.therapyStarted()),
                base.labs().with(org.stasissheet.intake.Measurement.of(org.stasissheet.measure.Analyte.WBC, 150,
                        "10*9/L")), base.baseline(), base.findings(), base.plan(), base.assessedAt(), base.assessor(),
                base.extraJson());
        Worksheet w = Assessor.assess(c, EstimateFixtures.rules());
        assertEquals(offered, w.apheresis().leukapheresis().wbcAfter().isKnown());
        assertEquals(offered, w.flow().whatIf().stream().anyMatch(x -> x.id().startsWith("leukapheresis")));
        if (type.equals("APL")) {
            assertTrue(w.apheresis().leukapheresis().wbcAfter().whyUnknown().orElseThrow().contains("discouraged"));
        }
    }

    @Test
    @DisplayName("flow above the reference from anaemia is explained, never read as safe small vessels")
    void aboveReferenceExplained() {
        // the invented demo case samples/cll-extreme.json: hematocrit below the reference 0.45, WBC 612
        org.stasissheet.intake.Case c = ((org.stasissheet.intake.CaseReader.Accepted) org.stasissheet.files.CaseFiles
                .read(java.nio.file.Path.of("samples/cll-extreme.json"))).c();
        Worksheet w = Assessor.assess(c, EstimateFixtures.rules());
        String note = w.flow().aboveReference().orElseThrow();
        assertTrue(note.contains("white-cell plugging") && note.contains("not modelled"), note);
        assertTrue(w.flow().meaning().startsWith("Relative flow = flow of the patient's blood ÷ flow of reference"));
        assertTrue(Assessor.assess(EstimateFixtures.formatExample(), EstimateFixtures.rules()).flow().meaning()
                .equals(w.flow().meaning()), "one wording");
    }
}
