package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.apheresis.EstimateFixtures;
import org.stasissheet.flow.FlowCaveats;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

@DisplayName("flow and apheresis keys in the JSON and text worksheet")
class EstimatesRenderingTest {

    private static JsonNode json(Worksheet w) {
        return WorksheetJson.tree(w);
    }

    @Test
    @DisplayName("the CASE-FORMAT keys are present with their numbers")
    void caseFormatKeys() {
        JsonNode root = json(Assessor.assess(EstimateFixtures.formatExample(), EstimateFixtures.rules()));
        // by hand, Nadler 1962 female 162 cm 58 kg: 3.61591 L; Kaplan 1990: 2.6767 L
        assertEquals(3.61591, root.at("/apheresis/bloodVolumeL").asDouble(), 1e-5);
        assertEquals(2.6767, root.at("/apheresis/plasmaVolumeL").asDouble(), 1e-9);
        JsonNode row = root.at("/apheresis/exchanges/0");
        for (String key : List.of("plasmaVolumes", "volumeL", "intravascularRemaining", "paraproteinAfterGPerL",
                "projected")) {
            assertTrue(row.has(key), key);
        }
        // both moments of both analytes (README, worksheet JSON): IgM 59 g/L, f = 0.78, V = 1 (by hand:
        // 59 × e^−1 = 21.7049; 59 × (1 − 0.78 × 0.632121) = 29.9098; SV 1.6 × 3.5^0.367879 = 2.5367,
        // 1.6 × 3.5^0.506946 = 3.0195)
        assertEquals(21.7049, row.at("/projected/paraproteinGPerL/immediate").asDouble(), 1e-3);
        assertEquals(29.9098, row.at("/projected/paraproteinGPerL/afterRedistribution").asDouble(), 1e-3);
        assertEquals(row.get("paraproteinAfterGPerL").asDouble(),
                row.at("/projected/paraproteinGPerL/afterRedistribution").asDouble(), 0);
        assertEquals("g/L", row.at("/projected/paraproteinGPerL/unit").asText());
        // the unit the course report contract writes for a projected viscosity (COURSE-FORMAT)
        assertEquals("cP", row.at("/projected/serumViscosity/unit").asText());
        assertEquals(2.5367, row.at("/projected/serumViscosity/immediate").asDouble(), 1e-3);
        assertEquals(3.0195, row.at("/projected/serumViscosity/afterRedistribution").asDouble(), 1e-3);
        // e^−1 (one-compartment model, DOMAIN.md §4)
        assertEquals(0.367879, row.get("intravascularRemaining").asDouble(), 1e-6);
        List<Double> diameters = new ArrayList<>();
        root.at("/flow/byDiameter").forEach(p -> {
            diameters.add(p.get("diameterUm").asDouble());
            assertTrue(p.get("relativeFlow").isNumber());
        });
        assertTrue(diameters.containsAll(List.of(5.0, 10.0, 20.0, 50.0, 100.0)), diameters.toString());
        assertEquals(FlowCaveats.ALL.size(), root.at("/flow/caveats").size());
        assertEquals(4, root.at("/flow/whatIf").size(), "no leukapheresis what-ifs without a leukemia");
        assertTrue(root.at("/flow/inVivo").size() > 0);
    }

    @Test
    @DisplayName("missing inputs give null (numbers) or [] (series) with the reason beside them")
    void nullsWithReasons() {
        Worksheet w = Assessor.assess(EstimateFixtures.aCase().sex(Sex.MALE).heightCm(170)
                .lab(Analyte.SERUM_VISCOSITY, 5, "cP").build(), EstimateFixtures.rules());
        JsonNode root = json(w);
        assertTrue(root.at("/apheresis/bloodVolumeL").isNull());
        assertTrue(root.at("/apheresis/reasons/bloodVolumeL").asText().contains("weight"));
        assertTrue(root.at("/apheresis/plasmaVolumeL").isNull());
        assertTrue(root.at("/apheresis/exchanges/0/paraproteinAfterGPerL").isNull());
        assertTrue(root.at("/apheresis/exchanges/0/reasons/paraproteinAfterGPerL").isTextual());
        assertTrue(root.at("/apheresis/exchanges/0/projected/paraproteinGPerL").isNull());
        assertTrue(root.at("/apheresis/exchanges/0/reasons/projected.paraproteinGPerL").asText()
                .contains("no paraprotein isotype"));
        assertEquals(0, root.at("/flow/byDiameter").size());
        assertTrue(root.at("/flow/reasons/byDiameter").asText().contains("hematocrit not measured"));
        assertTrue(root.at("/flow/leukocrit").isNull());
    }

    @Test
    @DisplayName("the text worksheet shows the numbers, the what-ifs and every caveat")
    void text() {
        String text = WorksheetText.render(Assessor.assess(EstimateFixtures.formatExample(),
                EstimateFixtures.rules()));
        assertTrue(text.contains("APHERESIS PLANNING NUMBERS"));
        assertTrue(text.contains("3.62 L"), text);
        assertTrue(text.contains("MICROVASCULAR FLOW"));
        assertTrue(text.contains("What if: plasma exchange, 1.5 plasma volumes"), text);
        FlowCaveats.ALL.forEach(c -> assertTrue(text.contains(c), c));
        // both moments, each in plain words, for the paraprotein and the viscosity (numbers by hand as in
        // caseFormatKeys: 21.7 and 29.9 g/L, 2.54 and 3.02)
        assertTrue(text.contains("paraprotein right after the procedure: 21.7 g/L; after redistribution (once the "
                + "paraprotein outside the vessels has flowed back): 29.9 g/L"), text);
        assertTrue(text.contains("right after the procedure: 2.54; after redistribution"), text);
    }

    @Test
    @DisplayName("the leukocrit is a range in the JSON and the text, never one number")
    void leukocritRange() {
        Worksheet w = Assessor.assess(EstimateFixtures.aCase().leukemia(Leukemia.ALL)
                .lab(Analyte.HEMATOCRIT, 0.25, "1").lab(Analyte.WBC, 300, "10*9/L").build(), EstimateFixtures.rules());
        JsonNode lk = json(w).at("/flow/leukocrit");
        // by hand: ALL blasts 82–250 fL (82 fL measured, DOMAIN.md §6; 250 fL from memory);
        // 300 × 82e-6 = 0.0246, 300 × 250e-6 = 0.075
        assertEquals(82, lk.at("/cellVolumeFl/low").asDouble(), 0);
        assertEquals(250, lk.at("/cellVolumeFl/high").asDouble(), 0);
        assertEquals(0.0246, lk.at("/leukocrit/low").asDouble(), 1e-9);
        assertEquals(0.075, lk.at("/leukocrit/high").asDouble(), 1e-9);
        assertEquals(lk.at("/byDiameter").size(), lk.at("/byDiameterLowVolume").size());
        String text = WorksheetText.render(w);
        assertTrue(text.contains("82–250 fL (lymphoblast"), text);
        assertTrue(text.contains("= 0.0246–0.075"), text);
    }
}
