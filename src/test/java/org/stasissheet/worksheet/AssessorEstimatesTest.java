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
}
