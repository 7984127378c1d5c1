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
                "serumViscosityAfter")) {
            assertTrue(row.has(key), key);
        }
        // e^−1 (one-compartment model, DOMAIN.md §4)
        assertEquals(0.367879, row.get("intravascularRemaining").asDouble(), 1e-6);
        List<Double> diameters = new ArrayList<>();
        root.at("/flow/byDiameter").forEach(p -> {
            diameters.add(p.get("diameterUm").asDouble());
            assertTrue(p.get("relativeFlow").isNumber());
        });
        assertTrue(diameters.containsAll(List.of(5.0, 10.0, 20.0, 50.0, 100.0)), diameters.toString());
        assertEquals(FlowCaveats.ALL.size(), root.at("/flow/caveats").size());
        assertEquals(6, root.at("/flow/whatIf").size());
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
    }
}
